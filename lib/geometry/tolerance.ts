/**
 * The engine's numerical tolerances: named constants behind comparison helpers, so that no bare
 * epsilon is scattered through the geometry. The length tolerance and `nearlyEqual` are the product's
 * one length tolerance from lib/units/tolerance (re-exported here so the engine names it once);
 * the solver's relative tolerances below are the engine's own. Lengths are in the bridge's unit; the
 * relative tolerances are fractions of a scale the caller names.
 */
import { LENGTH_TOLERANCE, nearlyEqual } from '@/lib/units/tolerance';

export { nearlyEqual };

/**
 * Relative step at which a Newton solve on plan coordinates counts as converged: a fraction of the
 * larger of 1 and the coordinates' size (coordinates carry rounding in proportion to their size).
 */
export const SOLVE_RELATIVE_STEP = 1e-11;

/**
 * Residual (fraction of the coordinates' scale) at which a stalled solve still counts as on its
 * target: far below any printed precision (0.001 ft on a coordinate of a million is 1e-9).
 */
export const SOLVE_RESIDUAL = 1e-9;

/**
 * Relative allowance for rounding in a length computed from others (a piece count that is a whole
 * number in exact arithmetic, a bounding box that must not clip its own curve).
 */
export const RELATIVE_ROUNDING = 1e-9;

/** Smallest |cos| between a ray and the offset lines it must cross before it counts as parallel. */
export const PARALLEL_SLOPE = 1e-9;

/** Length (bridge units) below which two lengths, stations or elevations are the same: noise, not a finding (the product's one length tolerance). */
export const LENGTH_NOISE = LENGTH_TOLERANCE;

/**
 * How far (length units) a bent may lie outside the alignment's first and last stations and still
 * count as on it: rounding noise of a sum of element lengths, far below any printed precision.
 */
export const ON_ALIGNMENT = 1e-6;

/** Relative difference of curvature at a spiral–arc join above which the engine warns (0.1 %). */
export const CURVATURE_JOIN_RELATIVE = 1e-3;

/** True when a is less than b by more than `tol` (default {@link LENGTH_NOISE}): a real "before", not noise. */
export function definitelyLess(a: number, b: number, tol: number = LENGTH_NOISE): boolean {
  return a < b - tol;
}

/** True when |value| exceeds `tol` (default {@link LENGTH_NOISE}): a change that is a finding. */
export function isSignificant(value: number, tol: number = LENGTH_NOISE): boolean {
  return Math.abs(value) > tol;
}

/** True when a Newton step is converged relative to the scale of the numbers it moves (see {@link SOLVE_RELATIVE_STEP}). */
export function stepConverged(step: number, scale: number): boolean {
  return Math.abs(step) <= SOLVE_RELATIVE_STEP * scale;
}

/** True when a solve's residual is within rounding of its target at that scale (see {@link SOLVE_RESIDUAL}). */
export function residualAccepted(residual: number, scale: number): boolean {
  return Math.abs(residual) <= SOLVE_RESIDUAL * scale;
}
