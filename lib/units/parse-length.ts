/**
 * Reading a typed measurement (field mode): decimal feet or feet-inches on a feet bridge, metres on a
 * metric one.
 */
import type { Units } from './units';

const FEET_INCHES = /^([-+]?)(\d+)\s*(?:'|ft)?\s*[- ]\s*(\d+(?:\.\d+)?)?(?:[\s-]+(\d+)\/(\d+))?\s*(?:"|in)?$/;
const FEET_ONLY = /^([-+]?)(\d+)\s*'\s*$/;

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
  const m = FEET_INCHES.exec(t) ?? FEET_ONLY.exec(t);
  if (!m) return NaN;
  const feet = Number(m[2]);
  const inches = Number(m[3] ?? 0) + (m[4] && m[5] && Number(m[5]) > 0 ? Number(m[4]) / Number(m[5]) : 0);
  if (inches >= 12) return NaN;
  const value = feet + inches / 12;
  return m[1] === '-' ? -value : value;
}
