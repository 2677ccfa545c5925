/**
 * Display text for lengths, stations and offsets. The engine computes in doubles; only here are
 * numbers rounded, through decimal arithmetic with ROUND_HALF_UP so that 1.005 shows as 1.01 and a
 * value never rounds differently from what a person doing it by hand would write.
 */
import { Decimal } from 'decimal.js';

const Dec = Decimal.clone({ precision: 40, rounding: Decimal.ROUND_HALF_UP });

/**
 * How lengths are shown: decimal feet or feet-inches to 1/8" for a feet bridge. Metric follows the
 * bridge's units: a metric bridge always shows metres, and 'metric' on a feet bridge shows decimal
 * feet (the style never relabels a number in another unit).
 */
export type DisplayStyle = 'decimal-feet' | 'feet-inches' | 'metric';

function fixed(value: number, places: number): string {
  if (!Number.isFinite(value)) return String(value);
  const text = new Dec(value).toDecimalPlaces(places, Decimal.ROUND_HALF_UP).toFixed(places);
  // A tiny negative that rounds to zero is shown as plain zero.
  return /^-0(\.0*)?$/.test(text) ? text.slice(1) : text;
}

/** Feet to 0.01 ft, e.g. 3.14159 → "3.14". No unit text. Any finite value. */
export function formatFeet(feet: number): string {
  return fixed(feet, 2);
}

/** Feet to 0.001 ft, e.g. -0.17452 → "-0.175": level-bar readings, judged to 0.01 ft. No unit text. Any finite value. */
export function formatFeetFine(feet: number): string {
  return fixed(feet, 3);
}

/** Metres to 0.001 m (1 mm), e.g. 1.23456 → "1.235". No unit text. Any finite value. */
export function formatMetres(metres: number): string {
  return fixed(metres, 3);
}

const FRACTIONS = ['', ' 1/8', ' 1/4', ' 3/8', ' 1/2', ' 5/8', ' 3/4', ' 7/8'];

/**
 * Feet to feet-inches at the nearest 1/8 inch, e.g. 1.1979 ft → `1'-2 3/8"`. Negative values get a
 * leading minus; 11 15/16" rounds up into the next foot (`1'-0"`, never `0'-12"`). Any finite value.
 */
export function formatFeetInches(feet: number): string {
  if (!Number.isFinite(feet)) return String(feet);
  const eighths = new Dec(feet).abs().times(96).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).toNumber();
  const wholeFeet = Math.floor(eighths / 96);
  const remainder = eighths - wholeFeet * 96;
  const inches = Math.floor(remainder / 8);
  const eighth = remainder - inches * 8;
  const sign = feet < 0 && eighths > 0 ? '-' : '';
  return `${sign}${wholeFeet}'-${inches}${FRACTIONS[eighth]}"`;
}

/**
 * A length in the chosen display style, with its unit where the style has none built in:
 * "3.14 ft", `3'-1 5/8"`, "0.957 m". Metric bridges (units "m") always show metres.
 * @param value length in the bridge's unit.
 */
export function formatLength(value: number, units: 'ft' | 'm', style: DisplayStyle = 'decimal-feet'): string {
  if (units === 'm') return `${formatMetres(value)} m`;
  if (style === 'feet-inches') return formatFeetInches(value);
  return `${formatFeet(value)} ft`;
}

/**
 * Station text: "12+34.56" in feet (100 ft stations, 0.01 ft) or "1+234.567" in metres (1000 m
 * stations, 1 mm). Negative stations carry a leading minus on the whole value ("-0+50.00").
 * @param station length units of the bridge.
 */
export function formatStation(station: number, units: 'ft' | 'm'): string {
  if (!Number.isFinite(station)) return String(station);
  const places = units === 'm' ? 3 : 2;
  const block = units === 'm' ? 1000 : 100;
  const digits = units === 'm' ? 3 : 2;
  const rounded = new Dec(station).abs().toDecimalPlaces(places, Decimal.ROUND_HALF_UP);
  const major = rounded.dividedToIntegerBy(block);
  const minor = rounded.minus(major.times(block));
  const [intPart, fracPart] = minor.toFixed(places).split('.');
  const sign = station < 0 && !rounded.isZero() ? '-' : '';
  return `${sign}${major.toFixed(0)}+${intPart.padStart(digits, '0')}.${fracPart}`;
}

/**
 * Offset as a person reads it: distance without sign plus LT (negative, left) or RT (positive,
 * right), e.g. -18 → "18.00 LT". An offset that rounds to zero shows as "0.00" with no side.
 * @param offset signed length (positive right), bridge units.
 */
export function formatOffset(offset: number, units: 'ft' | 'm', style: DisplayStyle = 'decimal-feet'): string {
  const magnitude = Math.abs(offset);
  const text = units === 'm' ? formatMetres(magnitude) : style === 'feet-inches' ? formatFeetInches(magnitude) : formatFeet(magnitude);
  if (/^0(\.0+)?$/.test(text) || text === `0'-0"`) return text;
  return `${text} ${offset < 0 ? 'LT' : 'RT'}`;
}
