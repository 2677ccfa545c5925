/**
 * Display text of offset-table numbers in the chosen style, through the engine's format helpers so the
 * screen, the print and the CSV export round the same way. Lengths (widths, drops, buildups, offsets,
 * chord offsets) follow the style; elevations stay decimal because they are read against a level.
 */
import { formatFeet, formatFeetInches, formatMetres, formatOffset, type DisplayStyle } from '@/lib/geometry';
import { lengthText } from './length-text';
import type { Units } from './units';

export type { DisplayStyle };

/** The style actually used: a metric bridge always shows metres; 'metric' on a feet bridge shows decimal feet. */
export function effectiveStyle(units: Units, style: DisplayStyle): DisplayStyle {
  if (units === 'm') return 'metric';
  return style === 'feet-inches' ? 'feet-inches' : 'decimal-feet';
}

/** Unit label of a length column: "ft", "ft-in" or "m". */
export function lengthUnit(units: Units, style: DisplayStyle): string {
  const s = effectiveStyle(units, style);
  return s === 'metric' ? 'm' : s === 'feet-inches' ? 'ft-in' : 'ft';
}

/** A length without its unit (the column names it); an em dash when there is no value. */
export function lengthCell(value: number | null | undefined, units: Units, style: DisplayStyle): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const s = effectiveStyle(units, style);
  return s === 'metric' ? formatMetres(value) : s === 'feet-inches' ? formatFeetInches(value) : formatFeet(value);
}

/** An elevation without its unit: 0.01 ft or 0.001 m in every style. */
export function elevationCell(value: number | null | undefined, units: Units): string {
  return lengthText(value, units, false);
}

/** An offset from the alignment as "18.00 LT" / `18'-0" RT`. */
export function offsetCell(value: number, units: Units, style: DisplayStyle): string {
  if (!Number.isFinite(value)) return '—';
  return formatOffset(value, units, effectiveStyle(units, style));
}

/** A length with its unit where the text carries none: "3.82 ft", "1.165 m", or feet-inches as is (`3'-9 3/4"`). */
export function lengthWithUnit(value: number | null | undefined, units: Units, style: DisplayStyle): string {
  const text = lengthCell(value, units, style);
  if (text === '—' || effectiveStyle(units, style) === 'feet-inches') return text;
  return `${text} ${lengthUnit(units, style)}`;
}
