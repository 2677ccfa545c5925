/**
 * Small shared pieces of the LandXML import: the error type, plan points ("N E" text, or a pntRef to
 * a CgPoint), azimuths and numeric attributes. Plan points come back as x = easting, y = northing.
 */
import { formatStation } from '@/lib/geometry';
import { XmlReadError, type XmlNode } from './xml-tree';

export type LengthUnit = 'ft' | 'm';

/** A file or a part of one the import refuses, with its HTTP status (400 unreadable, 422 unusable). */
export class LandXmlError extends XmlReadError {}

export const fail = (message: string, status = 422): never => {
  throw new LandXmlError(status, message);
};

export interface Pt {
  /** Easting. */
  x: number;
  /** Northing. */
  y: number;
}

export const TWO_PI = 2 * Math.PI;

export function numbersIn(text: string): number[] {
  return text
    .trim()
    .split(/[\s,]+/)
    .filter(Boolean)
    .map(Number);
}

/** A numeric attribute, undefined when absent or blank; a problem when it is not a number. */
export function finiteAttr(node: XmlNode, name: string, where: string): number | undefined {
  const raw = node.attrs[name];
  if (raw === undefined || raw.trim() === '') return undefined;
  const v = Number(raw);
  if (!Number.isFinite(v)) fail(`${where}: the ${name} attribute "${raw}" is not a number.`);
  return v;
}

/** Plan point of a Start/End/Center/PI element: "N E" (optionally "N E Z") or a pntRef to a CgPoint. */
export function pointOf(node: XmlNode | undefined, label: string, where: string, cgPoints: Map<string, string>): Pt {
  if (!node) return fail(`${where} has no ${label} point.`);
  let text = node.text;
  if (!text && node.attrs.pntRef) {
    const ref = cgPoints.get(node.attrs.pntRef);
    if (ref === undefined) fail(`${where}: the ${label} point refers to CgPoint "${node.attrs.pntRef}", which the file does not define.`);
    text = ref as string;
  }
  const nums = numbersIn(text);
  if (nums.length < 2 || nums.length > 3 || nums.some((n) => !Number.isFinite(n))) {
    fail(`${where}: the ${label} point "${text}" must be two or three numbers, northing first ("N E").`);
  }
  return { x: nums[1], y: nums[0] };
}

export const dist = (a: Pt, b: Pt) => Math.hypot(b.x - a.x, b.y - a.y);

/** Azimuth from a to b, radians clockwise from north, in [0, 2π). */
export const azimuth = (a: Pt, b: Pt) => {
  const t = Math.atan2(b.x - a.x, b.y - a.y);
  return t < 0 ? t + TWO_PI : t;
};

/** Smallest signed difference b − a of two angles, radians in (−π, π]. */
export const angleDiff = (a: number, b: number) => {
  let d = (b - a) % TWO_PI;
  if (d > Math.PI) d -= TWO_PI;
  if (d <= -Math.PI) d += TWO_PI;
  return d;
};

export const normalAngle = (a: number) => ((a % TWO_PI) + TWO_PI) % TWO_PI;
export const degrees = (rad: number) => (rad * 180) / Math.PI;
export const fmt = (v: number) => (Math.abs(v) >= 1 ? v.toFixed(3) : v.toPrecision(3));

/** Station text for messages ("12+34.56" in feet, "1+234.567" in metres); "an unknown station" when not known. */
export function stationWords(station: number, units: LengthUnit): string {
  return Number.isFinite(station) ? `station ${formatStation(station, units)}` : 'an unknown station';
}
