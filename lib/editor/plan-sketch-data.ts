/**
 * Plan sketch of a bridge for the geometry editor's live preview: the alignment, the deck outline,
 * the bent lines and the girders, turned so that the bridge runs left to right (up-station to the
 * right, the left side of the alignment up) and scaled into an SVG box. Pure; no React.
 */
import { bentLinePoint, createAlignment, edgeOffsetAt, type BridgeDescription, type OffsetTable, type PlanPoint } from '@/lib/geometry';
import { sketchMarks } from './plan-sketch-marks';
import { safeDivisor } from '@/lib/units';

export interface SketchPolyline {
  points: string;
}
export interface SketchData {
  width: number;
  height: number;
  alignment: string;
  deck: string | null;
  bents: { name: string; x1: number; y1: number; x2: number; y2: number; labelX: number; labelY: number }[];
  girders: { name: string; exterior: boolean; points: string }[];
  spans: { span: number; x: number; y: number }[];
  /** Screen angle of north, degrees clockwise from screen-up, for the north arrow. */
  northDeg: number;
  /** Length of the scale bar in bridge units and on screen. */
  scale: { length: number; px: number };
  /** Stretches of alignment that are clothoid spirals, with what they join (drawn apart from tangents and arcs). */
  spirals: { points: string; label: string }[];
  /** Ticks across the alignment where one element meets the next. */
  joins: { x1: number; y1: number; x2: number; y2: number }[];
  /** The listed stations of flared deck edges, on the edge line. */
  flareStations: { x: number; y: number }[];
}

const WIDTH = 480;
const MARGIN = 28;

function niceLength(max: number): number {
  const pow = 10 ** Math.floor(Math.log10(max));
  for (const f of [5, 2, 1]) if (f * pow <= max) return f * pow;
  return pow;
}

/**
 * Lays out the sketch. Returns null when the description cannot be drawn (e.g. bents off the
 * alignment make the bent lines unsolvable).
 * @param bridge a description that passed the schema.
 * @param table its offset table when it computes, for the girders; null draws no girders.
 */
export function planSketchData(bridge: BridgeDescription, table: OffsetTable | null): SketchData | null {
  try {
    const al = createAlignment(bridge.alignment);
    const bents = bridge.bents;
    const first = bents[0].station;
    const last = bents[bents.length - 1].station;
    const span = Math.max(last - first, 1);
    const s0 = Math.max(al.startStation, first - 0.12 * span);
    const s1 = Math.min(al.endStation, last + 0.12 * span);
    const a = al.pointAt(first);
    const b = al.pointAt(last);
    const theta = Math.atan2(b.x - a.x, b.y - a.y) || a.bearing;
    const dir = { x: Math.sin(theta), y: Math.cos(theta) };
    const right = { x: Math.cos(theta), y: -Math.sin(theta) };
    const local = (p: PlanPoint) => ({ u: (p.x - a.x) * dir.x + (p.y - a.y) * dir.y, v: (p.x - a.x) * right.x + (p.y - a.y) * right.y });

    const steps = 120;
    const centre = Array.from({ length: steps + 1 }, (_, i) => local(al.pointAt(s0 + ((s1 - s0) * i) / steps)));
    // A flared edge changes its offset with station: each edge point takes the offset at its own station.
    const edgeAt = (side: 'left' | 'right', s: number) => edgeOffsetAt(bridge.deck, side, s);
    const lastBent = bents.length - 1;
    const le = edgeAt('left', bents[0].station);
    const re = edgeAt('right', bents[0].station);
    const corner = (i: number, o: number) => bentLinePoint(al, bents[i], o);
    const cl0 = corner(0, le);
    const cr0 = corner(0, re);
    const cl1 = corner(lastBent, edgeAt('left', bents[lastBent].station));
    const cr1 = corner(lastBent, edgeAt('right', bents[lastBent].station));
    const edge = (from: number, to: number, side: 'left' | 'right') =>
      Array.from({ length: 61 }, (_, i) => {
        const s = from + ((to - from) * i) / 60;
        return local(al.pointAt(s, edgeAt(side, s)));
      });
    const leftEdge = edge(cl0.station, cl1.station, 'left');
    const rightEdge = edge(cr0.station, cr1.station, 'right');
    const deckLocal = [...leftEdge, ...rightEdge.reverse()];
    const over = Math.max(2, 0.08 * (re - le));
    const bentLocal = bents.map((bent, i) => ({ name: bent.name, p: local(corner(i, le - over)), q: local(corner(i, re + over)) }));
    const girderLocal: { name: string; exterior: boolean; pts: { u: number; v: number }[] }[] = [];
    if (table) {
      const sides = new Map<string, boolean>();
      for (const p of table.points) sides.set(p.girder, (sides.get(p.girder) ?? false) || p.side !== 'interior');
      const byGirder = new Map<string, { span: number; point: number; u: number; v: number }[]>();
      for (const p of table.points) {
        const l = local(p);
        const list = byGirder.get(p.girder) ?? [];
        list.push({ span: p.span, point: p.point, ...l });
        byGirder.set(p.girder, list);
      }
      for (const [name, pts] of byGirder) {
        pts.sort((x, y) => x.span - y.span || x.point - y.point);
        girderLocal.push({ name, exterior: sides.get(name) ?? false, pts });
      }
    }
    const all = [...centre, ...deckLocal, ...bentLocal.flatMap((x) => [x.p, x.q])];
    const minU = Math.min(...all.map((p) => p.u));
    const maxU = Math.max(...all.map((p) => p.u));
    const minV = Math.min(...all.map((p) => p.v));
    const maxV = Math.max(...all.map((p) => p.v));
    const scale = (WIDTH - 2 * MARGIN) / safeDivisor(maxU - minU);
    const height = Math.min(420, Math.max(170, (maxV - minV) * scale + 2 * MARGIN + 24));
    const offsetY = (height - (maxV - minV) * scale) / 2;
    const X = (p: { u: number }) => MARGIN + (p.u - minU) * scale;
    const Y = (p: { v: number }) => offsetY + (p.v - minV) * scale;
    const poly = (pts: { u: number; v: number }[]) => pts.map((p) => `${X(p).toFixed(1)},${Y(p).toFixed(1)}`).join(' ');
    if (![scale, height].every(Number.isFinite)) return null;
    const marks = sketchMarks(bridge, al, local, s0, s1, 7 / scale);
    const barLength = niceLength((WIDTH - 2 * MARGIN) / scale / 4);
    return {
      width: WIDTH,
      height,
      alignment: poly(centre),
      deck: poly(deckLocal),
      bents: bentLocal.map((x) => {
        const top = Y(x.p) < Y(x.q) ? x.p : x.q;
        return { name: x.name, x1: X(x.p), y1: Y(x.p), x2: X(x.q), y2: Y(x.q), labelX: X(top), labelY: Math.max(12, Y(top) - 6) };
      }),
      girders: girderLocal.map((g) => ({ name: g.name, exterior: g.exterior, points: poly(g.pts) })),
      spans: bents.slice(1).map((bent, j) => {
        const mid = local(al.pointAt((bents[j].station + bent.station) / 2, re + over));
        return { span: j + 1, x: X(mid), y: Math.min(height - 6, Y(mid) + 14) };
      }),
      // North (0, 1) in local axes: u = dir.y, v = right.y; screen y grows downward with v.
      northDeg: (Math.atan2(dir.y, -right.y) * 180) / Math.PI,
      scale: { length: barLength, px: barLength * scale },
      spirals: marks.spirals.map((m) => ({ points: poly(m.pts), label: m.label })),
      joins: marks.joins.map((j) => ({ x1: X(j.p), y1: Y(j.p), x2: X(j.q), y2: Y(j.q) })),
      flareStations: marks.flareStations.map((f) => ({ x: X(f), y: Y(f) })),
    };
  } catch {
    return null;
  }
}
