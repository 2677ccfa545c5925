// Large, awkward and hostile descriptions: the checks answer by name and never crash (split from validate.test.ts).
import { describe, it, expect } from 'vitest';
import { computeOffsetTable, parseBridge, validateGeometry, type BridgeDescription } from '@/lib/geometry';
import { arcBridge, straightBridge } from './helpers';

function messages(bridge: BridgeDescription): string {
  return validateGeometry(bridge)
    .map((i) => i.message)
    .join('\n');
}

describe('large and awkward input', () => {
  it('200 points per span (the most the contract allows) completes and agrees with tenth points', () => {
    // Girder point k of n = 10 is point 20·k of n = 200 (same fraction of the span).
    const coarse = computeOffsetTable(arcBridge({ radius: 900, direction: 'right', spans: [110, 130], skews: [5, -10, 15], n: 10, m: 10 }));
    const fine = computeOffsetTable(arcBridge({ radius: 900, direction: 'right', spans: [110, 130], skews: [5, -10, 15], n: 200, m: 200 }));
    expect(fine.points.length).toBe(2 * 2 * 201);
    for (const p of coarse.points) {
      const q = fine.points.find((r) => r.span === p.span && r.girder === p.girder && r.side === p.side && r.point === p.point * 20);
      expect(q).toBeDefined();
      for (const key of ['x', 'y', 'station', 'offset', 'edge_width', 'edge_drop', 'form_target'] as const) {
        expect(Math.abs((q?.[key] as number) - (p[key] as number))).toBeLessThan(1e-9);
      }
    }
    for (const set of coarse.chord_offsets) {
      const f = fine.chord_offsets.find((c) => c.span === set.span && c.side === set.side);
      expect(Math.abs((f?.offsets[100].offset ?? NaN) - set.offsets[5].offset)).toBeLessThan(1e-9);
    }
  }, 60000);

  it('bent lines crossing inside the deck are refused', () => {
    // Two bents 20 ft apart with opposite 40° skews meet inside a 40 ft deck.
    const b = straightBridge({
      bents: [
        { name: 'Bent 1', station: 100, skew_deg: 40 },
        { name: 'Bent 2', station: 120, skew_deg: -40 },
      ],
    });
    expect(messages(b)).toMatch(/not up-station/);
  });
});

describe('hostile input never crashes the checks', () => {
  it('numbers too large for any bridge are refused by name, not left to overflow the solvers', () => {
    // Regression: an arc of radius and length Number.MAX_VALUE with a bent at station MAX_VALUE once
    // crashed the inverse (found by the property below). Common practice: no real dimension nears 1e9.
    const b = straightBridge({
      alignment: {
        start_station: 0,
        start_x: 0,
        start_y: 0,
        start_bearing_deg: 0,
        elements: [
          { type: 'line', length: 150 },
          { type: 'arc', length: Number.MAX_VALUE, radius: Number.MAX_VALUE, direction: 'right' },
        ],
      },
      bents: [
        { name: 'Bent 1', station: 120, skew_deg: 0 },
        { name: 'Bent 2', station: Number.MAX_VALUE, skew_deg: 0 },
      ],
    });
    const r = parseBridge(b);
    expect(r.ok).toBe(false);
    if (!r.ok && r.kind === 'geometry') {
      expect(r.issues.map((i) => i.path)).toEqual(expect.arrayContaining(['alignment.elements.1.length', 'alignment.elements.1.radius', 'bents.1.station']));
    }
    expect(messages(b)).toMatch(/beyond the ±1,000,000,000/);
  });

  it('parseBridge answers ok or a located problem for wild numbers (property)', async () => {
    const fc = (await import('fast-check')).default;
    const wild = fc.oneof(
      fc.double({ noNaN: false }),
      fc.constantFrom(0, -0, 1e-300, -1e300, 1e300, Number.MAX_VALUE, Number.NaN, Infinity, -Infinity),
      fc.double({ min: -100, max: 100, noNaN: true }),
    );
    fc.assert(
      fc.property(fc.record({ radius: wild, length: wild, skew: wild, station: wild, offset: wild, edge: wild, slope: wild, curve: wild }), (w) => {
        const b = straightBridge({
          alignment: {
            start_station: 0,
            start_x: 0,
            start_y: 0,
            start_bearing_deg: 0,
            elements: [
              { type: 'line', length: 150 },
              { type: 'arc', length: w.length, radius: w.radius, direction: 'right' },
              { type: 'line', length: 300 },
            ],
          },
          profile: {
            pvis: [
              { station: 0, elevation: 100 },
              { station: 150, elevation: 101, curve_length: w.curve },
              { station: 900, elevation: 99 },
            ],
          },
          cross_slopes: [{ station: 0, left: w.slope, right: -0.02 }],
          bents: [
            { name: 'Bent 1', station: 120, skew_deg: w.skew },
            { name: 'Bent 2', station: w.station, skew_deg: 0 },
          ],
          girders: [
            { name: 'G1', layout: 'chord', offsets: [w.offset, -16] },
            { name: 'G2', layout: 'curved', offsets: [16, 16] },
          ],
          deck: { ...straightBridge().deck, left_edge_offset: w.edge },
        });
        // JSON cannot carry NaN or Infinity; hand the object over as an API would receive it parsed.
        const r = parseBridge(b);
        if (r.ok) {
          // A description that passes must compute.
          const t = computeOffsetTable(r.bridge);
          for (const p of t.points) for (const v of [p.x, p.y, p.station, p.offset, p.top_of_deck, p.edge_width ?? 0, p.edge_drop ?? 0]) expect(Number.isFinite(v)).toBe(true);
        } else {
          expect(r.message.length).toBeGreaterThan(0);
          if (r.kind === 'geometry') for (const issue of r.issues) expect(issue.path.length).toBeGreaterThan(0);
        }
      }),
      { numRuns: 300 },
    );
  }, 60000);
});
