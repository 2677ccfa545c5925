/**
 * Field-mode number text and input parsing. Display rounding only; the server computes pass/fail.
 */
import { formatFeet, formatFeetFine, formatFeetInches, formatMetres } from '@/lib/geometry/format';

export type Units = 'ft' | 'm';

/** A length with its unit: "4.53 ft" or "1.382 m"; an em dash for no value. */
export function fieldLength(v: number | null | undefined, units: Units): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  return units === 'm' ? `${formatMetres(v)} m` : `${formatFeet(v)} ft`;
}

/**
 * A level-bar reading or rod length with its unit, one digit finer than other lengths ("-0.175 ft",
 * "0.053 m"): the reading tolerance is 0.01 ft, so a target rounded to 0.01 ft could look passing
 * while it fails.
 */
export function readingLength(v: number | null | undefined, units: Units): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  return units === 'm' ? `${formatMetres(v)} m` : `${formatFeetFine(v)} ft`;
}

/** Edge width as the crew reads a tape: feet-inches to 1/8" on a feet bridge, metres otherwise. */
export function tapeLength(v: number, units: Units): string {
  return units === 'm' ? `${formatMetres(v)} m` : formatFeetInches(v);
}

/**
 * A deviation (measured − computed) with its sign, in the unit a person checks it in: an edge width in
 * inches ("+0.20 in") and a level-bar reading in feet to 0.001 ft ("+0.004 ft") on a feet bridge; both in
 * millimetres on a metric one ("−4 mm").
 */
export function deviationText(v: number | null | undefined, units: Units, kind: 'width' | 'reading' = 'width'): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  const sign = v > 0 ? '+' : v < 0 ? '−' : '±';
  if (units === 'm') return `${sign}${Math.abs(v * 1000).toFixed(0)} mm`;
  if (kind === 'reading') return `${sign}${Math.abs(v).toFixed(3)} ft`;
  return `${sign}${Math.abs(v * 12).toFixed(2)} in`;
}

/**
 * Which way to move the form edge to close a deviation (measured − computed). Width: measured wider
 * means the edge is too far out. Reading (drop from the girder top): a larger drop means the edge is
 * too low.
 */
export function fixHint(kind: 'width' | 'reading', deviation: number, units: Units): string {
  const by = deviationText(Math.abs(deviation), units, kind).replace(/^[+±]/, '');
  if (kind === 'width') return deviation > 0 ? `Bring the form edge in ${by}.` : `Set the form edge out ${by}.`;
  return deviation > 0 ? `Raise the form edge ${by}.` : `Lower the form edge ${by}.`;
}

/** A tolerance as "±0.25 in (0.021 ft)" for a width, "±0.010 ft" for a reading, "±6 mm" in metric. */
export function toleranceText(v: number, units: Units, kind: 'width' | 'reading' = 'width'): string {
  if (units === 'm') return `±${(v * 1000).toFixed(1).replace(/\.0$/, '')} mm`;
  if (kind === 'reading') return `±${v.toFixed(3)} ft`;
  const inches = v * 12;
  return `±${inches.toFixed(3).replace(/0+$/, '').replace(/\.$/, '')} in (${v.toFixed(3)} ft)`;
}
/**
 * Reads a typed measurement in the bridge's units. Feet bridges take decimal feet ("4.53") or
 * feet-inches ("4'-6 3/8\"", "4' 6.5\"", "4-6-3/8"); metric bridges take metres ("1.382"). Returns
 * null for an empty box, NaN for text that is not a length.
 */
export function parseLength(text: string, units: Units): number | null {
  const t = text.trim().replace(/[″]/g, '"').replace(/[′’]/g, "'").replace(',', '.');
  if (t === '') return null;
  if (/^[-+]?\d*\.?\d+$/.test(t)) return Number(t);
  if (units === 'm') return NaN;
  const m = /^([-+]?)(\d+)\s*(?:'|ft)?\s*[- ]\s*(\d+(?:\.\d+)?)?(?:[\s-]+(\d+)\/(\d+))?\s*(?:"|in)?$/.exec(t) ?? /^([-+]?)(\d+)\s*'\s*$/.exec(t);
  if (!m) return NaN;
  const feet = Number(m[2]);
  const inches = Number(m[3] ?? 0) + (m[4] && m[5] && Number(m[5]) > 0 ? Number(m[4]) / Number(m[5]) : 0);
  if (inches >= 12) return NaN;
  const value = feet + inches / 12;
  return m[1] === '-' ? -value : value;
}
