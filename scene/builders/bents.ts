/**
 * Bents: a cap under the girders along each bent line and columns down to the ground, as instance
 * matrices, plus where to hang each bent's label.
 */
import { bentLinePoint, edgeOffsetAt, type BridgeDescription, type BridgeModel, type OffsetTable } from '@/lib/geometry';
import { girderTopOf } from './runs';
import { sceneY, type SceneFrame } from './frame';
import { writeBeamMatrix } from './instances';

export interface BentInstances {
  caps: Float32Array;
  columns: Float32Array;
  columnCount: number;
  /** Label anchor above each bent's left end (scene units, 3 floats per bent). */
  labels: Float32Array;
  /** Scene y of the ground plane. */
  groundY: number;
}

/**
 * Caps span from 3 ft (0.9 m) outside the outer girders on each bent line, their top one girder depth under the
 * lowest girder top on that bent line; three columns per bent (two when the cap is short) down to
 * a ground `clearance` below the lowest cap.
 */
export function buildBents(desc: BridgeDescription, model: BridgeModel, table: Pick<OffsetTable, 'points'>, frame: SceneFrame, girderDepth: number, units: 'ft' | 'm'): BentInstances {
  const u = units === 'm' ? 0.3048 : 1;
  const capDepth = 3.5 * u;
  const capWidth = 4 * u;
  const colSize = 3 * u;
  const clearance = 16 * u;
  const nb = desc.bents.length;
  // Each cap reaches 3 ft past the outer girders on its own bent line: girders that spread along a
  // flared deck sit at different offsets on each bent, and a cap sized for all of them would stick
  // out past the narrow end of the deck.
  const reach = (b: number): [number, number] => {
    const offsets = desc.girders.map((g) => g.offsets[b]);
    return [Math.min(...offsets) - 3 * u, Math.max(...offsets) + 3 * u];
  };
  let widest = 0;
  const caps = new Float32Array(nb * 16);
  const labels = new Float32Array(nb * 3);
  const capEnds: Array<{ a: [number, number, number]; b: [number, number, number] }> = [];
  let lowest = Infinity;
  for (let b = 0; b < nb; b++) {
    // Girder tops at this bent: point n of span b and point 0 of span b + 1.
    let minTop = Infinity;
    for (const p of table.points) {
      const onBent = (p.span === b && p.fraction === 1) || (p.span === b + 1 && p.fraction === 0);
      if (onBent) minTop = Math.min(minTop, girderTopOf(p));
    }
    if (!Number.isFinite(minTop)) minTop = model.profile.elevationAt(desc.bents[b].station);
    const capY = sceneY(frame, minTop) - girderDepth - capDepth / 2;
    const [lo, hi] = reach(b);
    widest = Math.max(widest, hi - lo);
    const pa = bentLinePoint(model.alignment, desc.bents[b], lo);
    const pb = bentLinePoint(model.alignment, desc.bents[b], hi);
    const a: [number, number, number] = [pa.x - frame.originX, capY, -(pa.y - frame.originY)];
    const e: [number, number, number] = [pb.x - frame.originX, capY, -(pb.y - frame.originY)];
    writeBeamMatrix(caps, b, a[0], a[1], a[2], e[0], e[1], e[2], capWidth, capDepth);
    capEnds.push({ a, b: e });
    const leftEdge = edgeOffsetAt(desc.deck, 'left', desc.bents[b].station);
    const lp = bentLinePoint(model.alignment, desc.bents[b], leftEdge - 4 * u);
    labels[b * 3] = lp.x - frame.originX;
    labels[b * 3 + 1] = sceneY(frame, model.surface.topOfDeckAtStationOffset(lp.station, leftEdge)) + 5 * u;
    labels[b * 3 + 2] = -(lp.y - frame.originY);
    lowest = Math.min(lowest, capY - capDepth / 2);
  }
  const groundY = lowest - clearance;
  const perBent = widest > 30 * u ? 3 : 2;
  const columns = new Float32Array(nb * perBent * 16);
  let k = 0;
  for (const { a, b } of capEnds) {
    for (let c = 0; c < perBent; c++) {
      const t = (c + 0.5) / perBent;
      const x = a[0] + (b[0] - a[0]) * t;
      const z = a[2] + (b[2] - a[2]) * t;
      const top = a[1] + (b[1] - a[1]) * t - capDepth / 2;
      writeBeamMatrix(columns, k++, x, groundY, z, x, top, z, colSize, colSize);
    }
  }
  return { caps, columns, columnCount: k, labels, groundY };
}
