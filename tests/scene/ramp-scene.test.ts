/**
 * The 3D scene's builders on the ramp demo bridge (a clothoid spiral into a curve, a flared right edge,
 * girders that spread with the flare): bent caps sized to the girders on their own bent line, and the
 * deck edge drawn through the engine's edge points, which follow the spiral and the flare without a
 * corner where the alignment changes element. Expected positions are the engine's (lib/geometry);
 * the cap reach of 3 ft past the outer girder is the scene's own choice (common practice for a
 * drawing, not a design value).
 */
import { describe, expect, it } from 'vitest';
import { bentLinePoint, computeOffsetTable, createBridgeModel, edgeOffsetAt } from '@/lib/geometry';
import { demoBridges } from '@/lib/demo/bridges';
import { buildBents } from '@/scene/builders/bents';
import { buildDeckTop } from '@/scene/builders/deck';
import { frameForTable } from '@/scene/builders/frame';
import { applyMatrix } from '@/scene/builders/instances';

const ramp = demoBridges[2];
const table = computeOffsetTable(ramp);
const model = createBridgeModel(ramp);
const frame = frameForTable(table);
// float32 scene coordinates a few hundred feet from the origin.
const TOL = 2e-3;

describe('ramp bridge scene (spiral, flared edge)', () => {
  it('sizes each bent cap to the girders on its own bent line, so no cap sticks out past the narrow end of the flared deck', () => {
    const b = buildBents(ramp, model, table, frame, 6, 'ft');
    ramp.bents.forEach((bent, i) => {
      const offsets = ramp.girders.map((g) => g.offsets[i]);
      for (const [end, offset] of [
        [-0.5, Math.min(...offsets) - 3],
        [0.5, Math.max(...offsets) + 3],
      ] as const) {
        const p = bentLinePoint(model.alignment, bent, offset);
        const at = applyMatrix(b.caps, i, end, 0, 0);
        expect(Math.abs(at[0] - (p.x - frame.originX))).toBeLessThan(TOL);
        expect(Math.abs(at[2] + (p.y - frame.originY))).toBeLessThan(TOL);
      }
      // Inside the deck edges at that bent.
      expect(Math.max(...offsets) + 3).toBeLessThanOrEqual(edgeOffsetAt(ramp.deck, 'right', bent.station));
      expect(Math.min(...offsets) - 3).toBeGreaterThanOrEqual(edgeOffsetAt(ramp.deck, 'left', bent.station));
    });
  });

  it('draws the deck top out to the flared edge at every grid station, along the spiral', () => {
    const top = buildDeckTop(ramp, model, frame, 24);
    const cols = 5;
    const rows = top.positions.length / 3 / cols;
    expect(rows).toBe((ramp.bents.length - 1) * 25);
    for (let r = 0; r < rows; r++) {
      const right = (r * cols + cols - 1) * 3;
      const e = top.positions[right] + frame.originX;
      const n = frame.originY - top.positions[right + 2];
      const so = model.alignment.stationOffset(e, n);
      // The grid's right edge vertex lies on the engine's flared edge line (offset = edge offset at its station).
      expect(Math.abs(so.offset - edgeOffsetAt(ramp.deck, 'right', so.station))).toBeLessThan(5e-3);
    }
  });
});
