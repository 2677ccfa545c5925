/**
 * Display text for stations, offsets and lengths in a bridge's units, through the engine's format
 * helpers (exact half-up rounding, the same text as the CSV export): 0.01 ft or 0.001 m.
 */
import { formatFeet, formatMetres, formatOffset, formatStation } from '@/lib/geometry/format';

export type Units = 'ft' | 'm';

/** Decimal places shown for a length in these units. */
export function decimalsFor(units: Units): number {
  return units === 'm' ? 3 : 2;
}

/** A length with its unit, e.g. "4.25 ft" or "1.296 m"; an em dash when there is no value. */
export function lengthText(value: number | null | undefined, units: Units, withUnit = true): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = units === 'm' ? formatMetres(value) : formatFeet(value);
  return withUnit ? `${text} ${units}` : text;
}

/**
 * A value as it was entered in the description, with its unit: at least the display decimals and up
 * to four more significant ones (0.708 ft stays "0.708 ft", 21 ft reads "21.00 ft").
 */
export function enteredLengthText(value: number | null | undefined, units: Units): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const min = decimalsFor(units);
  let text = value.toFixed(Math.max(min, 4));
  while (text.includes('.') && text.split('.')[1].length > min && text.endsWith('0')) text = text.slice(0, -1);
  return `${text} ${units}`;
}

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

/** A slope given as rise/run shown as a percentage with its sign, e.g. -0.02 → "-2.00 %". */
export function slopeText(value: number): string {
  return `${(value * 100).toFixed(2)} %`;
}

/** Date and time in a fixed form and time zone, so server and browser render the same text. */
export function dateTimeText(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return iso;
  return `${new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' }).format(d)} UTC`;
}
