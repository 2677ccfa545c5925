/**
 * Clothoid spirals (data contract, "Spirals"): curvature linear in length from k1 = 1/R1 to
 * k2 = 1/R2 (0 for an infinite radius). Bearings in radians clockwise from north; x east, y north;
 * lengths in the bridge's unit. Positions are the integrals x = ∫ sin β, y = ∫ cos β evaluated by
 * four-point Gauss–Legendre quadrature on pieces short enough that the bearing turns at most 0.1 rad
 * across each: the quadrature error is then about (0.1)⁸/8! of a piece, far below 1e-12 of the length.
 */
import { RELATIVE_ROUNDING, stepConverged } from './tolerance';

/** A spiral laid out from its start point and bearing; build with {@link layOutSpiral}. */
export interface SpiralShape {
  length: number;
  /** Curvature at the start and end (1/length, ≥ 0; 0 for an infinite radius). */
  k1: number;
  k2: number;
  /** +1 turning right (bearing grows), −1 turning left. */
  turn: number;
  x0: number;
  y0: number;
  bearing0: number;
  /** Piece length and the plan points at the piece ends t = i·h, i = 0..pieces. */
  h: number;
  nodeX: Float64Array;
  nodeY: Float64Array;
}

// Four-point Gauss–Legendre abscissae and weights on [−1, 1] (Abramowitz & Stegun, table 25.4).
const GL_X = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
const GL_W = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];
/** Largest bearing change (radians) across one quadrature piece. */
const PIECE_TURN = 0.1;

/** Bearing (radians, clockwise from north) at length t along the spiral (any t; the clothoid extended). */
export function spiralBearing(s: SpiralShape, t: number): number {
  return s.bearing0 + s.turn * (s.k1 * t + ((s.k2 - s.k1) * t * t) / (2 * s.length));
}

/** Unsigned curvature (1/length) at length t: k1 + (k2 − k1)·t/L. */
export function spiralCurvature(s: SpiralShape, t: number): number {
  return s.k1 + ((s.k2 - s.k1) * t) / s.length;
}

/** ∫ from a to b of (sin β, cos β) du by Gauss–Legendre, split so each piece is at most h long. */
function integrate(s: SpiralShape, a: number, b: number): { dx: number; dy: number } {
  const pieces = Math.max(1, Math.ceil(Math.abs(b - a) / s.h - RELATIVE_ROUNDING));
  const w = (b - a) / pieces;
  let dx = 0;
  let dy = 0;
  for (let p = 0; p < pieces; p++) {
    const mid = a + (p + 0.5) * w;
    for (let i = 0; i < 4; i++) {
      const beta = spiralBearing(s, mid + (GL_X[i] * w) / 2);
      dx += GL_W[i] * Math.sin(beta);
      dy += GL_W[i] * Math.cos(beta);
    }
  }
  return { dx: (dx * w) / 2, dy: (dy * w) / 2 };
}

/**
 * Lay out a spiral from its start point and bearing.
 * @param length along the spiral (> 0); @param k1, k2 curvature at start and end (≥ 0, not equal);
 * @param turn +1 right, −1 left.
 */
export function layOutSpiral(x0: number, y0: number, bearing0: number, length: number, k1: number, k2: number, turn: number): SpiralShape {
  const kMax = Math.max(k1, k2);
  const pieces = Math.max(2, Math.ceil((kMax * length) / PIECE_TURN));
  const s: SpiralShape = { length, k1, k2, turn, x0, y0, bearing0, h: length / pieces, nodeX: new Float64Array(pieces + 1), nodeY: new Float64Array(pieces + 1) };
  s.nodeX[0] = x0;
  s.nodeY[0] = y0;
  for (let i = 1; i <= pieces; i++) {
    const d = integrate(s, (i - 1) * s.h, i * s.h);
    s.nodeX[i] = s.nodeX[i - 1] + d.dx;
    s.nodeY[i] = s.nodeY[i - 1] + d.dy;
  }
  return s;
}

/** Plan point and bearing at length t along the spiral (t outside [0, L] follows the clothoid on). */
export function spiralPoint(s: SpiralShape, t: number): { x: number; y: number; bearing: number } {
  const last = s.nodeX.length - 1;
  const i = Math.min(last, Math.max(0, Math.round(t / s.h)));
  const d = integrate(s, i * s.h, t);
  return { x: s.nodeX[i] + d.dx, y: s.nodeY[i] + d.dy, bearing: spiralBearing(s, t) };
}

/** Bounding box of the spiral: its piece ends widened by the largest sagitta of a piece. */
export function spiralBox(s: SpiralShape): { minX: number; minY: number; maxX: number; maxY: number } {
  const margin = (Math.max(s.k1, s.k2) * s.h * s.h) / 8 + RELATIVE_ROUNDING * s.length;
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < s.nodeX.length; i++) {
    minX = Math.min(minX, s.nodeX[i]);
    maxX = Math.max(maxX, s.nodeX[i]);
    minY = Math.min(minY, s.nodeY[i]);
    maxY = Math.max(maxY, s.nodeY[i]);
  }
  return { minX: minX - margin, minY: minY - margin, maxX: maxX + margin, maxY: maxY + margin };
}

/**
 * Foot of the perpendicular from (x, y) to the spiral: Newton's method on (P − C(t))·T(t) = 0,
 * whose derivative is −(1 − σκ(t)·offset), started from the nearest piece end.
 * @returns t (length along the spiral, possibly outside [0, L] but within one length of its ends)
 * and the signed offset there (positive right of travel), with the bearing at t.
 */
export function spiralFoot(s: SpiralShape, x: number, y: number): { t: number; offset: number; bearing: number } {
  let best = 0;
  let bestD = Infinity;
  for (let i = 0; i < s.nodeX.length; i++) {
    const d = (x - s.nodeX[i]) ** 2 + (y - s.nodeY[i]) ** 2;
    if (d < bestD) {
      bestD = d;
      best = i;
    }
  }
  let t = best * s.h;
  const scale = Math.max(1, s.length, Math.abs(x), Math.abs(y));
  let offset = 0;
  let bearing = s.bearing0;
  for (let iter = 0; iter < 50; iter++) {
    const p = spiralPoint(s, t);
    bearing = p.bearing;
    const sb = Math.sin(bearing);
    const cb = Math.cos(bearing);
    const dx = x - p.x;
    const dy = y - p.y;
    const along = dx * sb + dy * cb;
    offset = dx * cb - dy * sb;
    // Near or past the centre of curvature the true slope flattens; a damped step still descends.
    const slope = Math.max(0.2, 1 - s.turn * spiralCurvature(s, t) * offset);
    // Feet far beyond the ends belong to the neighbouring elements (or the extended tangents): the
    // search only needs to know the foot is off this spiral, so t stays within one length of its ends.
    const next = Math.min(2 * s.length, Math.max(-s.length, t + along / slope));
    const step = next - t;
    t = next;
    // At convergence the last step is far below rounding of the coordinates: the offset found at the
    // previous t differs from the one at t by less than step²·κ, so no further evaluation is needed.
    if (stepConverged(step, scale)) break;
    if ((t === -s.length || t === 2 * s.length) && iter > 0) {
      const q = spiralPoint(s, t);
      bearing = q.bearing;
      offset = (x - q.x) * Math.cos(bearing) - (y - q.y) * Math.sin(bearing);
      break;
    }
  }
  return { t, offset, bearing: spiralBearing(s, t) };
}
