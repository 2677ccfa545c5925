/**
 * The deck slab: its top surface sampled from the engine's deck surface (so the crown, the
 * superelevation and the level zone under the barrier are the engine's), the overhang underside on
 * the form from each exterior girder out to the edge, the slab underside between the exterior
 * girders, and the edge band coloured by edge width.
 */
import { bentLinePoint, type BridgeDescription, type BridgeModel, type OffsetPoint, type OffsetTable } from '@/lib/geometry';
import { deflectionOf, edgeWidthRange, formEdgeY, overhangRuns, type GirderRun, type PourState } from './runs';
import { outermostEdgeOffset, sectionLinesAt } from './edges';
import { sceneY, writeScenePoint, type SceneFrame } from './frame';
import { rampColor, rampPosition } from './ramp';
import type { MeshArrays } from './girders';

/**
 * Top of deck between the first and last bent as a grid: along each span the grid lines run
 * between the bent lines (so a skewed deck ends square to its bents), across at the edges, gutter
 * lines and crown of each station (so a flared edge is followed). Elevations are the engine's top of
 * deck at each grid point.
 * @param samplesPerSpan divisions along each span (≥ 1).
 */
export function buildDeckTop(desc: BridgeDescription, model: BridgeModel, frame: SceneFrame, samplesPerSpan = 24): MeshArrays {
  const cols = 5;
  const pos: number[] = [];
  const idx: number[] = [];
  const tmp = [0, 0, 0];
  const stationOn = (j: number, c: number) => bentLinePoint(model.alignment, desc.bents[j], sectionLinesAt(desc.deck, desc.bents[j].station)[c]).station;
  for (let j = 0; j + 1 < desc.bents.length; j++) {
    const sa = Array.from({ length: cols }, (_, c) => stationOn(j, c));
    const sb = Array.from({ length: cols }, (_, c) => stationOn(j + 1, c));
    const base = pos.length / 3;
    for (let i = 0; i <= samplesPerSpan; i++) {
      const t = i / samplesPerSpan;
      for (let c = 0; c < cols; c++) {
        const s = sa[c] + t * (sb[c] - sa[c]);
        const o = sectionLinesAt(desc.deck, s)[c];
        const p = model.alignment.pointAt(s, o);
        writeScenePoint(frame, p.x, p.y, model.surface.topOfDeckAtStationOffset(s, o), tmp, 0);
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
export function buildDeckUnderside(table: Pick<OffsetTable, 'points'>, frame: SceneFrame, pour?: PourState): MeshArrays {
  const pos: number[] = [];
  const idx: number[] = [];
  const runs = overhangRuns(table);
  const tmp = [0, 0, 0];
  // Scene y of the slab bottom over a girder and of the form edge, riding down with the pour.
  const scale = pour?.deflectionScale ?? frame.exaggeration;
  const lift = (p: OffsetPoint) => (pour ? deflectionOf(p) * scale * (1 - pour.pour) : 0);
  const atGirder = (p: OffsetPoint): [number, number, number] => [p.x, p.y, NaN];
  const girderY = (p: OffsetPoint) => sceneY(frame, p.bottom_of_slab) + lift(p);
  const edgeY = (p: OffsetPoint) => (pour ? formEdgeY(p, frame, pour) : sceneY(frame, p.edge_bottom as number));
  const strip = (a: OffsetPoint[], ya: (p: OffsetPoint) => number, b: OffsetPoint[], yb: (p: OffsetPoint) => number, edge: boolean) => {
    const base = pos.length / 3;
    const n = Math.min(a.length, b.length);
    for (let i = 0; i < n; i++) {
      const pa = atGirder(a[i]);
      writeScenePoint(frame, pa[0], pa[1], 0, tmp, 0);
      pos.push(tmp[0], ya(a[i]), tmp[2]);
      if (edge) writeScenePoint(frame, b[i].edge_x as number, b[i].edge_y as number, 0, tmp, 0);
      else writeScenePoint(frame, b[i].x, b[i].y, 0, tmp, 0);
      pos.push(tmp[0], yb(b[i]), tmp[2]);
    }
    for (let i = 0; i + 1 < n; i++) {
      const r = base + i * 2;
      idx.push(r, r + 2, r + 1, r + 1, r + 2, r + 3);
    }
  };
  const bySpan = new Map<number, { left?: GirderRun; right?: GirderRun }>();
  for (const run of runs) {
    strip(run.rows, girderY, run.rows, edgeY, true);
    const e = bySpan.get(run.span) ?? {};
    e[run.side as 'left' | 'right'] = run;
    bySpan.set(run.span, e);
  }
  for (const { left, right } of bySpan.values()) {
    if (!left || !right || left.girder === right.girder) continue;
    strip(left.rows, girderY, right.rows, girderY, false);
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
export function buildEdgeBand(table: Pick<OffsetTable, 'points'>, desc: BridgeDescription, frame: SceneFrame, range: [number, number] = edgeWidthRange(table)): ColoredMeshArrays {
  const pos: number[] = [];
  const col: number[] = [];
  const idx: number[] = [];
  const deckWidth = outermostEdgeOffset(desc.deck, 'right') - outermostEdgeOffset(desc.deck, 'left');
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
