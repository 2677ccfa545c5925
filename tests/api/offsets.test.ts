import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import type { BridgeDescription } from '@/lib/geometry';
import * as offsets from '@/app/api/bridges/[id]/offsets/route';
import * as offsetsCsv from '@/app/api/bridges/[id]/offsets.csv/route';
import * as survey from '@/app/api/bridges/[id]/survey/route';
import { createBridge } from '@/lib/services/bridges';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

const run = promisify(execFile);
const root = path.resolve(__dirname, '../..');
let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
});

/** The `offsets` command's JSON for a description, run as a separate process on a temp file. */
async function commandTable(description: BridgeDescription): Promise<unknown> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-cli-'));
  const file = path.join(dir, 'bridge.json');
  fs.writeFileSync(file, JSON.stringify(description));
  try {
    const { stdout } = await run('npx', ['tsx', 'lib/cli/offsets.ts', file], { cwd: root, maxBuffer: 64 * 1024 * 1024 });
    return JSON.parse(stdout);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Walks two JSON values side by side and lists every difference: numbers beyond a relative 1e-9
 * (both are the same double arithmetic, so any real difference is far larger), other leaves by
 * equality, objects by their key sets and arrays by length.
 */
function differences(a: unknown, b: unknown, where = '$', out: string[] = []): string[] {
  if (out.length > 20) return out;
  if (typeof a === 'number' && typeof b === 'number') {
    if (Math.abs(a - b) > 1e-9 * Math.max(1, Math.abs(a), Math.abs(b))) out.push(`${where}: ${a} vs ${b}`);
  } else if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) out.push(`${where}: length ${a.length} vs ${b.length}`);
    else a.forEach((x, i) => differences(x, b[i], `${where}[${i}]`, out));
  } else if (a && b && typeof a === 'object' && typeof b === 'object') {
    const ka = Object.keys(a).sort();
    const kb = Object.keys(b).sort();
    if (ka.join() !== kb.join()) out.push(`${where}: keys ${ka.join()} vs ${kb.join()}`);
    else for (const k of ka) differences((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${where}.${k}`, out);
  } else if (a !== b) out.push(`${where}: ${JSON.stringify(a)} vs ${JSON.stringify(b)}`);
  return out;
}

function countNumbers(v: unknown): number {
  if (typeof v === 'number') return 1;
  if (Array.isArray(v)) return v.reduce((n: number, x) => n + countNumbers(x), 0);
  if (v && typeof v === 'object') return Object.values(v).reduce((n: number, x) => n + countNumbers(x), 0);
  return 0;
}

describe('offsets over HTTP equal the offsets command', () => {
  for (const [i, demo] of demoBridges.entries()) {
    it(`demo bridge ${i + 1} (${demo.name}): GET /api/bridges/:id/offsets matches \`offsets\` number by number`, async () => {
      const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: `HTTP vs command ${i}`, description: demo });
      const [http, cli] = await Promise.all([call(offsets.GET, { cookie: people.crew.cookie, params: { id: String(id) } }), commandTable(demo)]);
      expect(http.status).toBe(200);
      expect(differences(http.json, cli)).toEqual([]);
      // The comparison must have covered a real table, not two empty ones.
      expect(countNumbers(cli)).toBeGreaterThan(1000);
    }, 120000);
  }

  it('after a survey import, the HTTP table equals the command run on the description with those tops of girder', async () => {
    const demo = demoBridges[0];
    const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: 'HTTP vs command with survey', description: demo });
    // G1 span 1 point 10 is also in the description's own list: the survey must win there.
    const rows = [
      { girder: 'G1', span: 1, point: 10, elevation: 253.61 },
      { girder: 'G5', span: 2, point: 7, elevation: 254.02 },
      { girder: 'G3', span: 3, point: 20, elevation: 252.95 },
    ];
    const csv = `girder,span,point,elevation\n${rows.map((r) => `${r.girder},${r.span},${r.point},${r.elevation}`).join('\n')}\n`;
    const stored = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id: String(id) }, body: { csv } });
    expect(stored.status, stored.text).toBe(201);
    const own = (demo.top_of_girder ?? []).filter((t) => !rows.some((r) => r.girder === t.girder && r.span === t.span && r.point === t.point));
    const merged: BridgeDescription = { ...demo, top_of_girder: [...own, ...rows] };
    const [http, cli] = await Promise.all([call(offsets.GET, { cookie: people.crew.cookie, params: { id: String(id) } }), commandTable(merged)]);
    expect(http.status).toBe(200);
    expect(differences(http.json, cli)).toEqual([]);
    const g1 = (http.json.points as { girder: string; span: number; point: number; top_of_girder: number | null }[]).find((p) => p.girder === 'G1' && p.span === 1 && p.point === 10);
    expect(g1?.top_of_girder).toBeCloseTo(253.61, 9);
  }, 120000);
});

describe('CSV export', () => {
  it('follows the chosen style and refuses an unknown one', async () => {
    const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: 'CSV styles', description: demoBridges[0] });
    const feet = await call(offsetsCsv.GET, { cookie: people.crew.cookie, params: { id: String(id) }, path: `/api/bridges/${id}/offsets.csv?style=decimal-feet` });
    const inches = await call(offsetsCsv.GET, { cookie: people.crew.cookie, params: { id: String(id) }, path: `/api/bridges/${id}/offsets.csv?style=feet-inches` });
    const bad = await call(offsetsCsv.GET, { cookie: people.crew.cookie, params: { id: String(id) }, path: `/api/bridges/${id}/offsets.csv?style=furlongs` });
    expect(feet.text.split('\n')[0]).toContain('edge_width_ft');
    expect(inches.text.split('\n')[0]).toContain('edge_width_ft_in');
    expect(inches.text).toMatch(/\d+'-\d+( \d\/\d)?"/);
    expect(bad.status).toBe(400);
    expect(bad.json.fields.style).toBeTruthy();
  });
});
