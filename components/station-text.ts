/**
 * Display text for stations, offsets and lengths in a bridge's units. Rounding here is for display
 * only: 0.01 ft or 0.001 m.
 */
export type Units = 'ft' | 'm';

/** Decimal places shown for a length in these units. */
export function decimalsFor(units: Units): number {
  return units === 'm' ? 3 : 2;
}

/** A length with its unit, e.g. "4.25 ft" or "1.296 m"; an em dash when there is no value. */
export function lengthText(value: number | null | undefined, units: Units, withUnit = true): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = value.toFixed(decimalsFor(units));
  const clean = /^-0\.0+$/.test(text) ? text.slice(1) : text;
  return withUnit ? `${clean} ${units}` : clean;
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

/**
 * Station text: 1234.56 ft → "12+34.56", 1234.567 m → "1+234.567". Negative stations keep a leading
 * minus on the whole value ("-0+12.50").
 */
export function stationText(value: number, units: Units): string {
  if (!Number.isFinite(value)) return '—';
  const decimals = decimalsFor(units);
  const group = units === 'm' ? 3 : 2;
  const fixed = Math.abs(value).toFixed(decimals);
  const [whole, frac] = fixed.split('.');
  const head = whole.length > group ? whole.slice(0, whole.length - group) : '0';
  const tail = whole.slice(-group).padStart(group, '0');
  const negative = value < 0 && Number(fixed) !== 0;
  return `${negative ? '-' : ''}${head}+${tail}.${frac}`;
}

/** An offset from the alignment as "18.00 LT" / "6.00 RT" (no sign); "0.00 CL" on the centreline. */
export function offsetText(value: number, units: Units, withUnit = false): string {
  if (!Number.isFinite(value)) return '—';
  const magnitude = lengthText(Math.abs(value), units, withUnit);
  if (Number(Math.abs(value).toFixed(decimalsFor(units))) === 0) return `${magnitude} CL`;
  return `${magnitude} ${value < 0 ? 'LT' : 'RT'}`;
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
