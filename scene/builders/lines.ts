/**
 * Line work: the form's bottom outside edge at the form target, the string lines between girder
 * ends, and the alignment (profile grade line). Each returns segment pairs for one LineSegments
 * draw call.
 */
import type { BridgeDescription, BridgeModel, OffsetTable } from '@/lib/geometry';
import { formEdgeY, girderTopY, overhangRuns, type PourState } from './runs';
import { writeScenePoint, type SceneFrame } from './frame';
import type { Units } from '@/lib/units';

/** How far above the top flange the string line is drawn (bridge units, true size): 1 in / 25 mm. */
export function stringLineLift(units: Units): number {
  return units === 'm' ? 0.025 : 1 / 12;
}

/**
 * Form edge: for every overhang run, segments between consecutive rows through
 * (edge_x, edge_y, form_target). The vertices are exactly the engine's numbers, transformed.
 */
export function buildFormEdgeSegments(table: Pick<OffsetTable, 'points'>, frame: SceneFrame, pour?: PourState): Float32Array {
  const runs = overhangRuns(table);
  let count = 0;
  for (const r of runs) count += Math.max(0, r.rows.length - 1);
  const out = new Float32Array(count * 6);
  let o = 0;
  for (const r of runs) {
    for (let i = 0; i + 1 < r.rows.length; i++) {
      const a = r.rows[i];
      const b = r.rows[i + 1];
      writeScenePoint(frame, a.edge_x as number, a.edge_y as number, a.form_target as number, out, o);
      writeScenePoint(frame, b.edge_x as number, b.edge_y as number, b.form_target as number, out, o + 3);
      if (pour) {
        out[o + 1] = formEdgeY(a, frame, pour);
        out[o + 4] = formEdgeY(b, frame, pour);
      }
      o += 6;
    }
  }
  return out;
}

/**
 * String lines: for every exterior girder and span, one segment from the girder's centre at point 0
 * to its centre at point n, `lift` (true size) above the top flange.
 */
export function buildStringLineSegments(table: Pick<OffsetTable, 'points'>, frame: SceneFrame, lift: number, pour?: PourState): Float32Array {
  const runs = overhangRuns(table);
  const out = new Float32Array(runs.length * 6);
  runs.forEach((r, k) => {
    const a = r.rows[0];
    const b = r.rows[r.rows.length - 1];
    writeScenePoint(frame, a.x, a.y, 0, out, k * 6);
    writeScenePoint(frame, b.x, b.y, 0, out, k * 6 + 3);
    out[k * 6 + 1] = girderTopY(a, frame, pour) + lift;
    out[k * 6 + 4] = girderTopY(b, frame, pour) + lift;
  });
  return out;
}

/**
 * The alignment at the profile grade (top of deck at offset 0) from `pad` before the first bent to
 * `pad` past the last, as consecutive segments every `step` (bridge units).
 */
export function buildAlignmentSegments(desc: BridgeDescription, model: BridgeModel, frame: SceneFrame, pad: number, step: number): Float32Array {
  const s0 = desc.bents[0].station - pad;
  const s1 = desc.bents[desc.bents.length - 1].station + pad;
  const n = Math.max(1, Math.ceil((s1 - s0) / step));
  const out = new Float32Array(n * 6);
  const at = (i: number, o: number) => {
    const s = s0 + ((s1 - s0) * i) / n;
    const p = model.alignment.pointAt(s);
    writeScenePoint(frame, p.x, p.y, model.surface.topOfDeckAtStationOffset(s, 0), out, o);
  };
  for (let i = 0; i < n; i++) {
    at(i, i * 6);
    at(i + 1, i * 6 + 3);
  }
  return out;
}
