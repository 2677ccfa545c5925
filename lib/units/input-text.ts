/**
 * Text ↔ number for the geometry editor's fields. Stations may be typed as station text
 * ("12+34.56" in feet: 100 ft stations; "1+234.567" in metres: 1000 m stations) or as a plain number.
 * Conversions go through decimal.js so that what is typed is exactly the double stored (no 0.1+0.2
 * drift), and a value shown for editing carries every digit of the stored number.
 */
import Decimal from 'decimal.js';
import { stationBlock, type Units } from './units';

/** The outcome of reading a field: a number, nothing typed (`empty`), or a sentence saying what to type. */
export type Parsed = { ok: true; value: number } | { ok: false; empty: boolean; message: string };

const PLAIN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Reads a plain decimal number ("12.5", "-0.75", "1e3"); commas as thousands separators are not accepted. */
export function parseNumber(text: string, what = 'a number'): Parsed {
  const t = text.trim();
  if (t === '') return { ok: false, empty: true, message: `Type ${what}.` };
  if (!PLAIN.test(t)) return { ok: false, empty: false, message: `"${t}" is not a number; type ${what}.` };
  const v = new Decimal(t).toNumber();
  if (!Number.isFinite(v)) return { ok: false, empty: false, message: `"${t}" is too large.` };
  return { ok: true, value: v };
}

/**
 * Reads a station: "12+34.56" → 1234.56 (feet) or "1+234.567" → 1234.567 (metres), a leading minus
 * for stations before zero ("-0+50.00" → −50), or a plain number.
 */
export function parseStation(text: string, units: Units): Parsed {
  const t = text.trim().replace(/\s+/g, '');
  const example = units === 'm' ? '1+234.567 or 1234.567' : '12+34.56 or 1234.56';
  if (t === '') return { ok: false, empty: true, message: `Type a station, e.g. ${example}.` };
  const m = /^([+-]?)(\d+)\+(\d+(?:\.\d*)?)$/.exec(t);
  if (!m) {
    const plain = parseNumber(t);
    return plain.ok ? plain : { ok: false, empty: false, message: `"${t}" is not a station; type e.g. ${example}.` };
  }
  const block = stationBlock(units);
  const minor = new Decimal(m[3]);
  if (minor.greaterThanOrEqualTo(block)) {
    return { ok: false, empty: false, message: `After the + comes the distance past the station, less than ${block} ${units} ("${t}").` };
  }
  const value = new Decimal(m[2]).times(block).plus(minor);
  return { ok: true, value: (m[1] === '-' ? value.negated() : value).toNumber() };
}

/** A station as text for editing, with every digit of the stored value: 1234.5678 ft → "12+34.5678". */
export function stationInputText(value: number, units: Units): string {
  if (!Number.isFinite(value)) return '';
  const d = new Decimal(value);
  const block = stationBlock(units);
  const abs = d.abs();
  const major = abs.dividedToIntegerBy(block);
  const minor = abs.minus(major.times(block));
  const digits = units === 'm' ? 3 : 2;
  const [intPart, frac] = minor.toFixed().split('.');
  const minorText = `${intPart.padStart(digits, '0')}${frac ? `.${frac}` : units === 'm' ? '.000' : '.00'}`;
  return `${d.isNegative() && !abs.isZero() ? '-' : ''}${major.toFixed(0)}+${minorText}`;
}

/** A number as text for editing, every digit kept ("0.708", "-18.2"); '' for undefined. */
export function numberInputText(value: number | undefined | null): string {
  if (value === undefined || value === null || !Number.isFinite(value)) return '';
  return new Decimal(value).toFixed();
}

/** A slope (rise/run) as a percentage for editing: −0.02 → "-2". */
export function percentInputText(slope: number): string {
  return Number.isFinite(slope) ? new Decimal(slope).times(100).toFixed() : '';
}

/** A percentage typed by the user back to rise/run: "-2" → −0.02 (exact decimal division). */
export function parsePercent(text: string): Parsed {
  const p = parseNumber(text, 'a slope in percent, e.g. -2');
  if (!p.ok) return p;
  return { ok: true, value: new Decimal(text.trim()).dividedBy(100).toNumber() };
}
