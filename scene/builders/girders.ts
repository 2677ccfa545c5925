/**
 * Girders as swept I-sections: top flange, web and bottom flange follow the girder points of each
 * span (straight for chords, bending with the curve for curved girders). One merged geometry for the
 * whole bridge, so every girder is a single draw call.
 */
import { girderTopY, type GirderRun, type PourState } from './runs';
import type { SceneFrame } from './frame';
import type { Units } from '@/lib/units';

export interface GirderShape {
  /** Overall depth, bridge units (true size, not exaggerated). */
  depth: number;
  /** Flange width, bridge units. */
  flangeWidth: number;
  /**
   * Lateral bow at midspan (bridge units, positive outward for exterior girders, toward the
   * right for interior ones), drawn as a parabola through the girder ends. Used to show sweep.
   */
  sweep?: number;
  /** Vertical bow at midspan in scene units (positive up), a parabola through the ends. */
  verticalBow?: number;
  /** Before/after the pour: the girder comes down by its deflection (see runs.ts). */
  pour?: PourState;
}

/** Default girder depth: 6 ft, or 1.8 m. */
export function defaultGirderShape(units: Units): GirderShape {
  return units === 'm' ? { depth: 1.8, flangeWidth: 0.9 } : { depth: 6, flangeWidth: 3 };
}

export interface MeshArrays {
  positions: Float32Array;
  indices: Uint32Array;
}

/**
 * Plan-perpendicular unit vector (easting, northing) at row i of a polyline, pointing to the right
 * looking along the run; central difference inside, one-sided at the ends.
 */
export function planNormalAt(xs: ArrayLike<number>, ys: ArrayLike<number>, i: number): [number, number] {
  const n = xs.length;
  const a = Math.max(0, i - 1);
  const b = Math.min(n - 1, i + 1);
  let tx = xs[b] - xs[a];
  let ty = ys[b] - ys[a];
  const l = Math.hypot(tx, ty) || 1;
  tx /= l;
  ty /= l;
  // Right of the travel direction in plan (x east, y north): (ty, −tx).
  return [ty, -tx];
}

/** Bow factor 4f(1 − f): 0 at the ends, 1 at midspan. */
export function bowFactor(fraction: number): number {
  return 4 * fraction * (1 - fraction);
}

/**
 * Girder centreline (top of the top flange) of a run in scene coordinates, 3 floats per row,
 * including any sweep / vertical bow.
 */
export function girderCenterline(run: GirderRun, frame: SceneFrame, shape: Pick<GirderShape, 'sweep' | 'verticalBow' | 'pour'> = {}): Float32Array {
  const rows = run.rows;
  const out = new Float32Array(rows.length * 3);
  const xs = rows.map((r) => r.x);
  const ys = rows.map((r) => r.y);
  const outwardSign = run.side === 'left' ? -1 : 1;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    const bow = bowFactor(r.fraction);
    let x = r.x;
    let y = r.y;
    if (shape.sweep) {
      const [nx, ny] = planNormalAt(xs, ys, i);
      x += nx * shape.sweep * bow * outwardSign;
      y += ny * shape.sweep * bow * outwardSign;
    }
    out[i * 3] = x - frame.originX;
    out[i * 3 + 1] = girderTopY(r, frame, shape.pour) + (shape.verticalBow ?? 0) * bow;
    out[i * 3 + 2] = -(y - frame.originY);
  }
  return out;
}

/**
 * Sweeps an axis-aligned rectangle (in the plane square to the path) along a scene polyline.
 * `top` and `bottom` are offsets below the path (scene units, bottom > top ≥ 0), `half` the half
 * width. Writes 8 vertices per path point (each face its own so normals stay crisp) and end caps.
 */
function sweepBox(path: Float32Array, top: number, bottom: number, half: number, pos: number[], idx: number[]): void {
  const n = path.length / 3;
  if (n < 2) return;
  const xs = new Float64Array(n);
  const zs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    xs[i] = path[i * 3];
    zs[i] = path[i * 3 + 2];
  }
  const base = pos.length / 3;
  for (let i = 0; i < n; i++) {
    // Perpendicular in the scene's horizontal plane (x, z).
    const a = Math.max(0, i - 1);
    const b = Math.min(n - 1, i + 1);
    let tx = xs[b] - xs[a];
    let tz = zs[b] - zs[a];
    const l = Math.hypot(tx, tz) || 1;
    tx /= l;
    tz /= l;
    const px = -tz * half;
    const pz = tx * half;
    const x = xs[i];
    const y = path[i * 3 + 1];
    const z = zs[i];
    const yt = y - top;
    const yb = y - bottom;
    // top L, top R, side R top, side R bottom, bottom R, bottom L, side L bottom, side L top
    pos.push(x + px, yt, z + pz, x - px, yt, z - pz);
    pos.push(x - px, yt, z - pz, x - px, yb, z - pz);
    pos.push(x - px, yb, z - pz, x + px, yb, z + pz);
    pos.push(x + px, yb, z + pz, x + px, yt, z + pz);
  }
  for (let i = 0; i < n - 1; i++) {
    const r0 = base + i * 8;
    const r1 = r0 + 8;
    for (let f = 0; f < 4; f++) {
      const a = r0 + f * 2;
      const b = a + 1;
      const c = r1 + f * 2;
      const d = c + 1;
      idx.push(a, c, b, b, c, d);
    }
  }
  // End caps.
  for (const i of [0, n - 1]) {
    const r = base + i * 8;
    const capBase = pos.length / 3;
    for (const k of [0, 1, 3, 6]) pos.push(pos[(r + k) * 3], pos[(r + k) * 3 + 1], pos[(r + k) * 3 + 2]);
    idx.push(capBase, capBase + 1, capBase + 2, capBase, capBase + 2, capBase + 3);
  }
}

/**
 * All girders of a table as one I-section mesh (scene coordinates). The top of the top flange runs
 * through each girder point at its top of girder (or bottom of slab when not surveyed); depth and
 * flange widths are true size.
 */
export function buildGirderMesh(runs: readonly GirderRun[], frame: SceneFrame, shape: GirderShape): MeshArrays {
  const pos: number[] = [];
  const idx: number[] = [];
  const d = shape.depth;
  const half = shape.flangeWidth / 2;
  const flange = Math.max(d * 0.09, 0.05 * d);
  const web = Math.max(shape.flangeWidth * 0.12, d * 0.03);
  for (const run of runs) {
    const path = girderCenterline(run, frame, shape);
    sweepBox(path, 0, flange, half, pos, idx);
    sweepBox(path, flange, d - flange, web / 2, pos, idx);
    sweepBox(path, d - flange, d, half * 0.85, pos, idx);
  }
  return { positions: new Float32Array(pos), indices: new Uint32Array(idx) };
}
