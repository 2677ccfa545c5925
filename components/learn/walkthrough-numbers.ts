/**
 * The numbers the walkthrough's steps talk about, all worked out from the engine's offset table of
 * the sandbox deck in the picture.
 */
import { formatLength, thermalBowInches, type OffsetPoint, type OffsetTable, type SpanSummary } from '@/lib/geometry';
import { SANDBOX_GIRDER_DEPTH_IN, type SandboxSettings } from '@/lib/scene-data/sandbox';

/** The curve turns right, so the left overhang is on the outside of the curve. */
export const OUTSIDE = 'left';
export const INSIDE = 'right';
/** The span the walkthrough looks at: the middle one, with a bent at each end. */
export const SPAN = 2;

export const ft = (v: number) => formatLength(v, 'ft');
export const inches = (v: number) => `${v.toFixed(2)} in`;

export function rowsOf(table: OffsetTable, side: 'left' | 'right', span: number): OffsetPoint[] {
  return table.points.filter((p) => p.side === side && p.span === span).sort((a, b) => a.point - b.point);
}

/** Angle in degrees between the plan directions of two girder runs (end to end). */
export function turnBetween(a: OffsetPoint[], b: OffsetPoint[]): number {
  if (a.length < 2 || b.length < 2) return 0;
  const ax = a[a.length - 1].x - a[0].x;
  const ay = a[a.length - 1].y - a[0].y;
  const bx = b[b.length - 1].x - b[0].x;
  const by = b[b.length - 1].y - b[0].y;
  const c = (ax * bx + ay * by) / (Math.hypot(ax, ay) * Math.hypot(bx, by));
  return (Math.acos(Math.min(1, Math.max(-1, c))) * 180) / Math.PI;
}

/** The straightedge example at the start of span 1: the deck form's grade carried out past the exterior girder with a 1/4 in error. */
export interface Straightedge {
  bay: number;
  error: number;
  atEdge: number;
  target: number;
  magnified: number;
  mid: OffsetPoint;
  inner: OffsetPoint;
}

export function straightedgeOf(table: OffsetTable): Straightedge | null {
  const mid = rowsOf(table, OUTSIDE, 1)[0];
  if (!mid) return null;
  const inner = table.points.find((p) => p.span === 1 && p.girder === 'G2' && p.point === mid.point);
  if (!inner || mid.edge_width === null || mid.form_target === null || mid.edge_x === null || mid.edge_y === null) return null;
  const bay = Math.hypot(mid.x - inner.x, mid.y - inner.y);
  const error = 0.25 / 12;
  const slope = (mid.bottom_of_slab + error - inner.bottom_of_slab) / bay;
  const atEdge = mid.bottom_of_slab + error + slope * mid.edge_width;
  return { bay, error, atEdge, target: mid.form_target, magnified: (error * (bay + mid.edge_width)) / bay, mid, inner };
}

/** Everything a step's words need. */
export interface StepNumbers {
  table: OffsetTable;
  built: SandboxSettings;
  outside: SpanSummary | undefined;
  inside: SpanSummary | undefined;
  layoutIsChord: boolean;
  girderLength: number;
  turn: number;
  chordOrdinate: number;
  sweepLimitIn: number;
  bowIn: number;
  deltaT: number;
  straight: Straightedge | null;
  /** The outside exterior girder's midspan row of the walkthrough's span. */
  midspan: OffsetPoint | undefined;
}

export function stepNumbers(table: OffsetTable, built: SandboxSettings, layout: 'chord' | 'curved', deltaT: number): StepNumbers {
  const summary = (side: 'left' | 'right') => table.span_summaries.find((s) => s.span === SPAN && s.side === side);
  const outRows = rowsOf(table, OUTSIDE, SPAN);
  const prevRows = rowsOf(table, OUTSIDE, SPAN - 1);
  const girderLength = outRows.length > 1 ? Math.hypot(outRows[outRows.length - 1].x - outRows[0].x, outRows[outRows.length - 1].y - outRows[0].y) : 0;
  return {
    table,
    built,
    outside: summary(OUTSIDE),
    inside: summary(INSIDE),
    layoutIsChord: layout === 'chord',
    girderLength,
    turn: turnBetween(prevRows, outRows),
    chordOrdinate: (built.spanLength * built.spanLength) / (8 * built.radius),
    sweepLimitIn: (girderLength / 10) * 0.125,
    bowIn: thermalBowInches('steel', deltaT, built.spanLength, SANDBOX_GIRDER_DEPTH_IN),
    deltaT,
    straight: straightedgeOf(table),
    midspan: outRows[Math.floor(outRows.length / 2)],
  };
}
