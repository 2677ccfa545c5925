/**
 * Camera presets, worked out from the engine's rows in scene coordinates (see builders/frame.ts).
 * Eye heights and stand-off distances are true size in the bridge's unit.
 */
import type { OffsetPoint, OffsetTable } from '@/lib/geometry';
import { overhangRuns } from './builders/runs';
import { sceneY, type SceneFrame } from './builders/frame';
import type { Units } from '@/lib/units';

export type ViewName = 'plan' | 'edge' | 'crew' | 'orbit' | 'string' | 'section' | 'span' | 'side';

export interface CameraPose {
  position: [number, number, number];
  target: [number, number, number];
  /**
   * Overview poses: the narrowest viewport aspect (width / height) the pose keeps the whole bridge in;
   * on a narrower one the camera backs away along its line of sight (CameraRig) so nothing is cut off.
   */
  fitAspect?: number;
}

/** The side whose overhang is widest somewhere: on a curve with chords, the outside of the curve. */
export function outsideSide(table: Pick<OffsetTable, 'points'>): 'left' | 'right' {
  let best: 'left' | 'right' = 'right';
  let max = -Infinity;
  for (const p of table.points) {
    if (p.edge_width !== null && p.side !== 'interior' && p.edge_width > max) {
      max = p.edge_width;
      best = p.side;
    }
  }
  return best;
}

function scenePt(f: SceneFrame, x: number, y: number, z: number): [number, number, number] {
  return [x - f.originX, sceneY(f, z), -(y - f.originY)];
}

/**
 * Pose of a named view.
 * plan: straight down over the whole bridge, north up. orbit: a three-quarter view from above.
 * edge: on the walkway outside the `side` edge at the first bent, eye level, looking along the edge.
 * crew: on the walkway at bent `bent` (1-based; the middle bent by default), looking along the
 * brackets into the next span. string: along the exterior girder's top flange at a bent, to see the
 * string line. section: off the start of `span`, looking along it at the overhang in section.
 * span: above the outside overhang of `span`, looking down on it.
 */
export function cameraPose(view: ViewName, table: Pick<OffsetTable, 'points'>, frame: SceneFrame, units: Units, opts: { side?: 'left' | 'right'; span?: number; bent?: number } = {}): CameraPose {
  const u = units === 'm' ? 0.3048 : 1;
  // With heights exaggerated the slab edge stands taller: stand higher and further out so the eye
  // stays above the deck and the rail is seen against the sky.
  const raise = Math.max(0, frame.exaggeration - 1);
  const eye = 5.5 * u + 0.9 * u * raise;
  const out = 0.6 * u * raise;
  let minX = Infinity,
    maxX = -Infinity,
    minZ = Infinity,
    maxZ = -Infinity,
    minY = Infinity,
    maxY = -Infinity;
  for (const p of table.points) {
    const [x, y, z] = scenePt(frame, p.x, p.y, p.top_of_deck);
    minX = Math.min(minX, x);
    maxX = Math.max(maxX, x);
    minY = Math.min(minY, y);
    maxY = Math.max(maxY, y);
    minZ = Math.min(minZ, z);
    maxZ = Math.max(maxZ, z);
  }
  if (!Number.isFinite(minX)) return { position: [100, 100, 100], target: [0, 0, 0] };
  const cx = (minX + maxX) / 2;
  const cz = (minZ + maxZ) / 2;
  const cy = (minY + maxY) / 2;
  const extent = Math.max(maxX - minX, maxZ - minZ, 40 * u);
  const side = opts.side ?? outsideSide(table);
  const runs = overhangRuns(table).filter((r) => r.side === side);
  const spans = runs.length;
  const runOf = (span: number) => runs.find((r) => r.span === span) ?? runs[0];

  const walkwayPoint = (p: OffsetPoint, out: number, lift: number): [number, number, number] => {
    const w = p.edge_width || 1;
    const ux = ((p.edge_x as number) - p.x) / w;
    const uy = ((p.edge_y as number) - p.y) / w;
    const q = scenePt(frame, (p.edge_x as number) + ux * out, (p.edge_y as number) + uy * out, p.form_target as number);
    q[1] += lift;
    return q;
  };

  switch (view) {
    case 'plan': {
      // 50° field of view: the bridge's extent fills about 85 % of the height.
      const h = (extent * 0.62) / Math.tan((25 * Math.PI) / 180);
      return { position: [cx, cy + h, cz + h * 0.002], target: [cx, cy, cz], fitAspect: 1 };
    }
    case 'orbit': {
      // Three-quarter view from the right of the bridge's main axis, the whole length in frame.
      const first = table.points[0];
      const last = table.points[table.points.length - 1];
      const a = scenePt(frame, first.x, first.y, first.top_of_deck);
      const b = scenePt(frame, last.x, last.y, last.top_of_deck);
      let ax = b[0] - a[0];
      let az = b[2] - a[2];
      const len = Math.max(Math.hypot(ax, az), 40 * u);
      ax /= len;
      az /= len;
      // Right of the axis in the scene's horizontal plane (x east, z south): (−az, ax).
      const px = -az;
      const pz = ax;
      // Far enough and little enough off-centre that both ends stay inside a 50° view at aspect 1.6.
      const d = len * 0.75;
      return {
        position: [cx + px * d - ax * d * 0.2, cy + d * 0.45, cz + pz * d - az * d * 0.2],
        target: [cx, cy - 4 * u, cz],
        fitAspect: 1.6,
      };
    }
    case 'edge': {
      if (!runs.length) return cameraPose('orbit', table, frame, units);
      const r = runOf(1);
      const a = r.rows[0];
      const b = r.rows[Math.min(r.rows.length - 1, Math.round(r.rows.length / 4))];
      // Stand a few paces back from the bent, just outside the walkway, at eye level.
      const pa = walkwayPoint(a, 3.5 * u + out, eye);
      const pb = walkwayPoint(b, 3.5 * u + out, eye);
      const dx = pa[0] - pb[0];
      const dz = pa[2] - pb[2];
      const l = Math.hypot(dx, dz) || 1;
      const back = 12 * u;
      const target = walkwayPoint(runOf(Math.min(2, spans)).rows[Math.floor(runOf(Math.min(2, spans)).rows.length / 2)], -1 * u, 0);
      return { position: [pa[0] + (dx / l) * back, pa[1], pa[2] + (dz / l) * back], target };
    }
    case 'crew': {
      if (!runs.length) return cameraPose('orbit', table, frame, units);
      const bent = Math.min(Math.max(1, opts.bent ?? Math.ceil((spans + 1) / 2)), spans);
      const r = runOf(bent);
      const at = r.rows[0];
      const to = r.rows[Math.min(r.rows.length - 1, Math.max(1, Math.round(r.rows.length * 0.3)))];
      const pos = walkwayPoint(at, 1.2 * u + out, eye);
      const tgt = walkwayPoint(to, -0.5 * u, -1 * u);
      // Step back across the bent so the previous span's brackets are in the corner of the eye.
      const dx = pos[0] - tgt[0];
      const dz = pos[2] - tgt[2];
      const l = Math.hypot(dx, dz) || 1;
      return { position: [pos[0] + (dx / l) * 6 * u, pos[1], pos[2] + (dz / l) * 6 * u], target: tgt };
    }
    case 'string': {
      if (!runs.length) return cameraPose('orbit', table, frame, units);
      const r = runOf(opts.span ?? 1);
      const a = r.rows[0];
      const m = r.rows[Math.floor(r.rows.length / 2)];
      const pa = scenePt(frame, a.x, a.y, a.top_of_girder ?? a.bottom_of_slab);
      const pm = scenePt(frame, m.x, m.y, m.top_of_girder ?? m.bottom_of_slab);
      const dx = pa[0] - pm[0];
      const dz = pa[2] - pm[2];
      const l = Math.hypot(dx, dz) || 1;
      return { position: [pa[0] + (dx / l) * 10 * u, pa[1] + 4 * u, pa[2] + (dz / l) * 10 * u], target: [pm[0], pm[1], pm[2]] };
    }
    case 'section': {
      // Off the end of `span` (its point 0), looking up-station at the cross-section of the exterior
      // girder and its overhang, a little above the form.
      if (!runs.length) return cameraPose('orbit', table, frame, units);
      const r = runOf(opts.span ?? 1);
      const m = r.rows[0];
      const n = r.rows[Math.min(r.rows.length - 1, 3)];
      const g = scenePt(frame, m.x, m.y, m.bottom_of_slab);
      const e = scenePt(frame, m.edge_x as number, m.edge_y as number, m.edge_bottom as number);
      const gn = scenePt(frame, n.x, n.y, n.bottom_of_slab);
      const bx = g[0] - gn[0];
      const bz = g[2] - gn[2];
      const bl = Math.hypot(bx, bz) || 1;
      // Aim between the exterior girder and the edge; stand a few paces back and a step outside.
      const target: [number, number, number] = [(g[0] * 2 + e[0]) / 3, (g[1] + e[1]) / 2, (g[2] * 2 + e[2]) / 3];
      const ox = e[0] - g[0];
      const oz = e[2] - g[2];
      const ol = Math.hypot(ox, oz) || 1;
      return {
        position: [target[0] + (bx / bl) * 9 * u + (ox / ol) * 7 * u, target[1] + 3 * u, target[2] + (bz / bl) * 9 * u + (oz / ol) * 7 * u],
        target,
      };
    }
    case 'side': {
      // From outside the `side` edge, level with the deck, square to the middle of `span`.
      if (!runs.length) return cameraPose('orbit', table, frame, units);
      const r = runOf(opts.span ?? 1);
      const a = r.rows[0];
      const b = r.rows[r.rows.length - 1];
      const m = r.rows[Math.floor(r.rows.length / 2)];
      const pm = scenePt(frame, m.edge_x as number, m.edge_y as number, m.edge_bottom as number);
      const pg = scenePt(frame, m.x, m.y, m.bottom_of_slab);
      const len = Math.hypot(a.x - b.x, a.y - b.y);
      const ox = pm[0] - pg[0];
      const oz = pm[2] - pg[2];
      const l = Math.hypot(ox, oz) || 1;
      const d = (len * 0.62) / Math.tan((25 * Math.PI) / 180);
      return { position: [pm[0] + (ox / l) * d, pm[1] + 2 * u, pm[2] + (oz / l) * d], target: [pm[0], pm[1] - 2 * u, pm[2]] };
    }
    case 'span': {
      if (!runs.length) return cameraPose('plan', table, frame, units);
      const r = runOf(opts.span ?? 1);
      const a = r.rows[0];
      const b = r.rows[r.rows.length - 1];
      const m = r.rows[Math.floor(r.rows.length / 2)];
      const pa = scenePt(frame, a.x, a.y, a.top_of_deck);
      const pb = scenePt(frame, b.x, b.y, b.top_of_deck);
      const pm = scenePt(frame, m.edge_x as number, m.edge_y as number, m.top_of_deck);
      const len = Math.hypot(pa[0] - pb[0], pa[2] - pb[2]);
      const h = (len * 0.6) / Math.tan((25 * Math.PI) / 180);
      return { position: [pm[0], pm[1] + h, pm[2] + h * 0.002], target: pm };
    }
  }
}
