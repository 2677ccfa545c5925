/**
 * Extra marks of the editor's plan sketch: the stretches of alignment that are spirals (drawn apart
 * from the tangents and arcs), a tick at every element join (TS, SC, CS, ST…), and a dot at each
 * listed station of a flared deck edge. Pure; works in the sketch's local plane (u along the bridge,
 * v to the right), given the function that maps a plan point there.
 */
import { edgeOffsetAt, type Alignment, type BridgeDescription, type PlanPoint } from '@/lib/geometry';

type Local = { u: number; v: number };

export interface SketchMarksLocal {
  spirals: { pts: Local[]; label: string }[];
  joins: { p: Local; q: Local }[];
  flareStations: Local[];
}

const radiusWords = (r: number | null, units: string) => (r === null ? 'tangent' : `R ${Number(r.toFixed(3))} ${units}`);

/**
 * @param s0 @param s1 the station range the sketch draws (length units).
 * @param tick half-length of a join tick, in length units (drawn across the alignment).
 */
export function sketchMarks(bridge: BridgeDescription, al: Alignment, local: (p: PlanPoint) => Local, s0: number, s1: number, tick: number): SketchMarksLocal {
  const spirals: SketchMarksLocal['spirals'] = [];
  const joins: SketchMarksLocal['joins'] = [];
  let station = bridge.alignment.start_station;
  bridge.alignment.elements.forEach((e, i) => {
    const from = station;
    const to = station + e.length;
    station = to;
    if (i > 0 && from > s0 && from < s1) joins.push({ p: local(al.pointAt(from, -tick)), q: local(al.pointAt(from, tick)) });
    if (e.type !== 'spiral') return;
    const a = Math.max(from, s0);
    const b = Math.min(to, s1);
    if (!(b > a)) return;
    const pts = Array.from({ length: 41 }, (_, k) => local(al.pointAt(a + ((b - a) * k) / 40)));
    spirals.push({ pts, label: `Spiral ${Number(e.length.toFixed(3))} ${bridge.units}, ${radiusWords(e.radius_start, bridge.units)} to ${radiusWords(e.radius_end, bridge.units)}` });
  });
  const flareStations: Local[] = [];
  for (const side of ['left', 'right'] as const) {
    const spec = side === 'left' ? bridge.deck.left_edge_offset : bridge.deck.right_edge_offset;
    if (typeof spec === 'number') continue;
    for (const row of spec) if (row.station >= s0 && row.station <= s1) flareStations.push(local(al.pointAt(row.station, edgeOffsetAt(bridge.deck, side, row.station))));
  }
  return { spirals, joins, flareStations };
}
