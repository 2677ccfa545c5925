/**
 * Display text of lengths in a bridge's units, through the engine's format helpers (exact half-up
 * rounding, the same text as the CSV export): 0.01 ft or 0.001 m; readings 0.001 ft; tapes feet-inches.
 */
import { formatFeet, formatFeetFine, formatFeetInches, formatMetres } from '@/lib/geometry';
import { decimalsFor, type Units } from './units';

const missing = (v: number | null | undefined): v is null | undefined => v === null || v === undefined || !Number.isFinite(v);

/** A length with its unit, e.g. "4.25 ft" or "1.296 m" (or without it); an em dash when there is no value. */
export function lengthText(value: number | null | undefined, units: Units, withUnit = true): string {
  if (missing(value)) return '—';
  const text = units === 'm' ? formatMetres(value) : formatFeet(value);
  return withUnit ? `${text} ${units}` : text;
}

/**
 * A value as it was entered in the description, with its unit: at least the display decimals and up
 * to four more significant ones (0.708 ft stays "0.708 ft", 21 ft reads "21.00 ft").
 */
export function enteredLengthText(value: number | null | undefined, units: Units): string {
  if (missing(value)) return '—';
  const min = decimalsFor(units);
  let text = value.toFixed(Math.max(min, 4));
  while (text.includes('.') && text.split('.')[1].length > min && text.endsWith('0')) text = text.slice(0, -1);
  return `${text} ${units}`;
}

/**
 * A level-bar reading or rod length with its unit, one digit finer than other lengths ("-0.175 ft",
 * "0.053 m"): the reading tolerance is 0.01 ft, so a target rounded to 0.01 ft could look passing
 * while it fails.
 */
export function readingLength(v: number | null | undefined, units: Units): string {
  if (missing(v)) return '—';
  return units === 'm' ? `${formatMetres(v)} m` : `${formatFeetFine(v)} ft`;
}

/** Edge width as the crew reads a tape: feet-inches to 1/8" on a feet bridge, metres with unit otherwise. */
export function tapeLength(v: number, units: Units): string {
  return units === 'm' ? `${formatMetres(v)} m` : formatFeetInches(v);
}

/** A width for a printed or mailed sheet: `4'-6" (4.50 ft)` on a feet bridge, "1.372 m" otherwise. */
export function tapeAndDecimalLength(v: number, units: Units): string {
  return units === 'm' ? `${formatMetres(v)} m` : `${formatFeetInches(v)} (${formatFeet(v)} ft)`;
}

/**
 * A signed difference without unit; one that rounds to zero at display precision is shown one step
 * finer still (0.001 ft / 0.0001 m) so a real change never reads as zero. Em dash for no value.
 */
export function differenceText(v: number | null, units: Units): string {
  if (v === null || !Number.isFinite(v)) return '—';
  let text = lengthText(Math.abs(v), units, false);
  if (/^0\.0+$/.test(text)) text = Math.abs(v).toFixed(units === 'm' ? 4 : 3);
  return /^0\.0+$/.test(text) ? text : `${v > 0 ? '+' : '−'}${text}`;
}

/** A slope given as rise/run shown as a percentage with its sign, e.g. -0.02 → "-2.00 %". */
export function slopeText(value: number): string {
  return `${(value * 100).toFixed(2)} %`;
}
