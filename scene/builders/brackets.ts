/**
 * Overhang brackets along each exterior girder at a chosen spacing, with their handrail posts and
 * the rail between post tops. Bracket positions are interpolated between the engine's girder points
 * (a bracket that falls on a girder point gets exactly that point's numbers).
 */
import type { OffsetPoint, OffsetTable } from '@/lib/geometry';
import { girderTopOf, overhangRuns } from './runs';
import { sceneY, type SceneFrame } from './frame';
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
      });
    }
  }
  return out;
}

export interface BracketDims {
  /** Walkway beyond the deck edge (bridge units). */
  walkway: number;
  /** Handrail post height above the arm. */
  postHeight: number;
  /** Depth of the form and its joists between the form's bottom edge and the arm top. */
  formDepth: number;
  /** Girder depth, for where the strut bears on the web. */
  girderDepth: number;
  /** Arm and strut section. */
  member: number;
  /** Vertical bow of the girders at midspan (scene units), which the brackets ride on. */
  verticalBow?: number;
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
  /** Scene positions of each post top (3 floats per bracket). */
  postTops: Float32Array;
  /** Scene positions of each arm's outer end (3 floats per bracket). */
  armEnds: Float32Array;
  count: number;
  railCount: number;
}

/**
 * Instance matrices for arms (girder centreline → deck edge + walkway, level, `formDepth` under the
 * form target at the edge), struts (from low on the web up to the arm's outer part), posts (at the
 * arm's outer end) and rail pieces (post top to the next post top on the same side, across bents —
 * which is where the rail kinks).
 */
export function buildBracketInstances(placements: readonly BracketPlacement[], frame: SceneFrame, dims: BracketDims): BracketInstances {
  const n = placements.length;
  const arms = new Float32Array(n * 16);
  const struts = new Float32Array(n * 16);
  const posts = new Float32Array(n * 16);
  const postTops = new Float32Array(n * 3);
  const armEnds = new Float32Array(n * 3);
  const m = dims.member;
  for (let i = 0; i < n; i++) {
    const p = placements[i];
    const bow = (dims.verticalBow ?? 0) * bowFactor(p.fraction);
    const w = p.edgeWidth || 1;
    const ux = (p.edgeX - p.girderX) / w;
    const uy = (p.edgeY - p.girderY) / w;
    const ox = p.edgeX + ux * dims.walkway;
    const oy = p.edgeY + uy * dims.walkway;
    const armY = sceneY(frame, p.formTarget) - dims.formDepth - m / 2 + bow;
    const ax = p.girderX - frame.originX;
    const az = -(p.girderY - frame.originY);
    const bx = ox - frame.originX;
    const bz = -(oy - frame.originY);
    writeBeamMatrix(arms, i, ax, armY, az, bx, armY, bz, m, m);
    armEnds[i * 3] = bx;
    armEnds[i * 3 + 1] = armY;
    armEnds[i * 3 + 2] = bz;
    // Strut: from the web, 70 % down the girder, to the arm at the deck edge.
    const webY = sceneY(frame, p.girderTop) + bow - dims.girderDepth * 0.7;
    const ex = p.edgeX - frame.originX;
    const ez = -(p.edgeY - frame.originY);
    writeBeamMatrix(struts, i, ax + (ex - ax) * 0.08, webY, az + (ez - az) * 0.08, ex, armY, ez, m * 0.8, m * 0.8);
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
  return { arms, struts, posts, rails, postTops, armEnds, count: n, railCount: railPairs.length };
}
