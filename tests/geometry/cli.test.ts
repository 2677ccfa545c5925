import { describe, it, expect, beforeAll, afterAll } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { computeOffsetTable } from '@/lib/geometry';
import { straightBridge } from './helpers';

const root = path.resolve(__dirname, '../..');
const tsx = path.join(root, 'node_modules', '.bin', 'tsx');
let dir = '';

function run(...args: string[]) {
  const r = spawnSync(tsx, [path.join(root, 'lib/cli/offsets.ts'), ...args], { cwd: root, encoding: 'utf8', timeout: 60000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}

function file(name: string, text: string): string {
  const p = path.join(dir, name);
  writeFileSync(p, text);
  return p;
}

beforeAll(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'chordline-cli-'));
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

describe('offsets command', () => {
  it('prints the same table as computeOffsetTable as JSON', () => {
    const bridge = straightBridge({
      bents: [
        { name: 'Bent 1', station: 100, skew_deg: 12 },
        { name: 'Bent 2', station: 230, skew_deg: -5 },
      ],
    });
    const r = run(file('ok.json', JSON.stringify(bridge)));
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    // JSON carries doubles exactly (shortest round-trip text), so the parsed table equals the computed one.
    expect(JSON.parse(r.stdout)).toEqual(computeOffsetTable(bridge));
  }, 60000);

  it('prints CSV with a header row and one row per girder point', () => {
    const bridge = straightBridge();
    const r = run(file('ok.json', JSON.stringify(bridge)), '--format', 'csv');
    expect(r.code).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[0]).toBe('span,girder,side,point,station,offset,edge_width_ft,edge_drop_ft,form_target_ft,top_of_girder_ft,buildup_ft,drop_from_girder_top_ft,top_of_deck_ft,bottom_of_slab_ft');
    expect(lines).toHaveLength(1 + computeOffsetTable(bridge).points.length);
    // Girder G1 point 0: station 1+00.00, 16 ft left, 4 ft overhang (straight bridge, hand-checked).
    expect(lines[1]).toMatch(/^1,G1,left,0,1\+00\.00,16\.00 LT,4\.00,/);
    // Every girder, interior ones too, carries its top of deck and bottom of slab (the designer's
    // elevations), rounded to 0.01 ft like every elevation in the export.
    const table = computeOffsetTable(bridge);
    table.points.forEach((p, i) => {
      const cells = lines[i + 1].split(',');
      expect(cells.slice(-2)).toEqual([p.top_of_deck.toFixed(2), p.bottom_of_slab.toFixed(2)]);
    });
    expect(table.points.some((p) => p.side === 'interior')).toBe(true);
  }, 60000);

  it.each([
    ['a missing file', () => path.join(dir, 'nope.json'), /cannot read the file/],
    ['bad JSON', () => file('bad.json', '{"name": '), /not valid JSON/],
    ['a schema error', () => file('schema.json', JSON.stringify({ ...straightBridge(), units: 'furlongs' })), /units: Units must be "ft" or "m"/],
    [
      'a geometry error',
      () =>
        file(
          'geo.json',
          JSON.stringify(
            straightBridge({
              girders: [
                { name: 'G1', layout: 'chord', offsets: [-16, -20.3] },
                { name: 'G2', layout: 'chord', offsets: [16, 16] },
              ],
            }),
          ),
        ),
      /Span 1, girder G1, point 10: the girder point is at or beyond the left deck edge \(edge width -0\.30 ft\)/,
    ],
  ])(
    'exits 1 with one stderr line for %s',
    (_what, make, pattern) => {
      const r = run(make());
      expect(r.code).toBe(1);
      expect(r.stdout).toBe('');
      const lines = r.stderr.split('\n').filter((l) => l.length > 0);
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(pattern);
    },
    60000,
  );

  it('prints every problem on its own line, the first 20 and then a count', () => {
    const b = straightBridge();
    const slopes = Array.from({ length: 25 }, (_, i) => ({ station: i * 10, left: 0.8, right: -0.02 }));
    const r = run(file('many.json', JSON.stringify({ ...b, cross_slopes: slopes })));
    expect(r.code).toBe(1);
    const lines = r.stderr.split('\n').filter((l) => l.length > 0);
    expect(lines).toHaveLength(21);
    expect(lines[3]).toMatch(/many\.json: cross_slopes\.3\.left: 0\.8 is steeper than 15 %; did you mean 0\.08\?/);
    expect(lines[20]).toMatch(/and 5 more problems/);
  }, 60000);
});
