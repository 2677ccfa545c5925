/**
 * The compute worker's answer bytes (lib/workers/json-utf8.ts) are exactly the UTF-8 encoding of
 * JSON.stringify of the same value, byte for byte, whatever the array lengths around the slice size and
 * whatever characters the names hold. The reference is the platform's own JSON.stringify and
 * TextEncoder (WHATWG Encoding Standard), not this project's code.
 */
import { describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, parseBridgeSchema } from '@/lib/geometry';
import { jsonUtf8 } from '@/lib/workers/json-utf8';

const reference = (value: unknown) => new TextEncoder().encode(JSON.stringify(value));

describe('jsonUtf8', () => {
  it('writes every demo bridge’s offset table, interior rows included, exactly as JSON.stringify does', () => {
    for (const bridge of demoBridges) {
      const parsed = parseBridgeSchema(structuredClone(bridge));
      if (!parsed.ok) throw new Error(parsed.message);
      const table = computeOffsetTable(parsed.bridge);
      expect(table.points.length).toBeGreaterThan(64);
      expect(Buffer.from(jsonUtf8(table)).equals(Buffer.from(reference(table)))).toBe(true);
    }
  });

  it('joins the slices of arrays just under, at and just over the slice size, and of empty arrays', () => {
    for (const n of [0, 1, 63, 64, 65, 127, 128, 129, 1000]) {
      const rows = Array.from({ length: n }, (_, i) => ({ i, x: i / 3, name: `G${i}`, gone: undefined, none: null }));
      const value = { before: 1, rows, after: [[1, 2], []], text: 'end' };
      expect(new TextDecoder().decode(jsonUtf8(value))).toBe(JSON.stringify(value));
      expect(Buffer.from(jsonUtf8(value)).equals(Buffer.from(reference(value)))).toBe(true);
    }
  });

  it('keeps non-ASCII names, surrogate pairs and escapes, leaves out undefined keys and writes {} for nothing', () => {
    const rows = Array.from({ length: 150 }, (_, i) => ({ girder: i % 2 ? 'Träger Ø 7 · “west”' : 'beam \u{1F309} "quoted" \\ \n tab\t', value: -i * 1e-9 }));
    const value = { units: 'm', skipped: undefined, rows, nested: { a: [1, 'two', null, true] } };
    expect(Buffer.from(jsonUtf8(value)).equals(Buffer.from(reference(value)))).toBe(true);
    expect(new TextDecoder().decode(jsonUtf8({}))).toBe('{}');
    expect(new TextDecoder().decode(jsonUtf8({ only: undefined }))).toBe('{}');
  });

  it('gives a buffer of its own, so it can be moved to another thread', () => {
    const bytes = jsonUtf8({ a: 1 });
    expect(bytes.byteOffset).toBe(0);
    expect(bytes.buffer.byteLength).toBe(bytes.byteLength);
  });
});
