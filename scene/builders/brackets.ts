/**
 * Overhang brackets along each exterior girder at a chosen spacing, with their handrail posts and
 * the rail between post tops. Bracket positions are interpolated between the engine's girder points
 * (a bracket that falls on a girder point gets exactly that point's numbers).
 *
 * The brackets are fixed to the girder, as on site: every arm of a span is one length, square to
 * that span's girder, hung a fixed depth under the girder top, and a screw jack at the deck edge
 * takes the form up to its target. So the arm ends, the posts and the handrail follow the girder:
 * straight along a chord, turning a corner at every bent — the peaked line crews see.
 */
import type { OffsetPoint, OffsetTable } from '@/lib/geometry';
import { deflectionOf, formEdgeY, girderTopOf, girderTopY, overhangRuns, prePourGirderTop, type PourState } from './runs';
import { type SceneFrame } from './frame';
import { writeBeamMatrix } from './instances';
import { bowFactor } from './girders';

/** One bracket: where it hangs and the overhang numbers there (bridge units). */
export interface BracketPlacement {
  span: number;
  side: 'left' | 'right';
  /** Distance along the girder from its point 0, plan. */
  distance: number;
  fraction: number;
  girderX: number;
  girderY: number;
  girderTop: number;
  edgeX: number;
  edgeY: number;
  edgeWidth: number;
  formTarget: number;
  /** Edge bottom at the edge point (bridge units): where the form ends up after the pour. */
  edgeBottom: number;
  /** Deflection still to come here (bridge units, positive downward; 0 without a table). */
  deflection: number;
  /** Top of girder before the pour here (surveyed, else bottom of slab + deflection). */
  topOfGirder: number;
  bottomOfSlab: number;
  /** The widest edge width of this run (bridge units): the arm length of the span's brackets. */
  runMaxWidth: number;
}

/** Default bracket spacing: 4 ft, or 1.2 m. */
export function defaultBracketSpacing(units: 'ft' | 'm'): number {
  return units === 'm' ? 1.2 : 4;
}

const lerp = (a: number, b: number, t: number) => a + (b - a) * t;

/**
 * Bracket placements: on each exterior girder and span, brackets `spacing` apart along the girder
 * (plan), centred so the first and last sit the same distance from the bents.
 * @param spacing bridge units, > 0 (values under 1 % of the span are raised to that).
 */
export function placeBrackets(table: Pick<OffsetTable, 'points'>, spacing: number): BracketPlacement[] {
  const out: BracketPlacement[] = [];
  for (const run of overhangRuns(table)) {
    const rows = run.rows;
    if (rows.length < 2) continue;
    const cum = new Float64Array(rows.length);
    for (let i = 1; i < rows.length; i++) cum[i] = cum[i - 1] + Math.hypot(rows[i].x - rows[i - 1].x, rows[i].y - rows[i - 1].y);
    const length = cum[rows.length - 1];
    const runMaxWidth = Math.max(...rows.map((r) => r.edge_width as number));
    const step = Math.max(spacing, length / 1000);
    const count = Math.floor(length / step + 1e-9) + 1;
    const start = (length - (count - 1) * step) / 2;
    let seg = 0;
    for (let b = 0; b < count; b++) {
      const d = start + b * step;
      while (seg < rows.length - 2 && cum[seg + 1] < d) seg++;
      const p: OffsetPoint = rows[seg];
      const q: OffsetPoint = rows[seg + 1];
      const segLen = cum[seg + 1] - cum[seg];
      const t = segLen > 0 ? Math.min(1, Math.max(0, (d - cum[seg]) / segLen)) : 0;
      out.push({
        span: run.span,
        side: run.side as 'left' | 'right',
        distance: d,
        fraction: lerp(p.fraction, q.fraction, t),
        girderX: lerp(p.x, q.x, t),
        girderY: lerp(p.y, q.y, t),
        girderTop: lerp(girderTopOf(p), girderTopOf(q), t),
        edgeX: lerp(p.edge_x as number, q.edge_x as number, t),
        edgeY: lerp(p.edge_y as number, q.edge_y as number, t),
        edgeWidth: lerp(p.edge_width as number, q.edge_width as number, t),
        formTarget: lerp(p.form_target as number, q.form_target as number, t),
        edgeBottom: lerp(p.edge_bottom as number, q.edge_bottom as number, t),
        deflection: lerp(deflectionOf(p), deflectionOf(q), t),
        topOfGirder: lerp(prePourGirderTop(p), prePourGirderTop(q), t),
        bottomOfSlab: lerp(p.bottom_of_slab, q.bottom_of_slab, t),
        runMaxWidth,
      });
    }
  }
  return out;
}

export interface BracketDims {
  /** Walkway beyond the widest deck edge of the span (bridge units). */
  walkway: number;
  /** Handrail post height above the arm. */
  postHeight: number;
  /** Depth of the form and its joists between the form's bottom edge and the jack head. */
  formDepth: number;
  /** Girder depth, for where the strut bears on the web. */
  girderDepth: number;
  /** Arm and strut section. */
  member: number;
  /** Vertical bow of the girders at midspan (scene units), which the brackets ride on. */
  verticalBow?: number;
  /** Before/after the pour: the brackets ride down with the girder. */
  pour?: PourState;
}

/** Bracket sizes in feet or metres. */
export function defaultBracketDims(units: 'ft' | 'm', girderDepth: number): BracketDims {
  const u = units === 'm' ? 0.3048 : 1;
  return { walkway: 2 * u, postHeight: 3.5 * u, formDepth: 0.5 * u, girderDepth, member: 0.25 * u };
}

export interface BracketInstances {
  arms: Float32Array;
  struts: Float32Array;
  posts: Float32Array;
  rails: Float32Array;
  /** Screw jacks from the arm up to the form's bottom edge at the deck edge. */
  jacks: Float32Array;
  /** Scene positions of each post top (3 floats per bracket). */
  postTops: Float32Array;
  /** Scene positions of each arm's outer end (3 floats per bracket). */
  armEnds: Float32Array;
  /** How far every arm hangs under the girder top (scene units), per side. */
  hang: { left: number; right: number };
  count: number;
  railCount: number;
}

interface Placed {
  girderY: number;
  formY: number;
}

function placedHeights(p: BracketPlacement, frame: SceneFrame, dims: BracketDims): Placed {
  const bow = (dims.verticalBow ?? 0) * bowFactor(p.fraction);
  const row = { top_of_girder: p.topOfGirder, bottom_of_slab: p.bottomOfSlab, fraction: p.fraction, deflection: p.deflection };
  const girderY = girderTopY(row, frame, dims.pour) + bow;
  const formY = formEdgeY({ form_target: p.formTarget, edge_bottom: p.edgeBottom, fraction: p.fraction, deflection: p.deflection }, frame, dims.pour) + bow;
  return { girderY, formY };
}

/**
 * Instance matrices for arms (girder centreline → the span's widest edge + walkway, square to the
 * girder, level, a fixed depth under the girder top on each side so that every jack can reach its
 * form), struts (from low on the web to the arm under the edge), jacks (arm → form's bottom edge at
 * the edge point), posts (at the arm's outer end) and rail pieces (post top to the next post top on
 * the same side, across bents — which is where the rail kinks).
 */
export function buildBracketInstances(placements: readonly BracketPlacement[], frame: SceneFrame, dims: BracketDims): BracketInstances {
  const n = placements.length;
  const arms = new Float32Array(n * 16);
  const struts = new Float32Array(n * 16);
  const posts = new Float32Array(n * 16);
  const jacks = new Float32Array(n * 16);
  const postTops = new Float32Array(n * 3);
  const armEnds = new Float32Array(n * 3);
  const m = dims.member;
  // One hang per side, worked out before the pour (the jacks are longest then).
  const hang = { left: 0, right: 0 };
  const before = { ...dims, pour: { pour: 0, deflectionScale: dims.pour?.deflectionScale } };
  for (const p of placements) {
    const h = placedHeights(p, frame, before);
    // Room under the form for the arm's half depth and a jack at least one member long.
    hang[p.side] = Math.max(hang[p.side], h.girderY - h.formY + dims.formDepth + m * 1.5);
  }
  for (let i = 0; i < n; i++) {
    const p = placements[i];
    const { girderY, formY } = placedHeights(p, frame, dims);
    const w = p.edgeWidth || 1;
    const ux = (p.edgeX - p.girderX) / w;
    const uy = (p.edgeY - p.girderY) / w;
    const reach = Math.max(p.runMaxWidth, w) + dims.walkway;
    const ox = p.girderX + ux * reach;
    const oy = p.girderY + uy * reach;
    const armY = girderY - hang[p.side];
    const ax = p.girderX - frame.originX;
    const az = -(p.girderY - frame.originY);
    const bx = ox - frame.originX;
    const bz = -(oy - frame.originY);
    writeBeamMatrix(arms, i, ax, armY, az, bx, armY, bz, m, m);
    armEnds[i * 3] = bx;
    armEnds[i * 3 + 1] = armY;
    armEnds[i * 3 + 2] = bz;
    const ex = p.edgeX - frame.originX;
    const ez = -(p.edgeY - frame.originY);
    // Strut: from the web, 70 % down the girder, to the arm under the deck edge.
    const webY = girderY - dims.girderDepth * 0.7;
    writeBeamMatrix(struts, i, ax + (ex - ax) * 0.08, Math.min(webY, armY - m), az + (ez - az) * 0.08, ex, armY, ez, m * 0.8, m * 0.8);
    writeBeamMatrix(jacks, i, ex, armY + m / 2, ez, ex, Math.max(formY - dims.formDepth, armY + m), ez, m * 0.45, m * 0.45);
    const topY = armY + dims.postHeight;
    writeBeamMatrix(posts, i, bx, armY, bz, bx, topY, bz, m * 0.6, m * 0.6);
    postTops[i * 3] = bx;
    postTops[i * 3 + 1] = topY;
    postTops[i * 3 + 2] = bz;
  }
  // Rails: consecutive placements on the same side (placements come side by side, span by span).
  const railPairs: number[] = [];
  for (let i = 0; i + 1 < n; i++) {
    if (placements[i].side === placements[i + 1].side) railPairs.push(i);
  }
  const rails = new Float32Array(railPairs.length * 16);
  railPairs.forEach((i, k) => {
    writeBeamMatrix(rails, k, postTops[i * 3], postTops[i * 3 + 1], postTops[i * 3 + 2], postTops[i * 3 + 3], postTops[i * 3 + 4], postTops[i * 3 + 5], m * 0.5, m * 0.5);
  });
  return { arms, struts, posts, rails, jacks, postTops, armEnds, hang, count: n, railCount: railPairs.length };
}
