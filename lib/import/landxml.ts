/**
 * LandXML 1.2 import: reads the horizontal geometry (Alignment / CoordGeom Line and Curve) and the
 * design profile (Profile / ProfAlign PVI and ParaCurve) of each alignment and turns them into
 * bridge-format `alignment` and `profile` fragments (see the shared bridge-format contract).
 *
 * LandXML gives plan coordinates NORTHING FIRST ("N E"); the bridge format uses x = easting,
 * y = northing. Curve rot="cw" turns right (bearing grows), rot="ccw" turns left. Bearings here are
 * azimuths clockwise from north. Element lengths, radii and the start bearing are taken from the
 * element points (Start, Center, End) so the imported alignment passes through the points the file
 * gives; the length and radius attributes, when present, must agree with them.
 */
import type { AlignmentElementInput, PviInput } from '@/lib/geometry';
import { childNamed, childrenNamed, readXml, XmlReadError, type XmlNode } from './xml-tree';

export type LengthUnit = 'ft' | 'm';

/** One alignment of the file, ready to replace a bridge description's `alignment` and `profile`. */
export interface ImportedAlignment {
  name: string;
  alignment: {
    start_station: number;
    start_x: number;
    start_y: number;
    start_bearing_deg: number;
    elements: AlignmentElementInput[];
  };
  /** The first ProfAlign of the alignment's first Profile; null when the file gives none. */
  profile: { pvis: PviInput[] } | null;
  /** Name of the ProfAlign the profile came from. */
  profile_name: string | null;
  /** Things worth knowing that did not stop the import (sentences). */
  notes: string[];
}

export interface LandXmlImport {
  /** The file's linear unit mapped to the bridge's ("ft" for foot and USSurveyFoot, "m" for meter). */
  units: LengthUnit;
  /** The linearUnit attribute as written in the file. */
  linear_unit: string;
  alignments: ImportedAlignment[];
  /** Alignments of the file that could not be imported, with the reason (a sentence). */
  skipped: { name: string; reason: string }[];
}

/** A file the import refuses, with its HTTP status (400 unreadable, 422 unusable). */
export class LandXmlError extends XmlReadError {}

/** Largest gap between one element's End and the next element's Start, in the file's unit. */
export const JOIN_TOLERANCE = 0.005;
/** Largest change of bearing at a join, radians (about 20 seconds of arc): the elements must be tangent. */
export const TANGENCY_TOLERANCE = 1e-4;
/** Largest disagreement between a length/radius attribute and the element's points, in the file's unit. */
export const ATTRIBUTE_TOLERANCE = 0.01;
/**
 * When a stated length or radius agrees with the element's points this closely (file units), the
 * stated value is used: the difference is only the rounding of the coordinates in the file.
 */
export const SNAP_TOLERANCE = 1e-6;

/** The stated attribute when it agrees with the geometry to {@link SNAP_TOLERANCE}, else the geometry's value. */
const preferStated = (geometric: number, stated: number | undefined) => (stated !== undefined && Math.abs(stated - geometric) <= SNAP_TOLERANCE ? stated : geometric);

const LINEAR_UNITS: Record<string, LengthUnit> = {
  foot: 'ft',
  ussurveyfoot: 'ft',
  internationalfoot: 'ft',
  meter: 'm',
  metre: 'm',
};

const UNSUPPORTED_GEOMETRY: Record<string, string> = {
  Spiral: 'spirals are not supported yet',
  Chain: 'Chain elements are not supported; export the alignment as Line and Curve elements',
  IrregularLine: 'IrregularLine elements are not supported; export the alignment as Line and Curve elements',
};

const UNSUPPORTED_PROFILE: Record<string, string> = {
  CircCurve: 'circular vertical curves (CircCurve) are not supported; use parabolic curves (ParaCurve)',
  UnsymParaCurve: 'unsymmetrical vertical curves (UnsymParaCurve) are not supported; use symmetric parabolic curves (ParaCurve)',
};

const TWO_PI = 2 * Math.PI;

interface Pt {
  /** Easting. */
  x: number;
  /** Northing. */
  y: number;
}

const fail = (message: string, status = 422): never => {
  throw new LandXmlError(status, message);
};

function numbersIn(text: string): number[] {
  const parts = text.trim().split(/[\s,]+/).filter(Boolean);
  return parts.map(Number);
}

function finiteAttr(node: XmlNode, name: string, where: string): number | undefined {
  const raw = node.attrs[name];
  if (raw === undefined || raw.trim() === '') return undefined;
  const v = Number(raw);
  if (!Number.isFinite(v)) fail(`${where}: the ${name} attribute "${raw}" is not a number.`);
  return v;
}

/** Plan point of a Start/End/Center/PI element: "N E" (optionally "N E Z") or a pntRef to a CgPoint. */
function pointOf(node: XmlNode | undefined, label: string, where: string, cgPoints: Map<string, string>): Pt {
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

const dist = (a: Pt, b: Pt) => Math.hypot(b.x - a.x, b.y - a.y);
/** Azimuth from a to b, radians clockwise from north, in [0, 2π). */
const azimuth = (a: Pt, b: Pt) => {
  const t = Math.atan2(b.x - a.x, b.y - a.y);
  return t < 0 ? t + TWO_PI : t;
};
/** Smallest signed difference b − a of two angles, radians in (−π, π]. */
const angleDiff = (a: number, b: number) => {
  let d = (b - a) % TWO_PI;
  if (d > Math.PI) d -= TWO_PI;
  if (d <= -Math.PI) d += TWO_PI;
  return d;
};
const degrees = (rad: number) => (rad * 180) / Math.PI;
const fmt = (v: number) => (Math.abs(v) >= 1 ? v.toFixed(3) : v.toPrecision(3));

interface Laid {
  element: AlignmentElementInput;
  start: Pt;
  end: Pt;
  /** Tangent azimuths at the start and end, radians clockwise from north. */
  bearingIn: number;
  bearingOut: number;
}

function readLine(node: XmlNode, where: string, cg: Map<string, string>): Laid {
  const start = pointOf(childNamed(node, 'Start'), 'Start', where, cg);
  const end = pointOf(childNamed(node, 'End'), 'End', where, cg);
  const length = dist(start, end);
  if (!(length > 0)) fail(`${where}: Start and End are the same point, so the line has no length.`);
  const stated = finiteAttr(node, 'length', where);
  if (stated !== undefined && Math.abs(stated - length) > ATTRIBUTE_TOLERANCE) {
    fail(`${where}: the length attribute (${fmt(stated)}) does not match the distance from Start to End (${fmt(length)}).`);
  }
  const b = azimuth(start, end);
  return { element: { type: 'line', length: preferStated(length, stated) }, start, end, bearingIn: b, bearingOut: b };
}

function readCurve(node: XmlNode, where: string, cg: Map<string, string>): Laid {
  const rot = node.attrs.rot;
  if (rot !== 'cw' && rot !== 'ccw') fail(`${where}: the rot attribute must be "cw" (turning right) or "ccw" (turning left), not "${rot ?? ''}".`);
  const turn = rot === 'cw' ? 1 : -1;
  const start = pointOf(childNamed(node, 'Start'), 'Start', where, cg);
  const center = pointOf(childNamed(node, 'Center'), 'Center', where, cg);
  const end = pointOf(childNamed(node, 'End'), 'End', where, cg);
  const radius = dist(center, start);
  if (!(radius > 0)) fail(`${where}: Start and Center are the same point, so the curve has no radius.`);
  const endRadius = dist(center, end);
  if (Math.abs(endRadius - radius) > JOIN_TOLERANCE) {
    fail(`${where}: Start and End are not the same distance from Center (${fmt(radius)} and ${fmt(endRadius)}); this is not a circular curve.`);
  }
  // Radial directions from the centre; the sweep is measured in the turning direction.
  const a0 = azimuth(center, start);
  const a1 = azimuth(center, end);
  let sweep = turn * (a1 - a0);
  sweep = ((sweep % TWO_PI) + TWO_PI) % TWO_PI;
  const length = radius * sweep;
  if (!(length > 0)) fail(`${where}: Start and End are the same point, so the curve has no length.`);
  const statedRadius = finiteAttr(node, 'radius', where);
  if (statedRadius !== undefined && Math.abs(statedRadius - radius) > ATTRIBUTE_TOLERANCE) {
    fail(`${where}: the radius attribute (${fmt(statedRadius)}) does not match the distance from Center to Start (${fmt(radius)}).`);
  }
  const statedLength = finiteAttr(node, 'length', where);
  if (statedLength !== undefined && Math.abs(statedLength - length) > ATTRIBUTE_TOLERANCE) {
    fail(
      `${where}: the length attribute (${fmt(statedLength)}) does not match the arc from Start to End turning ${rot === 'cw' ? 'right (cw)' : 'left (ccw)'} (${fmt(length)}); check the rot attribute.`,
    );
  }
  // Travelling with the centre on the right (cw), the radius from the centre points 90° left of the
  // tangent, so the tangent is the radial azimuth turned 90° clockwise (counterclockwise for ccw).
  const bearingIn = (a0 + (turn * Math.PI) / 2 + TWO_PI) % TWO_PI;
  const bearingOut = (a1 + (turn * Math.PI) / 2 + TWO_PI) % TWO_PI;
  return {
    element: { type: 'arc', length: preferStated(length, statedLength), radius: preferStated(radius, statedRadius), direction: rot === 'cw' ? 'right' : 'left' },
    start,
    end,
    bearingIn,
    bearingOut,
  };
}

function readProfile(alignmentNode: XmlNode, where: string): { profile: { pvis: PviInput[] } | null; name: string | null; notes: string[] } {
  const notes: string[] = [];
  const profileNode = childNamed(alignmentNode, 'Profile');
  const profAligns = profileNode ? childrenNamed(profileNode, 'ProfAlign') : [];
  if (profAligns.length === 0) {
    notes.push(`${where} has no design profile (ProfAlign); the editor keeps its current profile.`);
    return { profile: null, name: null, notes };
  }
  const pa = profAligns[0];
  const name = pa.attrs.name ?? null;
  if (profAligns.length > 1) notes.push(`${where} has ${profAligns.length} design profiles; the first (${name ?? 'unnamed'}) was read.`);
  const pvis: PviInput[] = [];
  pa.children.forEach((c, i) => {
    const here = `${where}, profile point ${i + 1} (${c.name})`;
    if (UNSUPPORTED_PROFILE[c.name]) fail(`${here}: ${UNSUPPORTED_PROFILE[c.name]}.`);
    if (c.name !== 'PVI' && c.name !== 'ParaCurve') return;
    const nums = numbersIn(c.text);
    if (nums.length !== 2 || nums.some((n) => !Number.isFinite(n))) fail(`${here}: "${c.text}" must be two numbers, station then elevation.`);
    const pvi: PviInput = { station: nums[0], elevation: nums[1] };
    if (c.name === 'ParaCurve') {
      const L = finiteAttr(c, 'length', here);
      if (L === undefined || !(L >= 0)) fail(`${here}: a ParaCurve needs a length attribute of zero or more.`);
      if ((L as number) > 0) pvi.curve_length = L as number;
    }
    pvis.push(pvi);
  });
  if (pvis.length === 0) fail(`${where}: the design profile${name ? ` "${name}"` : ''} holds no PVI or ParaCurve.`);
  for (let i = 1; i < pvis.length; i++) {
    if (!(pvis[i].station > pvis[i - 1].station)) fail(`${where}: profile point ${i + 1} at station ${fmt(pvis[i].station)} is not up-station of point ${i} (${fmt(pvis[i - 1].station)}).`);
  }
  return { profile: { pvis }, name, notes };
}

function readAlignment(node: XmlNode, index: number, cg: Map<string, string>): ImportedAlignment {
  const name = node.attrs.name?.trim() || `Alignment ${index + 1}`;
  const where = `Alignment "${name}"`;
  if (childNamed(node, 'StaEquation')) fail(`${where}: station equations (StaEquation) are not supported; export the alignment with continuous stationing.`);
  const coordGeom = childNamed(node, 'CoordGeom');
  if (!coordGeom || coordGeom.children.length === 0) fail(`${where} has no CoordGeom elements.`);
  const laid: Laid[] = [];
  (coordGeom as XmlNode).children.forEach((c, i) => {
    const here = `${where}, element ${i + 1} (${c.name})`;
    if (UNSUPPORTED_GEOMETRY[c.name]) fail(`${here}: ${UNSUPPORTED_GEOMETRY[c.name]}.`);
    if (c.name === 'Line') laid.push(readLine(c, here, cg));
    else if (c.name === 'Curve') laid.push(readCurve(c, here, cg));
    else fail(`${here}: ${c.name} is not an alignment element this import reads (Line and Curve are).`);
  });
  for (let i = 1; i < laid.length; i++) {
    const gap = dist(laid[i - 1].end, laid[i].start);
    if (gap > JOIN_TOLERANCE) fail(`${where}: element ${i + 1} does not start where element ${i} ends (a gap of ${fmt(gap)}).`);
    const kink = angleDiff(laid[i - 1].bearingOut, laid[i].bearingIn);
    if (Math.abs(kink) > TANGENCY_TOLERANCE) {
      fail(`${where}: element ${i + 1} is not tangent to element ${i} (the direction changes by ${degrees(Math.abs(kink)).toFixed(4)}° at the join); Chordline lays elements tangent end to end.`);
    }
  }
  const staStart = finiteAttr(node, 'staStart', where) ?? 0;
  const notes: string[] = [];
  if (node.attrs.staStart === undefined) notes.push(`${where} gives no staStart; stations start at 0.`);
  const total = laid.reduce((s, l) => s + l.element.length, 0);
  const statedLength = finiteAttr(node, 'length', where);
  if (statedLength !== undefined && Math.abs(statedLength - total) > ATTRIBUTE_TOLERANCE) {
    notes.push(`${where}: the length attribute (${fmt(statedLength)}) differs from the sum of its elements (${fmt(total)}); the elements were used.`);
  }
  const profile = readProfile(node, where);
  return {
    name,
    alignment: {
      start_station: staStart,
      start_x: laid[0].start.x,
      start_y: laid[0].start.y,
      start_bearing_deg: degrees(laid[0].bearingIn),
      elements: laid.map((l) => l.element),
    },
    profile: profile.profile,
    profile_name: profile.name,
    notes: [...notes, ...profile.notes],
  };
}

function cgPointsOf(root: XmlNode): Map<string, string> {
  const map = new Map<string, string>();
  for (const group of childrenNamed(root, 'CgPoints')) {
    for (const p of childrenNamed(group, 'CgPoint')) if (p.attrs.name) map.set(p.attrs.name, p.text);
  }
  return map;
}

/**
 * Reads a LandXML 1.2 document (text) into bridge-format alignment and profile fragments, one per
 * Alignment. Lengths, stations, coordinates and elevations stay in the file's linear unit; bearings
 * in degrees clockwise from north; arcs turn "right" for rot="cw", "left" for rot="ccw".
 * @param text the whole file as text.
 * @param expectUnits the bridge's unit; when given, a file in another unit is refused (422).
 * @throws LandXmlError 400 for a DOCTYPE/ENTITY declaration or text that is not XML; 422 for a file
 *   that is not LandXML, has no usable alignment, uses unsupported elements or another unit.
 */
export function parseLandXml(text: string, expectUnits?: LengthUnit): LandXmlImport {
  let root: XmlNode;
  try {
    root = readXml(text);
  } catch (err) {
    if (err instanceof XmlReadError) throw new LandXmlError(err.status, err.message);
    throw err;
  }
  if (root.name !== 'LandXML') fail(`The file's root element is <${root.name}>, not <LandXML>; choose a LandXML 1.2 file.`);
  const unitsNode = childNamed(root, 'Units');
  const system = unitsNode ? (childNamed(unitsNode, 'Imperial') ?? childNamed(unitsNode, 'Metric')) : undefined;
  const linearUnit = system?.attrs.linearUnit;
  if (!linearUnit) fail('The file does not state its linear unit (Units / Imperial or Metric, linearUnit).');
  const units = LINEAR_UNITS[(linearUnit as string).toLowerCase()];
  if (!units) fail(`The file's linear unit is "${linearUnit}"; Chordline imports feet (foot, USSurveyFoot) or metres (meter).`);
  if (expectUnits && units !== expectUnits) {
    const name = (u: LengthUnit) => (u === 'ft' ? 'feet' : 'metres');
    fail(`The file is in ${name(units)} (linearUnit "${linearUnit}") but this bridge is in ${name(expectUnits)}; export the file in ${name(expectUnits)}.`);
  }
  const cg = cgPointsOf(root);
  const nodes = childrenNamed(root, 'Alignments').flatMap((group) => childrenNamed(group, 'Alignment'));
  if (nodes.length === 0) fail('The file holds no Alignment, so there is nothing to import.');
  const alignments: ImportedAlignment[] = [];
  const skipped: { name: string; reason: string }[] = [];
  nodes.forEach((n, i) => {
    try {
      alignments.push(readAlignment(n, i, cg));
    } catch (err) {
      if (!(err instanceof LandXmlError)) throw err;
      skipped.push({ name: n.attrs.name?.trim() || `Alignment ${i + 1}`, reason: err.message });
    }
  });
  if (alignments.length === 0) {
    fail(skipped.length === 1 ? skipped[0].reason : `No alignment in the file could be imported. ${skipped.map((s) => s.reason).join(' ')}`);
  }
  return { units, linear_unit: linearUnit as string, alignments, skipped };
}
