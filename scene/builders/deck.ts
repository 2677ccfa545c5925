/**
 * The deck slab: its top surface sampled from the engine's deck surface (so the crown, the
 * superelevation and the level zone under the barrier are the engine's), the overhang underside on
 * the form from each exterior girder out to the edge, the slab underside between the exterior
 * girders, and the edge band coloured by edge width.
 */
import { bentLinePoint, type BridgeDescription, type BridgeModel, type OffsetTable } from '@/lib/geometry';
import { edgeWidthRange, overhangRuns, type GirderRun } from './runs';
import { sceneY, writeScenePoint, type SceneFrame } from './frame';
import { rampColor, rampPosition } from './ramp';
import type { MeshArrays } from './girders';

/** Cross-section offsets where the deck top changes slope: edges, gutter lines and the crown. */
export function deckBreakOffsets(deck: BridgeDescription['deck']): number[] {
  const l = deck.left_edge_offset;
  const r = deck.right_edge_offset;
  const cand = [l, l + deck.left_barrier_width, 0, r - deck.right_barrier_width, r];
  const out: number[] = [];
  for (const o of cand) {
    if (o < l - 1e-9 || o > r + 1e-9) continue;
    if (out.length && Math.abs(o - out[out.length - 1]) < 1e-6) continue;
    if (out.length && o < out[out.length - 1]) continue;
    out.push(o);
  }
  return out;
}

/**
 * Top of deck between the first and last bent as a grid: along each span the grid lines run
 * between the bent lines (so a skewed deck ends square to its bents), across at the break
 * offsets. Elevations are the engine's top of deck at each grid point.
 * @param samplesPerSpan divisions along each span (≥ 1).
 */
export function buildDeckTop(desc: BridgeDescription, model: BridgeModel, frame: SceneFrame, samplesPerSpan = 24): MeshArrays {
  const offsets = deckBreakOffsets(desc.deck);
  const cols = offsets.length;
  const pos: number[] = [];
  const idx: number[] = [];
  const tmp = [0, 0, 0];
  for (let j = 0; j + 1 < desc.bents.length; j++) {
    const sa = offsets.map((o) => bentLinePoint(model.alignment, desc.bents[j], o).station);
    const sb = offsets.map((o) => bentLinePoint(model.alignment, desc.bents[j + 1], o).station);
    const base = pos.length / 3;
    for (let i = 0; i <= samplesPerSpan; i++) {
      const t = i / samplesPerSpan;
      for (let c = 0; c < cols; c++) {
        const s = sa[c] + t * (sb[c] - sa[c]);
        const p = model.alignment.pointAt(s, offsets[c]);
        writeScenePoint(frame, p.x, p.y, model.surface.topOfDeckAtStationOffset(s, offsets[c]), tmp, 0);
        pos.push(tmp[0], tmp[1], tmp[2]);
      }
    }
    for (let i = 0; i < samplesPerSpan; i++) {
      for (let c = 0; c + 1 < cols; c++) {
        const a = base + i * cols + c;
        const b = a + 1;
        const d = a + cols;
        const e = d + 1;
        idx.push(a, d, b, b, d, e);
      }
    }
  }
  return { positions: new Float32Array(pos), indices: new Uint32Array(idx) };
}

/**
 * Underside of the slab: on each side the overhang form from the exterior girder point (at bottom of
 * slab) out to the edge point (at the edge bottom), and between the two exterior girders the slab
 * bottom. Rows come straight from the engine.
 */
export function buildDeckUnderside(table: Pick<OffsetTable, 'points'>, frame: SceneFrame): MeshArrays {
  const pos: number[] = [];
  const idx: number[] = [];
  const runs = overhangRuns(table);
  const tmp = [0, 0, 0];
  const strip = (a: Array<[number, number, number]>, b: Array<[number, number, number]>) => {
    const base = pos.length / 3;
    const n = Math.min(a.length, b.length);
    for (let i = 0; i < n; i++) {
      writeScenePoint(frame, a[i][0], a[i][1], a[i][2], tmp, 0);
      pos.push(tmp[0], tmp[1], tmp[2]);
      writeScenePoint(frame, b[i][0], b[i][1], b[i][2], tmp, 0);
      pos.push(tmp[0], tmp[1], tmp[2]);
    }
    for (let i = 0; i + 1 < n; i++) {
      const r = base + i * 2;
      idx.push(r, r + 2, r + 1, r + 1, r + 2, r + 3);
    }
  };
  const bySpan = new Map<number, { left?: GirderRun; right?: GirderRun }>();
  for (const run of runs) {
    strip(
      run.rows.map((p) => [p.x, p.y, p.bottom_of_slab]),
      run.rows.map((p) => [p.edge_x as number, p.edge_y as number, p.edge_bottom as number]),
    );
    const e = bySpan.get(run.span) ?? {};
    e[run.side as 'left' | 'right'] = run;
    bySpan.set(run.span, e);
  }
  for (const { left, right } of bySpan.values()) {
    if (!left || !right || left.girder === right.girder) continue;
    strip(
      left.rows.map((p) => [p.x, p.y, p.bottom_of_slab]),
      right.rows.map((p) => [p.x, p.y, p.bottom_of_slab]),
    );
  }
  return { positions: new Float32Array(pos), indices: new Uint32Array(idx) };
}

export interface ColoredMeshArrays extends MeshArrays {
  colors: Float32Array;
}

/**
 * The deck edge coloured by edge width: the outside face of the slab (from the top of deck at the
 * edge down to the edge bottom) and a band on the deck top, the barrier width wide (at least 4 % of
 * the deck width so it reads in plan), both at every overhang row. Top of deck at the edge is
 * edge bottom + edge thickness, as the engine defines the edge bottom.
 * @param range edge widths mapped to the ends of the ramp (default: the table's own range).
 */
export function buildEdgeBand(
  table: Pick<OffsetTable, 'points'>,
  desc: BridgeDescription,
  frame: SceneFrame,
  range: [number, number] = edgeWidthRange(table),
): ColoredMeshArrays {
  const pos: number[] = [];
  const col: number[] = [];
  const idx: number[] = [];
  const deckWidth = desc.deck.right_edge_offset - desc.deck.left_edge_offset;
  const c = [0, 0, 0];
  for (const run of overhangRuns(table)) {
    const band = Math.max(run.side === 'left' ? desc.deck.left_barrier_width : desc.deck.right_barrier_width, deckWidth * 0.04);
    const base = pos.length / 3;
    for (const p of run.rows) {
      const ex = p.edge_x as number;
      const ey = p.edge_y as number;
      const bottom = p.edge_bottom as number;
      const top = bottom + desc.deck.edge_thickness;
      // Inward along the overhang (edge point → girder point), the band's width.
      const w = (p.edge_width as number) || 1;
      const ix = ex + ((p.x - ex) / w) * Math.min(band, w * 0.95);
      const iy = ey + ((p.y - ey) / w) * Math.min(band, w * 0.95);
      rampColor(rampPosition(p.edge_width as number, range[0], range[1]), c, 0);
      // face bottom, face top, band outer (top), band inner
      pos.push(ex - frame.originX, sceneY(frame, bottom), -(ey - frame.originY));
      pos.push(ex - frame.originX, sceneY(frame, top), -(ey - frame.originY));
      pos.push(ex - frame.originX, sceneY(frame, top), -(ey - frame.originY));
      pos.push(ix - frame.originX, sceneY(frame, top), -(iy - frame.originY));
      for (let k = 0; k < 4; k++) col.push(c[0], c[1], c[2]);
    }
    for (let i = 0; i + 1 < run.rows.length; i++) {
      const r = base + i * 4;
      const s = r + 4;
      idx.push(r, s, r + 1, r + 1, s, s + 1);
      idx.push(r + 2, s + 2, r + 3, r + 3, s + 2, s + 3);
    }
  }
  return { positions: new Float32Array(pos), colors: new Float32Array(col), indices: new Uint32Array(idx) };
}
