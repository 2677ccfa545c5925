/**
 * The colour ramp for edge width: viridis (perceptually uniform, readable with the common forms of
 * colour blindness and in greyscale). Stops are the published matplotlib viridis values at
 * 0, 1/8, ..., 1.
 */
import { nearlyEqual } from '@/lib/units';
export const RAMP_STOPS: ReadonlyArray<readonly [number, number, number]> = [
  [0.267, 0.005, 0.329],
  [0.283, 0.141, 0.458],
  [0.254, 0.265, 0.53],
  [0.207, 0.372, 0.553],
  [0.164, 0.471, 0.558],
  [0.128, 0.567, 0.551],
  [0.135, 0.659, 0.518],
  [0.267, 0.749, 0.441],
  [0.478, 0.821, 0.318],
  [0.741, 0.873, 0.15],
  [0.993, 0.906, 0.144],
];

/**
 * Colour of a value on the ramp, written as linear-ish sRGB triples (0..1) into `out` at `i`.
 * @param t position 0..1 (clamped; NaN draws the low end).
 */
export function rampColor(t: number, out: Float32Array | number[], i: number): void {
  const c = Number.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
  const f = c * (RAMP_STOPS.length - 1);
  const k = Math.min(RAMP_STOPS.length - 2, Math.floor(f));
  const u = f - k;
  const a = RAMP_STOPS[k];
  const b = RAMP_STOPS[k + 1];
  out[i] = a[0] + (b[0] - a[0]) * u;
  out[i + 1] = a[1] + (b[1] - a[1]) * u;
  out[i + 2] = a[2] + (b[2] - a[2]) * u;
}

/** Position of `value` between lo and hi (0.5 when the range is empty). */
export function rampPosition(value: number, lo: number, hi: number): number {
  return !nearlyEqual(hi, lo) ? (value - lo) / (hi - lo) : 0.5;
}

/** CSS linear-gradient of the ramp, left (low) to right (high), for the legend. */
export function rampCss(): string {
  const parts = RAMP_STOPS.map(([r, g, b], i) => `rgb(${Math.round(r * 255)} ${Math.round(g * 255)} ${Math.round(b * 255)}) ${((i / (RAMP_STOPS.length - 1)) * 100).toFixed(0)}%`);
  return `linear-gradient(to right, ${parts.join(', ')})`;
}
