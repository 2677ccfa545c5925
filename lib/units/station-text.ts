/**
 * Display text for stations and offsets in a bridge's units, through the engine's format helpers
 * (exact half-up rounding, the same text as the CSV export): 0.01 ft or 0.001 m.
 */
import { formatOffset, formatStation } from '@/lib/geometry';
import type { Units } from './units';

/** Station text: 1234.56 ft → "12+34.56", 1234.567 m → "1+234.567"; negative with a leading minus. */
export function stationText(value: number, units: Units): string {
  if (!Number.isFinite(value)) return '—';
  return formatStation(value, units);
}

/** An offset from the alignment as "18.00 LT" / "6.00 RT" (no sign), optionally with the unit. */
export function offsetText(value: number, units: Units, withUnit = false): string {
  if (!Number.isFinite(value)) return '—';
  const text = formatOffset(value, units);
  if (!withUnit) return text;
  const [magnitude, side] = text.split(' ');
  return side ? `${magnitude} ${units} ${side}` : `${magnitude} ${units}`;
}

/** Stations at the ends of consecutive lengths from `start`: [start, start + l0, start + l0 + l1, …]. */
export function stationsAlong(start: number, lengths: readonly number[]): number[] {
  const out = [start];
  for (const l of lengths) out.push(out[out.length - 1] + l);
  return out;
}
