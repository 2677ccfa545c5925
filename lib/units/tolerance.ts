/**
 * One comparison tolerance for numbers computed in doubles outside the engine (the engine keeps its
 * own). Two lengths closer than this are the same length: far below anything measured or shown
 * (0.001 ft, 1 mm), far above the rounding noise of a few double operations.
 */
export const LENGTH_TOLERANCE = 1e-9;

/** A looser tolerance for points that coincide in a drawing (scene vertices, sketch coordinates). */
export const POINT_TOLERANCE = 1e-6;

/** Below this a determinant of two unit directions (or a difference of two grades) is zero: the lines are parallel. */
export const PARALLEL_DETERMINANT = 1e-12;

/** True when |a − b| is within `tolerance` (default LENGTH_TOLERANCE). */
export function nearlyEqual(a: number, b: number, tolerance = LENGTH_TOLERANCE): boolean {
  return Math.abs(a - b) <= tolerance;
}

/** True when |v| is within `tolerance` of zero (default LENGTH_TOLERANCE). */
export function nearlyZero(v: number, tolerance = LENGTH_TOLERANCE): boolean {
  return Math.abs(v) <= tolerance;
}

/** a ≤ b allowing rounding noise: true also when a exceeds b by no more than `tolerance`. */
export function atMost(a: number, b: number, tolerance = LENGTH_TOLERANCE): boolean {
  return a <= b + tolerance;
}

/** a ≥ b allowing rounding noise: true also when a falls short of b by no more than `tolerance`. */
export function atLeast(a: number, b: number, tolerance = LENGTH_TOLERANCE): boolean {
  return a >= b - tolerance;
}

/** `divisor`, or `tolerance` when it is smaller: a denominator that never divides by (nearly) zero. */
export function safeDivisor(divisor: number, tolerance = LENGTH_TOLERANCE): number {
  return Math.max(divisor, tolerance);
}
