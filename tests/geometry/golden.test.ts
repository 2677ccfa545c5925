/**
 * Golden tables: the full JSON offset table of every demo bridge is checked in under
 * tests/geometry/golden/ and compared on every run, number by number to 1e-9, so any drift in any
 * number shows as a failing test and, once accepted, as a visible diff. Regenerate only on purpose:
 *   REGEN=1 npx vitest run --config tests/vitest.config.mts --project unit tests/geometry/golden.test.ts
 */
import { describe, expect, it } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable } from '@/lib/geometry';

const dir = path.join(__dirname, 'golden');
const regen = process.env.REGEN === '1';

function slug(name: string): string {
  return name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

/** Every difference between two JSON values: numbers to 1e-9, everything else exactly; paths for the message. */
function differences(a: unknown, b: unknown, at: string, out: string[]): void {
  if (out.length >= 20) return;
  if (typeof a === 'number' && typeof b === 'number') {
    if (!(Math.abs(a - b) <= 1e-9)) out.push(`${at}: ${b} (golden ${a})`);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) out.push(`${at}: ${b.length} items (golden ${a.length})`);
    for (let i = 0; i < Math.min(a.length, b.length); i++) differences(a[i], b[i], `${at}.${i}`, out);
    return;
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) differences((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${at}.${k}`, out);
    return;
  }
  if (a !== b) out.push(`${at}: ${JSON.stringify(b)} (golden ${JSON.stringify(a)})`);
}

describe('golden offset tables of the demo bridges', () => {
  for (const bridge of demoBridges) {
    const file = path.join(dir, `${slug(bridge.name)}.json`);
    it(`${bridge.name} matches ${path.basename(file)} to 1e-9`, () => {
      const table = JSON.parse(JSON.stringify(computeOffsetTable(bridge)));
      if (regen) writeFileSync(file, `${JSON.stringify(table, null, 1)}\n`);
      expect(existsSync(file), `${file} is missing: run with REGEN=1 to create it`).toBe(true);
      const golden = JSON.parse(readFileSync(file, 'utf8'));
      const diffs: string[] = [];
      differences(golden, table, 'table', diffs);
      expect(diffs).toEqual([]);
    });
  }
});
