/**
 * LandXML design profile (Profile / ProfAlign: PVI, ParaCurve, CircCurve) → bridge-format `profile`.
 * A circular vertical curve (CircCurve) becomes the symmetric parabola with the same PVI and length;
 * the note states the largest vertical difference between the two over the curve, and the profile is
 * left out when it exceeds {@link circleTolerance}. A profile that cannot be used is left out with
 * every reason; the horizontal alignment is imported regardless.
 */
import type { PviInput } from '@/lib/geometry';
import { fmt, stationWords, type LengthUnit } from './landxml-points';
import { childNamed, childrenNamed, type XmlNode } from './xml-tree';
import { numbersIn } from './landxml-points';
import { PARALLEL_DETERMINANT, POINT_TOLERANCE, atLeast, atMost, nearlyZero } from '@/lib/units';

/** Largest accepted vertical difference circle ↔ parabola: 0.001 ft, or 0.3 mm in a metric file. */
export const circleTolerance = (units: LengthUnit) => (units === 'm' ? 0.0003048 : 0.001);

export interface ProfileResult {
  profile: { pvis: PviInput[] } | null;
  name: string | null;
  notes: string[];
  /** Why the profile was left out (every problem, each with its station); null when it was read or the file has none. */
  leftOut: string[] | null;
}

interface Row {
  kind: string;
  station: number;
  elevation: number;
  length?: number;
  radius?: number;
}

/** Elevation at station s of a circular vertical curve of radius R tangent to grades g1, g2 through the PVI (s0, z0). */
export function circularCurve(s0: number, z0: number, g1: number, g2: number, R: number) {
  const a1 = Math.atan(g1);
  const a2 = Math.atan(g2);
  const sag = a2 > a1;
  const T = R * Math.tan(Math.abs(a2 - a1) / 2);
  const p1 = { s: s0 - T * Math.cos(a1), z: z0 - T * Math.sin(a1) };
  const p2 = { s: s0 + T * Math.cos(a2), z: z0 + T * Math.sin(a2) };
  // Centre: R from the first tangent point along the normal toward the concave side.
  const c = sag ? { s: p1.s - R * Math.sin(a1), z: p1.z + R * Math.cos(a1) } : { s: p1.s + R * Math.sin(a1), z: p1.z - R * Math.cos(a1) };
  const elevation = (s: number) => {
    if (s <= p1.s) return z0 + g1 * (s - s0);
    if (s >= p2.s) return z0 + g2 * (s - s0);
    const root = Math.sqrt(Math.max(0, R * R - (s - c.s) ** 2));
    return sag ? c.z - root : c.z + root;
  };
  return { start: p1.s, end: p2.s, horizontalLength: p2.s - p1.s, arcLength: R * Math.abs(a2 - a1), elevation };
}

/** Elevation of the symmetric parabola of length L at the PVI (s0, z0) between grades g1 and g2. */
export function parabolicCurve(s0: number, z0: number, g1: number, g2: number, L: number) {
  return (s: number) => {
    const x = s - (s0 - L / 2);
    if (x <= 0) return z0 + g1 * (s - s0);
    if (x >= L) return z0 + g2 * (s - s0);
    return z0 - (g1 * L) / 2 + g1 * x + ((g2 - g1) * x * x) / (2 * L);
  };
}

/** Largest |circle − parabola| over both curves' extent, sampled at 4000 even steps (plus the ends). */
export function largestDifference(circle: ReturnType<typeof circularCurve>, parabola: (s: number) => number, s0: number, L: number): number {
  const from = Math.min(circle.start, s0 - L / 2);
  const to = Math.max(circle.end, s0 + L / 2);
  let worst = 0;
  for (let i = 0; i <= 4000; i++) {
    const s = from + ((to - from) * i) / 4000;
    worst = Math.max(worst, Math.abs(circle.elevation(s) - parabola(s)));
  }
  return worst;
}

function readRows(pa: XmlNode, units: LengthUnit, problems: string[]): Row[] {
  const rows: Row[] = [];
  pa.children.forEach((c, i) => {
    const nums = numbersIn(c.text);
    const at = nums.length === 2 && Number.isFinite(nums[0]) ? stationWords(nums[0], units) : `profile point ${i + 1}`;
    if (!['PVI', 'ParaCurve', 'CircCurve', 'UnsymParaCurve'].includes(c.name)) return;
    if (nums.length !== 2 || nums.some((n) => !Number.isFinite(n))) {
      problems.push(`${c.name} at ${at}: "${c.text}" must be two numbers, station then elevation.`);
      return;
    }
    if (c.name === 'UnsymParaCurve') {
      problems.push(`UnsymParaCurve at ${at}: unsymmetrical vertical curves are not read; Chordline uses symmetric parabolic curves.`);
      return;
    }
    const length = c.attrs.length !== undefined ? Number(c.attrs.length) : undefined;
    const radius = c.attrs.radius !== undefined ? Number(c.attrs.radius) : undefined;
    if (c.name === 'ParaCurve' && !(length !== undefined && length >= 0)) problems.push(`ParaCurve at ${at}: a ParaCurve needs a length attribute of zero or more.`);
    if (c.name === 'CircCurve' && !((length !== undefined && length > 0) || (radius !== undefined && radius > 0))) {
      problems.push(`CircCurve at ${at}: a CircCurve needs a radius or length attribute greater than zero.`);
    }
    rows.push({ kind: c.name, station: nums[0], elevation: nums[1], length, radius });
  });
  return rows;
}

/** Replaces each CircCurve by a parabola; pushes the note or the problem. */
function circlesToParabolas(rows: Row[], units: LengthUnit, notes: string[], problems: string[]): PviInput[] {
  const tol = circleTolerance(units);
  return rows.map((r, i) => {
    const pvi: PviInput = { station: r.station, elevation: r.elevation };
    if (r.kind === 'ParaCurve' && (r.length ?? 0) > 0) pvi.curve_length = r.length;
    if (r.kind !== 'CircCurve') return pvi;
    const at = `CircCurve at ${stationWords(r.station, units)}`;
    if (i === 0 || i === rows.length - 1) {
      problems.push(`${at}: the ${i === 0 ? 'first' : 'last'} point of the profile cannot carry a vertical curve.`);
      return pvi;
    }
    const g1 = (r.elevation - rows[i - 1].elevation) / (r.station - rows[i - 1].station);
    const g2 = (rows[i + 1].elevation - r.elevation) / (rows[i + 1].station - r.station);
    if (!Number.isFinite(g1) || !Number.isFinite(g2) || nearlyZero(g2 - g1, PARALLEL_DETERMINANT)) {
      notes.push(`${at}: the grades on both sides are the same, so the curve was read as a plain PVI.`);
      return pvi;
    }
    const aDelta = Math.abs(Math.atan(g2) - Math.atan(g1));
    const R = r.radius && r.radius > 0 ? r.radius : (r.length as number) / (Math.tan(aDelta / 2) * (Math.cos(Math.atan(g1)) + Math.cos(Math.atan(g2))));
    const circle = circularCurve(r.station, r.elevation, g1, g2, R);
    const L = circle.horizontalLength;
    if (r.radius && r.length !== undefined && Math.abs(r.length - L) > 0.01 && Math.abs(r.length - circle.arcLength) > 0.01) {
      notes.push(`${at}: the length attribute (${fmt(r.length)}) does not match the radius ${fmt(R)} (a curve ${fmt(L)} long); the radius was used.`);
    }
    const diff = largestDifference(circle, parabolicCurve(r.station, r.elevation, g1, g2, L), r.station, L);
    const words = `${diff < 1e-6 ? diff.toExponential(1) : diff.toFixed(units === 'm' ? 6 : 5)} ${units}`;
    if (diff > tol) {
      problems.push(`${at} (radius ${fmt(R)}): a parabola with the same PVI and length ${fmt(L)} differs from the circle by up to ${words}, more than ${units === 'm' ? '0.3 mm' : '0.001 ft'}.`);
    } else {
      notes.push(`${at} (radius ${fmt(R)}) was read as a parabolic vertical curve with the same PVI and length ${fmt(L)}; the two differ by at most ${words} over the curve.`);
    }
    pvi.curve_length = L;
    return pvi;
  });
}

function overlapProblems(pvis: PviInput[], units: LengthUnit): string[] {
  const out: string[] = [];
  for (let i = 1; i < pvis.length; i++) {
    if (!(pvis[i].station > pvis[i - 1].station)) {
      out.push(`Profile point at ${stationWords(pvis[i].station, units)} is not up-station of the one before it (${stationWords(pvis[i - 1].station, units)}).`);
      continue;
    }
    const prevEnd = pvis[i - 1].station + (pvis[i - 1].curve_length ?? 0) / 2;
    const start = pvis[i].station - (pvis[i].curve_length ?? 0) / 2;
    if (!atLeast(start, prevEnd)) out.push(`The vertical curves at ${stationWords(pvis[i - 1].station, units)} and ${stationWords(pvis[i].station, units)} overlap.`);
  }
  return out;
}

/**
 * Reads the first design profile (ProfAlign) of an Alignment; never throws for a bad profile (it is
 * left out with its reasons), and says when it does not cover the alignment from start to end.
 */
export function readProfile(alignmentNode: XmlNode, units: LengthUnit, startStation: number, endStation: number): ProfileResult {
  const notes: string[] = [];
  const profAligns = childrenNamed(alignmentNode, 'Profile').flatMap((p) => childrenNamed(p, 'ProfAlign'));
  if (profAligns.length === 0) return { profile: null, name: null, notes, leftOut: ['The file gives no design profile (ProfAlign) for this alignment.'] };
  const pa = profAligns[0];
  const name = pa.attrs.name ?? null;
  if (profAligns.length > 1) notes.push(`The alignment has ${profAligns.length} design profiles; the first (${name ?? 'unnamed'}) was read.`);
  const problems: string[] = [];
  const rows = readRows(pa, units, problems);
  if (rows.length === 0 && problems.length === 0) problems.push(`The design profile${name ? ` "${name}"` : ''} holds no PVI, ParaCurve or CircCurve.`);
  const pvis = problems.length === 0 ? circlesToParabolas(rows, units, notes, problems) : [];
  if (problems.length === 0) problems.push(...overlapProblems(pvis, units));
  if (problems.length > 0) return { profile: null, name, notes, leftOut: problems };
  const first = pvis[0].station;
  const last = pvis[pvis.length - 1].station;
  const gaps: string[] = [];
  if (!atMost(first, startStation, POINT_TOLERANCE)) gaps.push(`starts at ${stationWords(first, units)}, after the alignment's start (${stationWords(startStation, units)})`);
  if (!atLeast(last, endStation, POINT_TOLERANCE)) gaps.push(`ends at ${stationWords(last, units)}, before the alignment's end (${stationWords(endStation, units)})`);
  if (gaps.length > 0) notes.push(`The profile does not cover the whole alignment: it ${gaps.join(' and ')}; beyond its ends the grade runs straight on.`);
  return { profile: { pvis }, name, notes, leftOut: null };
}

export { childNamed };
