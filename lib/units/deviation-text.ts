/**
 * Deviations (measured − computed) and tolerances as a person checks them: inches or 0.001 ft on a
 * feet bridge, millimetres on a metric one.
 */
import type { Units } from './units';

/** What a deviation or tolerance is of: an edge width (tape) or a level-bar reading. */
export type MeasureKind = 'width' | 'reading';

/**
 * A deviation (measured − computed) with its sign, in the unit a person checks it in: an edge width in
 * inches ("+0.20 in") and a level-bar reading in feet to 0.001 ft ("+0.004 ft") on a feet bridge; both in
 * millimetres on a metric one ("−4 mm").
 */
export function deviationText(v: number | null | undefined, units: Units, kind: MeasureKind = 'width'): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  const sign = v > 0 ? '+' : v < 0 ? '−' : '±';
  if (units === 'm') return `${sign}${Math.abs(v * 1000).toFixed(0)} mm`;
  if (kind === 'reading') return `${sign}${Math.abs(v).toFixed(3)} ft`;
  return `${sign}${Math.abs(v * 12).toFixed(2)} in`;
}

/** A tolerance as "±0.25 in (0.021 ft)" for a width, "±0.010 ft" for a reading, "±6 mm" in metric. */
export function toleranceText(v: number, units: Units, kind: MeasureKind = 'width'): string {
  if (units === 'm') return `±${(v * 1000).toFixed(1).replace(/\.0$/, '')} mm`;
  if (kind === 'reading') return `±${v.toFixed(3)} ft`;
  const inches = v * 12;
  return `±${inches.toFixed(3).replace(/0+$/, '').replace(/\.$/, '')} in (${v.toFixed(3)} ft)`;
}
