/**
 * One LandXML Alignment → bridge-format `alignment`: reads every CoordGeom element, checks every join
 * (gap and tangency), and reports EVERY problem it finds, each with its station, instead of stopping
 * at the first. Stations run from the alignment's staStart along the elements as read.
 */
import type { AlignmentElementInput } from '@/lib/geometry';
import { ATTRIBUTE_TOLERANCE, curvatureAt, JOIN_TOLERANCE, readCurve, readLine, readSpiral, type Laid } from './landxml-elements';
import { angleDiff, degrees, dist, finiteAttr, fmt, LandXmlError, stationWords, type LengthUnit } from './landxml-points';
import { childNamed, childrenNamed, type XmlNode } from './xml-tree';

/** Largest change of bearing at a join, radians (about 20 seconds of arc): the elements must be tangent. */
export const TANGENCY_TOLERANCE = 1e-4;
/** Relative curvature mismatch between a spiral end and the arc it joins that earns a note (0.1 %). */
export const CURVATURE_MISMATCH = 0.001;

export interface HorizontalResult {
  alignment: { start_station: number; start_x: number; start_y: number; start_bearing_deg: number; elements: AlignmentElementInput[] };
  /** Station of the alignment's end. */
  endStation: number;
  notes: string[];
}

/** An alignment that cannot be imported, with every problem found (sentences, each naming its station). */
export class AlignmentProblems extends LandXmlError {
  constructor(readonly problems: string[]) {
    super(422, problems.length === 1 ? problems[0] : `${problems[0].replace(/\.$/, '')} (and ${problems.length - 1} more ${problems.length === 2 ? 'problem' : 'problems'}).`);
  }
}

const READERS: Record<string, (node: XmlNode, where: string, cg: Map<string, string>) => Laid> = { Line: readLine, Curve: readCurve, Spiral: readSpiral };

const NOT_READ: Record<string, string> = {
  Chain: 'Chain elements are not read; export the alignment as Line, Curve and Spiral elements',
  IrregularLine: 'IrregularLine elements are not read; export the alignment as Line, Curve and Spiral elements',
};

/** The reader's sentence with its element label replaced by label and station ("Element 2 (Curve) at station 12+50.00: ..."). */
const located = (message: string, label: string, here: string) => (message.startsWith(label) ? here + message.slice(label.length) : `${here}: ${message}`);

interface Problem {
  station: number;
  text: string;
}

function stationEquationProblems(node: XmlNode, units: LengthUnit): Problem[] {
  return childrenNamed(node, 'StaEquation').map((eq) => {
    const at = Number(eq.attrs.staInternal ?? eq.attrs.staBack);
    const back = eq.attrs.staBack;
    const ahead = eq.attrs.staAhead;
    const pair = back !== undefined && ahead !== undefined ? ` (back ${back} = ahead ${ahead})` : '';
    return { station: at, text: `Station equation at ${stationWords(at, units)}${pair}: station equations are not read yet; export the alignment with continuous stationing.` };
  });
}

/**
 * Reads the horizontal geometry of one Alignment.
 * @param where "Alignment "name"" for messages.
 * @throws AlignmentProblems listing every problem with its station.
 */
export function readHorizontal(node: XmlNode, where: string, cg: Map<string, string>, units: LengthUnit): HorizontalResult {
  const problems: Problem[] = stationEquationProblems(node, units);
  const refuse = () => new AlignmentProblems([...problems].sort((a, b) => (Number.isFinite(a.station) && Number.isFinite(b.station) ? a.station - b.station : 0)).map((p) => p.text));
  const notes: string[] = [];
  let staStart = 0;
  try {
    staStart = finiteAttr(node, 'staStart', where) ?? 0;
  } catch (err) {
    problems.push({ station: -Infinity, text: (err as Error).message });
  }
  if (node.attrs.staStart === undefined) notes.push('The file gives no staStart; stations start at 0.');
  const coordGeom = childNamed(node, 'CoordGeom');
  const children = (coordGeom?.children ?? []).filter((c) => c.name !== 'Feature');
  if (children.length === 0) {
    problems.push({ station: Infinity, text: 'The alignment has no CoordGeom elements.' });
    throw refuse();
  }

  const laid: (Laid | null)[] = [];
  const stations: number[] = [];
  let station = staStart;
  children.forEach((c, i) => {
    const label = `Element ${i + 1} (${c.name})`;
    const stated = Number(c.attrs.staStart);
    if (!Number.isFinite(station) && Number.isFinite(stated)) station = stated;
    stations.push(station);
    const here = `${label} at ${stationWords(station, units)}`;
    const reader = READERS[c.name];
    try {
      if (!reader) fail(`${NOT_READ[c.name] ?? `${c.name} is not an alignment element this import reads (Line, Curve and Spiral are)`}.`);
      const l = reader(c, label, cg);
      laid.push(l);
      station += l.element.length;
    } catch (err) {
      if (!(err instanceof LandXmlError)) throw err;
      problems.push({ station, text: located(err.message, label, here) });
      laid.push(null);
      const len = Number(c.attrs.length);
      station = Number.isFinite(len) && len > 0 ? station + len : NaN;
    }
  });
  const endStation = station;

  for (let i = 1; i < laid.length; i++) {
    const a = laid[i - 1];
    const b = laid[i];
    if (!a || !b) continue;
    const at = `At ${stationWords(stations[i], units)} (elements ${i} and ${i + 1})`;
    const gap = dist(a.end, b.start);
    if (gap > JOIN_TOLERANCE) problems.push({ station: stations[i], text: `${at}: element ${i + 1} does not start where element ${i} ends (a gap of ${fmt(gap)}).` });
    const kink = angleDiff(a.bearingOut, b.bearingIn);
    if (Math.abs(kink) > TANGENCY_TOLERANCE) {
      problems.push({
        station: stations[i],
        text: `${at}: the elements are not tangent (the direction changes by ${degrees(Math.abs(kink)).toFixed(4)}° at the join); Chordline lays elements tangent end to end.`,
      });
    }
    const spiralJoin = (a.element.type === 'spiral' && b.element.type === 'arc') || (a.element.type === 'arc' && b.element.type === 'spiral');
    if (spiralJoin) {
      const ka = curvatureAt(a.element, 'end');
      const kb = curvatureAt(b.element, 'start');
      if (Math.abs(ka - kb) > CURVATURE_MISMATCH * Math.max(Math.abs(ka), Math.abs(kb))) {
        notes.push(
          `${at}: the curvature jumps from radius ${fmt(1 / Math.abs(ka))} to ${fmt(1 / Math.abs(kb))}${Math.sign(ka) !== Math.sign(kb) ? ' (and changes direction)' : ''}; check the spiral's radius against the arc's.`,
        );
      }
    }
  }
  if (problems.length > 0) throw refuse();

  const ok = laid as Laid[];
  const total = ok.reduce((s, l) => s + l.element.length, 0);
  const statedLength = finiteAttr(node, 'length', where);
  if (statedLength !== undefined && Math.abs(statedLength - total) > ATTRIBUTE_TOLERANCE) {
    notes.push(`The length attribute (${fmt(statedLength)}) differs from the sum of the elements (${fmt(total)}); the elements were used.`);
  }
  return {
    alignment: {
      start_station: staStart,
      start_x: ok[0].start.x,
      start_y: ok[0].start.y,
      start_bearing_deg: degrees(ok[0].bearingIn),
      elements: ok.map((l) => l.element),
    },
    endStation,
    notes,
  };
}

function fail(message: string): never {
  throw new LandXmlError(422, message);
}
