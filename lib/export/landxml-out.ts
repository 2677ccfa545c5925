/**
 * LandXML 1.2 out: the alignment and profile of a bridge description as <Alignment> with <CoordGeom>
 * (Line, Curve, Spiral) and <Profile>/<ProfAlign> (PVI, ParaCurve), so the geometry can go back to
 * other tools. Element lengths, radii and stations are written as stored (shortest exact decimal of
 * each double); the element points come from the engine's alignment. LandXML writes plan points
 * NORTHING FIRST ("N E"); Curve and Spiral rot="cw" turn right, "ccw" left; an infinite spiral
 * radius is "INF".
 */
import { createAlignment, directionOf, rightNormalOf, type BridgeDescription, type PlanPoint } from '@/lib/geometry';
import { atLeast, type Units } from '@/lib/units';
import { PARALLEL_DETERMINANT, nearlyZero } from '@/lib/units';

export interface LandXmlOutInput {
  /** Name for the Project, Alignment and ProfAlign. */
  name: string;
  units: Units;
  alignment: BridgeDescription['alignment'];
  profile: BridgeDescription['profile'];
  revision: number;
  /** When the file is made. */
  now: Date;
}

/** The LandXML 1.2 namespace. */
export const LANDXML_NS = 'http://www.landxml.org/schema/LandXML-1.2';

type Element = { type: string; length: number; radius?: number; radius_start?: number | null; radius_end?: number | null; direction?: 'left' | 'right' };

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;').replace(/'/g, '&apos;');
/** A double as its shortest exact decimal ("-0" as "0"). */
const num = (v: number) => (Object.is(v, -0) ? '0' : String(v));
/** A plan point as LandXML writes it: northing, then easting. */
const ne = (p: PlanPoint) => `${num(p.y)} ${num(p.x)}`;

/** Where the tangent lines through a (bearing ba) and b (bearing bb) meet; null when they are parallel. */
function tangentsMeet(a: PlanPoint, ba: number, b: PlanPoint, bb: number): PlanPoint | null {
  const d0 = directionOf(ba);
  const d1 = directionOf(bb);
  const det = d0.x * -d1.y - d0.y * -d1.x;
  if (nearlyZero(det, PARALLEL_DETERMINANT)) return null;
  const t = ((b.x - a.x) * -d1.y - (b.y - a.y) * -d1.x) / det;
  return { x: a.x + t * d0.x, y: a.y + t * d0.y };
}

function unitsXml(units: Units): string {
  return units === 'm'
    ? '<Metric areaUnit="squareMeter" linearUnit="meter" volumeUnit="cubicMeter" temperatureUnit="celsius" pressureUnit="milliBars" angularUnit="decimal degrees" directionUnit="decimal degrees"/>'
    : '<Imperial areaUnit="squareFoot" linearUnit="foot" volumeUnit="cubicYard" temperatureUnit="fahrenheit" pressureUnit="inHG" angularUnit="decimal degrees" directionUnit="decimal degrees"/>';
}

/** The CoordGeom children, one per element, laid end to end by the engine. */
function coordGeom(alignment: BridgeDescription['alignment']): string[] {
  const al = createAlignment(alignment);
  const out: string[] = [];
  let station = alignment.start_station;
  let start: PlanPoint = { x: alignment.start_x, y: alignment.start_y };
  let bearingIn = al.pointAt(station).bearing;
  for (const el of alignment.elements as readonly Element[]) {
    const endStation = station + el.length;
    const endPoint = al.pointAt(endStation);
    const end = { x: endPoint.x, y: endPoint.y };
    const rot = el.direction === 'left' ? 'ccw' : 'cw';
    const pi = tangentsMeet(start, bearingIn, end, endPoint.bearing);
    if (el.type === 'line') {
      out.push(`<Line length="${num(el.length)}" staStart="${num(station)}"><Start>${ne(start)}</Start><End>${ne(end)}</End></Line>`);
    } else if (el.type === 'arc') {
      const r = el.radius as number;
      const n = rightNormalOf(bearingIn);
      const side = el.direction === 'left' ? -1 : 1;
      const center = { x: start.x + side * r * n.x, y: start.y + side * r * n.y };
      // The PI of a curve of 180 degrees or more lies behind the start: left out (it is optional).
      const piXml = pi && !atLeast(el.length / r, Math.PI) ? `<PI>${ne(pi)}</PI>` : '';
      out.push(
        `<Curve rot="${rot}" crvType="arc" radius="${num(r)}" length="${num(el.length)}" staStart="${num(station)}"><Start>${ne(start)}</Start><Center>${ne(center)}</Center><End>${ne(end)}</End>${piXml}</Curve>`,
      );
    } else if (el.type === 'spiral') {
      const radius = (v: number | null | undefined) => (typeof v === 'number' ? num(v) : 'INF');
      out.push(
        `<Spiral rot="${rot}" spiType="clothoid" length="${num(el.length)}" radiusStart="${radius(el.radius_start)}" radiusEnd="${radius(el.radius_end)}" staStart="${num(station)}"><Start>${ne(start)}</Start>${pi ? `<PI>${ne(pi)}</PI>` : ''}<End>${ne(end)}</End></Spiral>`,
      );
    } else {
      throw new Error(`Alignment element type "${el.type}" has no LandXML form here.`);
    }
    station = endStation;
    start = end;
    bearingIn = endPoint.bearing;
  }
  return out;
}

function profileXml(name: string, profile: BridgeDescription['profile']): string {
  const pvis = profile.pvis;
  const rows = pvis.map((p, i) => {
    const text = `${num(p.station)} ${num(p.elevation)}`;
    const inner = i > 0 && i < pvis.length - 1;
    return inner && p.curve_length && p.curve_length > 0 ? `<ParaCurve length="${num(p.curve_length)}">${text}</ParaCurve>` : `<PVI>${text}</PVI>`;
  });
  return `<Profile name="${esc(name)}"><ProfAlign name="${esc(name)}">${rows.join('')}</ProfAlign></Profile>`;
}

/** The LandXML 1.2 document (UTF-8 text) of a description's alignment and profile. */
export function landXmlOut(input: LandXmlOutInput): string {
  const iso = input.now.toISOString();
  const name = input.name.replace(/[\u0000-\u001f]/g, ' ').trim() || 'Alignment';
  const elements = coordGeom(input.alignment);
  const length = (input.alignment.elements as readonly Element[]).reduce((s, e) => s + e.length, 0);
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<LandXML xmlns="${LANDXML_NS}" version="1.2" date="${iso.slice(0, 10)}" time="${iso.slice(11, 19)}">`,
    `  <Units>${unitsXml(input.units)}</Units>`,
    `  <Project name="${esc(name)}" desc="Geometry revision ${input.revision}"/>`,
    '  <Application name="Chordline" manufacturer="Chordline" desc="Deck overhang geometry"/>',
    `  <Alignments name="${esc(name)}">`,
    `    <Alignment name="${esc(name)}" length="${num(length)}" staStart="${num(input.alignment.start_station)}" desc="Geometry revision ${input.revision}">`,
    '      <CoordGeom>',
    ...elements.map((e) => `        ${e}`),
    '      </CoordGeom>',
    `      ${profileXml(name, input.profile)}`,
    '    </Alignment>',
    '  </Alignments>',
    '</LandXML>',
    '',
  ].join('\n');
}
