import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import * as compute from '@/app/api/compute/route';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, MAX_GIRDER_POINTS } from '@/lib/geometry';
import { call, makeUsers, type TestUser } from './helpers';
import { warmComputePool } from '@/lib/workers/compute-pool';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
  // The engine runs in worker threads; let them load before the one-second answers are timed.
  await warmComputePool();
});

/** Every answer must be one a client can act on; a hang counts as a failure, not a slow pass. */
async function post(body: unknown): Promise<{ status: number; json: any; text: string }> {
  let timer: NodeJS.Timeout | undefined;
  const hang = new Promise<never>((_, reject) => {
    timer = setTimeout(() => reject(new Error('compute did not answer within a second')), 1000);
  });
  try {
    return await Promise.race([call(compute.POST, { method: 'POST', cookie: people.crew.cookie, body }), hang]);
  } finally {
    clearTimeout(timer);
  }
}

/** Replaces the value at a random path of a JSON document with a hostile value. */
function mutate(doc: unknown, pathPicks: number[], value: unknown): unknown {
  const copy = structuredClone(doc) as Record<string, unknown>;
  let node: any = copy;
  for (let depth = 0; depth < pathPicks.length; depth++) {
    if (node === null || typeof node !== 'object') break;
    const keys = Object.keys(node);
    if (keys.length === 0) break;
    const key = keys[pathPicks[depth] % keys.length];
    if (depth === pathPicks.length - 1 || node[key] === null || typeof node[key] !== 'object') {
      node[key] = value;
      break;
    }
    node = node[key];
  }
  return copy;
}

const hostile = fc.oneof(
  fc.constantFrom(null, '', 'NaN', -1, 0, 1e308, -1e308, 5e-324, [], {}, 'arc', 'left', 10000, 10001, true),
  fc.double(),
  fc.integer(),
  fc.string(),
  fc.array(fc.anything(), { maxLength: 4 }),
);

describe('POST /api/compute', () => {
  it('answers the offset table for a good description', async () => {
    const res = await post(demoBridges[0]);
    expect(res.status).toBe(200);
    const direct = computeOffsetTable(demoBridges[0]);
    const exterior = direct.points.filter((p) => p.side !== 'interior');
    // Interior girders carry no overhang: their rows come only with ?interior=1.
    expect(res.json.points.length).toBe(exterior.length);
    expect(res.json.points[7].edge_width).toBeCloseTo(exterior[7].edge_width as number, 12);
    const all = await call(compute.POST, { method: 'POST', path: '/api/compute?interior=1', cookie: people.crew.cookie, body: demoBridges[0] });
    expect(all.json.points.length).toBe(direct.points.length);
    expect(all.json.points.filter((p: { side: string }) => p.side === 'interior').length).toBeGreaterThan(0);
    const odd = await call(compute.POST, { method: 'POST', path: '/api/compute?interior=maybe', cookie: people.crew.cookie, body: demoBridges[0] });
    expect(odd.status).toBe(400);
    expect(odd.json.fields.interior).toEqual(['interior must be 1 (include interior girders) or 0.']);
  });

  it('answers 400 with field errors for a bad schema and 422 naming the girder for bad geometry', async () => {
    const bad = await post({ ...demoBridges[0], bents: 'two' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.fields)).toContain('bents');
    const g = demoBridges[0].girders[0];
    const off = { ...demoBridges[0], girders: demoBridges[0].girders.map((x, i) => (i === 0 ? { ...x, offsets: x.offsets.map(() => -40) } : x)) };
    const geo = await post(off);
    expect(geo.status).toBe(422);
    expect(geo.json.error).toContain(g.name);
  });

  it('refuses a description that asks for more work than the limit', async () => {
    const girders = Array.from({ length: 30 }, (_, i) => ({ name: `G${i + 1}`, layout: 'chord', offsets: demoBridges[0].bents.map(() => -15 + i) }));
    // 10,000 points per span is a size no bridge reaches: refused by name before any work.
    const res = await post({ ...demoBridges[0], girders, points_per_span: 10000, top_of_girder: [] });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/points_per_span is 10000; the limit is 200/);
    // Within every size limit, the engine's own work limit (girders × spans × points) still holds.
    const many = Array.from({ length: 40 }, (_, i) => ({ name: `G${i + 1}`, layout: 'chord', offsets: demoBridges[0].bents.map(() => -15 + i * 0.75) }));
    const bents = Array.from({ length: 40 }, (_, i) => ({ name: `B${i + 1}`, station: demoBridges[0].bents[0].station + i * 5, skew_deg: 0 }));
    const work = await post({ ...demoBridges[0], bents, girders: many.map((g) => ({ ...g, offsets: bents.map(() => g.offsets[0]) })), points_per_span: 200, top_of_girder: [] });
    expect(work.status).toBe(422);
    expect(work.json.error).toContain(String(MAX_GIRDER_POINTS));
  });

  it('answers 200, 400 or 422 — never 500, never a stack — to random and hostile descriptions', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...demoBridges), fc.array(fc.nat(), { minLength: 1, maxLength: 5 }), hostile, async (base, picks, value) => {
        const res = await post(mutate(base, picks, value));
        expect([200, 400, 422]).toContain(res.status);
        expect(res.text).not.toMatch(/\n\s+at .+:\d+:\d+/);
      }),
      { numRuns: 150 },
    );
    await fc.assert(
      fc.asyncProperty(fc.anything(), async (junk) => {
        const res = await post(junk);
        expect([400, 422]).toContain(res.status);
      }),
      { numRuns: 60 },
    );
  });
});
