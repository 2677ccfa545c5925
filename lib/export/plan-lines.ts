/**
 * The plan of a bridge as lines in real-world coordinates (x = easting, y = northing, the bridge's
 * length unit), sampled through the engine's public functions: the alignment with station ticks,
 * both deck edges and gutter lines between the first and last bent lines, the bent lines, each
 * girder as drawn (a chord, or a curved girder as a fitted polyline) and every exterior girder point
 * with its edge point. Pure; the DXF writer turns it into entities.
 */
import {
  bentLinePoint,
  createAlignment,
  directionOf,
  edgeSpecOffsetAt,
  rightNormalOf,
  type Alignment,
  type BridgeDescription,
  type EdgeOffsetSpec,
  type OffsetTable,
  type PlanPoint,
} from '@/lib/geometry';
import { atMost, nearlyZero, type Units } from '@/lib/units';

export interface PlanTick {
  station: number;
  major: boolean;
  /** Ends of the tick, square to the alignment. */
  a: PlanPoint;
  b: PlanPoint;
  /** Alignment bearing at the tick, radians clockwise from north. */
  bearing: number;
}

export interface PlanLines {
  units: Units;
  alignment: PlanPoint[];
  ticks: PlanTick[];
  edges: { side: 'left' | 'right'; points: PlanPoint[] }[];
  gutters: { side: 'left' | 'right'; points: PlanPoint[] }[];
  bents: { name: string; a: PlanPoint; b: PlanPoint }[];
  girders: { name: string; span: number; layout: 'chord' | 'curved'; points: PlanPoint[] }[];
  girderPoints: { span: number; girder: string; point: number; at: PlanPoint; edge: PlanPoint }[];
}

/** Largest gap between a sampled polyline and the curve it follows (bridge units). */
const SAG = { ft: 0.001, m: 0.0003 } as const;
/** Station tick spacing: major (labelled) and minor, bridge units (common practice). */
export const TICKS = { ft: { major: 100, minor: 20 }, m: { major: 20, minor: 5 } } as const;

type Edge = EdgeOffsetSpec;

/** Offset of a deck edge at a station (the engine's reading of the contract: constant, or linear between listed stations). */
const edgeOffset = (spec: Edge, station: number) => edgeSpecOffsetAt(spec, station);

/** Stations along the alignment between s0 and s1 close enough that chords stay within `sag` of every element. */
function sampleStations(bridge: BridgeDescription, s0: number, s1: number, sag: number): number[] {
  const out = [s0];
  let start = bridge.alignment.start_station;
  for (const el of bridge.alignment.elements as readonly { type: string; length: number; radius?: number; radius_start?: number | null; radius_end?: number | null }[]) {
    const end = start + el.length;
    const a = Math.max(start, s0);
    const b = Math.min(end, s1);
    if (b > a) {
      const radii = el.type === 'arc' ? [el.radius as number] : el.type === 'spiral' ? [el.radius_start, el.radius_end].filter((r): r is number => typeof r === 'number') : [];
      const r = radii.length ? Math.min(...radii) : Infinity;
      const step = Number.isFinite(r) ? Math.sqrt(8 * r * sag) : b - a;
      const n = Math.min(5000, Math.max(1, Math.ceil((b - a) / step)));
      for (let i = 1; i <= n; i++) out.push(a + ((b - a) * i) / n);
    }
    start = end;
  }
  if (out[out.length - 1] < s1) out.push(s1);
  return out;
}

/** The point of bent line `j` on a deck edge (an edge that flares is solved by fixed-point steps). */
function edgeCorner(al: Alignment, bent: BridgeDescription['bents'][number], spec: Edge, shift: number): PlanPoint & { station: number } {
  let p = bentLinePoint(al, bent, edgeOffset(spec, bent.station) + shift);
  for (let i = 0; i < 30; i++) {
    const next = bentLinePoint(al, bent, edgeOffset(spec, p.station) + shift);
    const moved = Math.hypot(next.x - p.x, next.y - p.y);
    p = next;
    if (nearlyZero(moved)) break;
  }
  return p;
}

function edgeLine(bridge: BridgeDescription, al: Alignment, spec: Edge, shift: number, sag: number): PlanPoint[] {
  const bents = bridge.bents;
  const a = edgeCorner(al, bents[0], spec, shift);
  const b = edgeCorner(al, bents[bents.length - 1], spec, shift);
  const kinks = typeof spec === 'number' ? [] : (spec as readonly { station: number }[]).map((r) => r.station).filter((s) => s > a.station && s < b.station);
  const stations = [...new Set([...sampleStations(bridge, a.station, b.station, sag), ...kinks])].sort((x, y) => x - y);
  return stations.map((s) => {
    const p = al.pointAt(s, edgeOffset(spec, s) + shift);
    return { x: p.x, y: p.y };
  });
}

function ticks(al: Alignment, units: Units, width: number): PlanTick[] {
  const { major, minor } = TICKS[units];
  const out: PlanTick[] = [];
  for (let k = Math.ceil(al.startStation / minor); atMost(k * minor, al.endStation); k++) {
    const station = k * minor;
    const isMajor = nearlyZero(station / major - Math.round(station / major));
    const p = al.pointAt(station);
    const n = rightNormalOf(p.bearing);
    const half = (isMajor ? 0.06 : 0.03) * width;
    out.push({ station, major: isMajor, a: { x: p.x - n.x * half, y: p.y - n.y * half }, b: { x: p.x + n.x * half, y: p.y + n.y * half }, bearing: p.bearing });
  }
  return out;
}

function girderLines(bridge: BridgeDescription, al: Alignment, table: OffsetTable): PlanLines['girders'] {
  const layouts = new Map(bridge.girders.map((g) => [g.name, g.layout]));
  const groups = new Map<string, OffsetTable['points']>();
  for (const p of table.points) {
    const key = `${p.span}\u0000${p.girder}`;
    const list = groups.get(key) ?? [];
    list.push(p);
    groups.set(key, list);
  }
  const out: PlanLines['girders'] = [];
  for (const rows of groups.values()) {
    rows.sort((a, b) => a.point - b.point);
    const first = rows[0];
    const last = rows[rows.length - 1];
    const layout = layouts.get(first.girder) ?? 'chord';
    if (layout === 'chord') {
      out.push({
        name: first.girder,
        span: first.span,
        layout,
        points: [
          { x: first.x, y: first.y },
          { x: last.x, y: last.y },
        ],
      });
      continue;
    }
    // Curved: station and offset linear between the girder's points on the two bent lines (data contract).
    const m = Math.max(8, 4 * (rows.length - 1));
    const points = Array.from({ length: m + 1 }, (_, i) => {
      const t = i / m;
      const p = al.pointAt(first.station + t * (last.station - first.station), first.offset + t * (last.offset - first.offset));
      return { x: p.x, y: p.y };
    });
    out.push({ name: first.girder, span: first.span, layout, points });
  }
  return out.sort((a, b) => a.span - b.span || a.name.localeCompare(b.name));
}

/**
 * Samples the plan of a description whose offset table computed (`table` from computeOffsetTable
 * with interior girders' rows). Coordinates are the bridge's own x and y.
 */
export function planLines(bridge: BridgeDescription, table: OffsetTable): PlanLines {
  const al = createAlignment(bridge.alignment);
  const units = bridge.units;
  const sag = SAG[units];
  const deck = bridge.deck;
  const bents = bridge.bents;
  const width = Math.max(1, edgeOffset(deck.right_edge_offset, bents[0].station) - edgeOffset(deck.left_edge_offset, bents[0].station));
  const alignment = sampleStations(bridge, al.startStation, al.endStation, sag).map((s) => {
    const p = al.pointAt(s);
    return { x: p.x, y: p.y };
  });
  const over = 0.05 * width;
  return {
    units,
    alignment,
    ticks: ticks(al, units, width),
    edges: [
      { side: 'left', points: edgeLine(bridge, al, deck.left_edge_offset, 0, sag) },
      { side: 'right', points: edgeLine(bridge, al, deck.right_edge_offset, 0, sag) },
    ],
    gutters: [
      { side: 'left', points: edgeLine(bridge, al, deck.left_edge_offset, deck.left_barrier_width, sag) },
      { side: 'right', points: edgeLine(bridge, al, deck.right_edge_offset, -deck.right_barrier_width, sag) },
    ],
    bents: bents.map((b) => {
      const l = edgeCorner(al, b, deck.left_edge_offset, -over);
      const r = edgeCorner(al, b, deck.right_edge_offset, over);
      return { name: b.name, a: { x: l.x, y: l.y }, b: { x: r.x, y: r.y } };
    }),
    girders: girderLines(bridge, al, table),
    girderPoints: table.points
      .filter((p) => p.side !== 'interior' && p.edge_x !== null && p.edge_y !== null)
      .map((p) => ({ span: p.span, girder: p.girder, point: p.point, at: { x: p.x, y: p.y }, edge: { x: p.edge_x as number, y: p.edge_y as number } })),
  };
}

/** Direction of travel at a bearing as a DXF angle: degrees counterclockwise from +x (east). */
export function dxfAngle(bearing: number): number {
  const d = directionOf(bearing);
  return (Math.atan2(d.y, d.x) * 180) / Math.PI;
}
