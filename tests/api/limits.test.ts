/**
 * Limits and isolation (issue 11, defects 5 and 8): sizes no bridge reaches are refused with a 422
 * naming the limit before any work (bridge-format.md, "Refused as impossible"), error bodies stay
 * short (first 20 problems and a count), absurd nesting is a 400 (not a 500), and the engine runs
 * off the main thread so other requests are answered while a heavy computation runs.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import * as compute from '@/app/api/compute/route';
import * as bridges from '@/app/api/bridges/route';
import * as health from '@/app/api/health/route';
import { demoBridges } from '@/lib/demo/bridges';
import { Bridge } from '@/models';
import { warmComputePool } from '@/lib/workers/compute-pool';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
const base = demoBridges[0];

beforeAll(async () => {
  people = await makeUsers();
  await warmComputePool();
});

const post = (body: unknown, path = '/api/compute') => call(compute.POST, { method: 'POST', path, cookie: people.crew.cookie, body });

describe('sizes no bridge reaches', () => {
  const cases: [string, Record<string, unknown>, RegExp][] = [
    ['points_per_span', { points_per_span: 201 }, /points_per_span is 201; the limit is 200/],
    ['chord_spaces', { chord_spaces: 201 }, /chord_spaces is 201; the limit is 200/],
    ['alignment.elements', { alignment: { ...base.alignment, elements: Array.from({ length: 10_001 }, () => ({ type: 'line', length: 1 })) } }, /alignment elements is 10001; the limit is 10000/],
    ['bents', { bents: Array.from({ length: 201 }, (_, i) => ({ name: `B${i}`, station: 1200 + i, skew_deg: 0 })) }, /bents is 201; the limit is 200/],
    ['girders', { girders: Array.from({ length: 41 }, (_, i) => ({ name: `G${i}`, layout: 'chord', offsets: [0, 0, 0, 0] })) }, /girders is 41; the limit is 40/],
    ['top_of_girder', { top_of_girder: Array.from({ length: 50_001 }, () => ({})) }, /surveyed girder tops is 50001; the limit is 50000/],
    ['deflections.0.values', { deflections: [{ girder: 'G1', span: 1, values: Array.from({ length: 202 }, () => 0) }] }, /values is 202; the limit is 201/],
  ];
  for (const [path, change, message] of cases) {
    it(`${path} over its limit → 422 naming the limit`, async () => {
      const res = await post({ ...base, ...change });
      expect(res.status).toBe(422);
      expect(res.json.error).toMatch(message);
      expect(Object.keys(res.json.fields)).toContain(path);
    });
  }

  it('also with ?interior=1 (the reproduced 16.7 s, 70 MB request answers 422 at once)', async () => {
    const res = await post({ ...base, points_per_span: 10_000 }, '/api/compute?interior=1');
    expect(res.status).toBe(422);
    expect(res.text.length).toBeLessThan(2000);
  });
});

describe('short error bodies', () => {
  it('10,000 bad alignment elements: the first 20 problems and a count', async () => {
    const elements = Array.from({ length: 10_000 }, () => ({ type: 'bogus', length: -1 }));
    const res = await post({ ...base, alignment: { ...base.alignment, elements } });
    expect(res.status).toBe(400);
    const listed = Object.values(res.json.fields as Record<string, string[]>).flat().length;
    expect(listed).toBeLessThanOrEqual(20);
    expect(res.json.problem_count).toBeGreaterThanOrEqual(10_000);
    expect(res.text.length).toBeLessThan(10_000);
  });
});

describe('absurd nesting', () => {
  // Written as text: JSON.stringify itself cannot nest that deep.
  const deep = '{"a":'.repeat(5000) + '"x"' + '}'.repeat(5000);
  const withDeepExtra = (doc: unknown) => JSON.stringify(doc).replace('"__deep__"', deep);

  it('an extra field nested 5,000 levels deep is a 400, not a 500, and nothing is written', async () => {
    const before = await Bridge.count();
    const save = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, rawBody: withDeepExtra({ name: 'Deep', description: { ...base, extra: '__deep__' } }) });
    expect(save.status).toBe(400);
    expect(save.json.error).toMatch(/nests deeper/);
    expect(await Bridge.count()).toBe(before);
    const res = await call(compute.POST, { method: 'POST', cookie: people.crew.cookie, rawBody: withDeepExtra({ ...base, extra: '__deep__' }) });
    expect(res.status).toBe(400);
  });
});

describe('a heavy computation does not hold up other requests', () => {
  it('health answers while the heaviest kind of allowed compute is still running', async () => {
    // 40 girders × 7 spans × 201 points: inside every limit, seconds of engine work.
    const bents = Array.from({ length: 8 }, (_, i) => ({ name: `B${i + 1}`, station: 1200 + i * 35, skew_deg: 0 }));
    const girders = Array.from({ length: 40 }, (_, i) => ({ name: `G${i + 1}`, layout: 'chord', offsets: bents.map(() => -18 + i * 0.9) }));
    const heavy = { ...base, bents, girders, points_per_span: 200, chord_spaces: 200, top_of_girder: [] };
    let computed = false;
    const running = post(heavy, '/api/compute?interior=1').then((r) => {
      computed = true;
      return r;
    });
    const ok = await call(health.GET);
    expect(ok.status).toBe(200);
    expect(computed).toBe(false);
    const res = await running;
    expect(res.status).toBe(200);
    expect(res.json.points.length).toBe(40 * 7 * 201);
  });
});
