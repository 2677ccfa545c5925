import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { computeOffsetTable, createBridgeModel, pointOnSkewedLine, type BridgeDescription } from '@/lib/geometry';
import { demoBridges } from '@/lib/demo/bridges';

// Plane geometry is unchanged by a translation (Euclid; any surveying text), so a bridge laid out on
// state-plane coordinates in the millions must give the same stations, offsets, widths and
// elevations as the same bridge near the origin, and plan points moved by exactly the translation.
function moved(bridge: BridgeDescription, x: number, y: number): BridgeDescription {
  return { ...bridge, alignment: { ...bridge.alignment, start_x: x, start_y: y } };
}

describe('state-plane sized coordinates', () => {
  it('give the same table as the bridge near the origin, translated', () => {
    fc.assert(
      fc.property(fc.constantFrom(...demoBridges), fc.double({ min: -3e7, max: 3e7, noNaN: true }), fc.double({ min: -3e7, max: 3e7, noNaN: true }), (bridge, x, y) => {
        const near = computeOffsetTable(moved(bridge, 0, 0));
        const far = computeOffsetTable(moved(bridge, x, y));
        expect(far.points.length).toBe(near.points.length);
        far.points.forEach((p, i) => {
          const q = near.points[i];
          for (const k of ['station', 'offset', 'edge_width', 'edge_drop', 'form_target', 'edge_station'] as const) {
            if (q[k] === null) expect(p[k]).toBeNull();
            else expect(Math.abs((p[k] as number) - (q[k] as number))).toBeLessThan(1e-7);
          }
          expect(Math.abs(p.x - (q.x + x))).toBeLessThan(1e-6);
          expect(Math.abs(p.y - (q.y + y))).toBeLessThan(1e-6);
        });
        far.chord_offsets.forEach((c, i) => c.offsets.forEach((o, j) => expect(Math.abs(o.offset - near.chord_offsets[i].offsets[j].offset)).toBeLessThan(1e-7)));
      }),
      { numRuns: 20 },
    );
    // Three demo bridges (one with spirals) × 20 runs × two tables: room for a busy machine.
  }, 60000);

  it('let the lower-level model solve bent points on absolute coordinates too', () => {
    const base = demoBridges[0];
    const far = createBridgeModel(moved(base, 2_150_000, 750_000)).alignment;
    const near = createBridgeModel(moved(base, 0, 0)).alignment;
    for (const bent of base.bents) {
      for (const offset of [base.deck.left_edge_offset, base.girders[0].offsets[0], base.deck.right_edge_offset]) {
        const a = pointOnSkewedLine(far, bent.station, bent.skew_deg, offset);
        const b = pointOnSkewedLine(near, bent.station, bent.skew_deg, offset);
        expect(Math.abs(a.x - 2_150_000 - b.x)).toBeLessThan(1e-6);
        expect(Math.abs(a.y - 750_000 - b.y)).toBeLessThan(1e-6);
        expect(Math.abs(a.offset - offset)).toBeLessThan(1e-6);
      }
    }
  });
});
