/**
 * LandXML CoordGeom elements → bridge-format alignment elements. Line and Curve take their length,
 * radius and bearings from the element points (Start, Center, End); a clothoid Spiral takes its
 * length, radii and turn from its attributes and its start bearing from the chord Start → End, and is
 * then checked against the file's End (and PI, when given). Each reader throws LandXmlError with a
 * sentence when the element cannot be used; the caller collects them.
 *
 * rot="cw" turns right (bearing grows), rot="ccw" turns left. Bearings are radians clockwise from north.
 */
import type { AlignmentElementInput } from '@/lib/geometry';
import { clothoidDelta, clothoidTurn } from './clothoid';
import { angleDiff, azimuth, dist, fail, finiteAttr, fmt, normalAngle, pointOf, TWO_PI, type Pt } from './landxml-points';
import { childNamed, type XmlNode } from './xml-tree';
import { POINT_TOLERANCE } from '@/lib/units';

/** Largest disagreement between a length/radius attribute and the element's points, in the file's unit. */
export const ATTRIBUTE_TOLERANCE = 0.01;
/** Largest gap between one element's End and the next element's Start, in the file's unit. */
export const JOIN_TOLERANCE = 0.005;
/**
 * When a stated length or radius agrees with the element's points this closely (file units), the
 * stated value is used: the difference is only the rounding of the coordinates in the file.
 */
export const SNAP_TOLERANCE = POINT_TOLERANCE;
/** A radius at or beyond this (file units) is a tangent end of a spiral. */
export const INFINITE_RADIUS = 1e9;

/** One element as read: the bridge-format element, its end points and its tangent bearings. */
export interface Laid {
  element: AlignmentElementInput;
  start: Pt;
  end: Pt;
  /** Tangent azimuths at the start and end, radians clockwise from north. */
  bearingIn: number;
  bearingOut: number;
}

const preferStated = (geometric: number, stated: number | undefined) => (stated !== undefined && Math.abs(stated - geometric) <= SNAP_TOLERANCE ? stated : geometric);

function turnOf(node: XmlNode, where: string): 1 | -1 {
  const rot = node.attrs.rot;
  if (rot !== 'cw' && rot !== 'ccw') fail(`${where}: the rot attribute must be "cw" (turning right) or "ccw" (turning left), not "${rot ?? ''}".`);
  return rot === 'cw' ? 1 : -1;
}

export function readLine(node: XmlNode, where: string, cg: Map<string, string>): Laid {
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

export function readCurve(node: XmlNode, where: string, cg: Map<string, string>): Laid {
  if (!childNamed(node, 'Center') && childNamed(node, 'PI')) {
    fail(`${where}: curves given only by their PI are not read yet; export the curve with its Start, Center and End points.`);
  }
  const turn = turnOf(node, where);
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
  const sweep = normalAngle(turn * (a1 - a0));
  const length = radius * sweep;
  if (!(length > 0)) fail(`${where}: Start and End are the same point, so the curve has no length.`);
  const statedRadius = finiteAttr(node, 'radius', where);
  if (statedRadius !== undefined && Math.abs(statedRadius - radius) > ATTRIBUTE_TOLERANCE) {
    fail(`${where}: the radius attribute (${fmt(statedRadius)}) does not match the distance from Center to Start (${fmt(radius)}).`);
  }
  const statedLength = finiteAttr(node, 'length', where);
  if (statedLength !== undefined && Math.abs(statedLength - length) > ATTRIBUTE_TOLERANCE) {
    fail(
      `${where}: the length attribute (${fmt(statedLength)}) does not match the arc from Start to End turning ${turn === 1 ? 'right (cw)' : 'left (ccw)'} (${fmt(length)}); check the rot attribute.`,
    );
  }
  // Travelling with the centre on the right (cw), the radius from the centre points 90° left of the
  // tangent, so the tangent is the radial azimuth turned 90° clockwise (counterclockwise for ccw).
  return {
    element: { type: 'arc', length: preferStated(length, statedLength), radius: preferStated(radius, statedRadius), direction: turn === 1 ? 'right' : 'left' },
    start,
    end,
    bearingIn: normalAngle(a0 + (turn * Math.PI) / 2),
    bearingOut: normalAngle(a1 + (turn * Math.PI) / 2),
  };
}

/** A spiral radius attribute: a number, or null for INF (a tangent end). */
function radiusAttr(node: XmlNode, name: string, where: string): number | null {
  const raw = node.attrs[name]?.trim();
  if (raw === undefined || raw === '') return fail(`${where}: the ${name} attribute is missing; give a radius, or INF for a tangent end.`);
  if (/^[+]?inf(inity)?$/i.test(raw)) return null;
  const v = Number(raw);
  if (!Number.isFinite(v) || !(v > 0)) return fail(`${where}: the ${name} attribute "${raw}" is not a radius; give a positive number, or INF for a tangent end.`);
  return v >= INFINITE_RADIUS ? null : v;
}

/** Distance of point p from the line through `through` at azimuth `bearing`. */
const offLine = (p: Pt, through: Pt, bearing: number) => Math.abs((p.x - through.x) * Math.cos(bearing) - (p.y - through.y) * Math.sin(bearing));

export function readSpiral(node: XmlNode, where: string, cg: Map<string, string>): Laid {
  const type = node.attrs.spiType?.trim();
  if (type && type.toLowerCase() !== 'clothoid') fail(`${where}: a ${type} spiral (spiType="${type}"); only clothoid spirals are read.`);
  if (!childNamed(node, 'Start') && !childNamed(node, 'End') && childNamed(node, 'PI')) {
    fail(`${where}: spirals given only by their PI are not read yet; export the spiral with its Start, PI and End points.`);
  }
  const turn = turnOf(node, where);
  const length = finiteAttr(node, 'length', where);
  if (length === undefined || !(length > 0)) return fail(`${where}: a spiral needs a length attribute greater than zero.`);
  const r1 = radiusAttr(node, 'radiusStart', where);
  const r2 = radiusAttr(node, 'radiusEnd', where);
  if (r1 === null && r2 === null) fail(`${where}: both radii are INF, so this is a tangent, not a spiral; export it as a Line.`);
  if (r1 !== null && r2 !== null && Math.abs(r1 - r2) <= SNAP_TOLERANCE) fail(`${where}: radiusStart and radiusEnd are both ${fmt(r1)}, so this is an arc, not a spiral; export it as a Curve.`);
  const start = pointOf(childNamed(node, 'Start'), 'Start', where, cg);
  const end = pointOf(childNamed(node, 'End'), 'End', where, cg);
  const spec = { length, k1: r1 === null ? 0 : 1 / r1, k2: r2 === null ? 0 : 1 / r2, turn };
  const local = clothoidDelta(spec, 0, length);
  const chord = Math.hypot(local.dx, local.dy);
  const fileChord = dist(start, end);
  if (Math.abs(fileChord - chord) > ATTRIBUTE_TOLERANCE) {
    fail(
      `${where}: Start and End are ${fmt(fileChord)} apart, but a clothoid of length ${fmt(length)} from radius ${r1 === null ? 'INF' : fmt(r1)} to ${r2 === null ? 'INF' : fmt(r2)} spans ${fmt(chord)}; check the length and radius attributes.`,
    );
  }
  // Laid from bearing 0 the chord points at atan2(dx, dy); in the file it points Start → End.
  const bearingIn = normalAngle(azimuth(start, end) - Math.atan2(local.dx, local.dy));
  const bearingOut = normalAngle(bearingIn + clothoidTurn(spec, length));
  const piNode = childNamed(node, 'PI');
  if (piNode) {
    const pi = pointOf(piNode, 'PI', where, cg);
    const off = Math.max(offLine(pi, start, bearingIn), offLine(pi, end, bearingOut));
    if (off > ATTRIBUTE_TOLERANCE) fail(`${where}: the PI lies ${fmt(off)} off the spiral's tangents; check the rot, length and radius attributes.`);
  }
  if (Math.abs(clothoidTurn(spec, length)) >= TWO_PI) fail(`${where}: the spiral turns through a full circle or more; no road alignment does.`);
  return { element: { type: 'spiral', length, radius_start: r1, radius_end: r2, direction: turn === 1 ? 'right' : 'left' }, start, end, bearingIn, bearingOut };
}

/** Signed curvature (positive turning right) at the start or end of an element; 1/length unit. */
export function curvatureAt(el: AlignmentElementInput, at: 'start' | 'end'): number {
  if (el.type === 'line') return 0;
  const sign = el.direction === 'right' ? 1 : -1;
  if (el.type === 'arc') return sign / el.radius;
  const r = at === 'start' ? el.radius_start : el.radius_end;
  return r === null ? 0 : sign / r;
}

export { angleDiff };
