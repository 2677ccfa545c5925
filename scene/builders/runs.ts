/**
 * Groups the engine's girder-point rows into runs: one girder (or one exterior side) over one span,
 * ordered by point. Every builder walks these runs, so they are worked out once per table.
 */
import type { OffsetPoint, OffsetTable } from '@/lib/geometry';

export interface GirderRun {
  girder: string;
  span: number;
  /** left / right for an exterior girder's overhang rows, interior otherwise. */
  side: 'left' | 'right' | 'interior';
  /** Rows of this girder in this span, point 0..n. */
  rows: OffsetPoint[];
}

function byPoint(a: OffsetPoint, b: OffsetPoint): number {
  return a.point - b.point;
}

/**
 * One run per girder and span (each girder drawn once: a lone girder that faces both edges gives
 * its left rows). Order: span, then the table's girder order.
 */
export function girderRuns(table: Pick<OffsetTable, 'points'>): GirderRun[] {
  const runs = new Map<string, GirderRun>();
  for (const p of table.points) {
    const key = `${p.span}\u0000${p.girder}`;
    let run = runs.get(key);
    if (!run) {
      run = { girder: p.girder, span: p.span, side: p.side, rows: [] };
      runs.set(key, run);
    }
    if (p.side !== run.side) continue;
    run.rows.push(p);
  }
  for (const r of runs.values()) r.rows.sort(byPoint);
  return [...runs.values()].sort((a, b) => a.span - b.span);
}

/** Overhang runs: one per exterior side and span, rows point 0..n. Order: side (left first), span. */
export function overhangRuns(table: Pick<OffsetTable, 'points'>): GirderRun[] {
  const runs = new Map<string, GirderRun>();
  for (const p of table.points) {
    if (p.side === 'interior' || p.edge_x === null) continue;
    const key = `${p.side}\u0000${p.span}`;
    let run = runs.get(key);
    if (!run) {
      run = { girder: p.girder, span: p.span, side: p.side, rows: [] };
      runs.set(key, run);
    }
    run.rows.push(p);
  }
  for (const r of runs.values()) r.rows.sort(byPoint);
  const sideOrder = (s: string) => (s === 'left' ? 0 : 1);
  return [...runs.values()].sort((a, b) => sideOrder(a.side) - sideOrder(b.side) || a.span - b.span);
}

/**
 * The elevation the girder's top flange is drawn at: the surveyed top of girder when there is one,
 * otherwise the bottom of slab (no buildup assumed).
 */
export function girderTopOf(p: Pick<OffsetPoint, 'top_of_girder' | 'bottom_of_slab'>): number {
  return p.top_of_girder ?? p.bottom_of_slab;
}

/** Smallest and largest edge width over the overhang rows ([0, 0] when there are none). */
export function edgeWidthRange(table: Pick<OffsetTable, 'points'>): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const p of table.points) {
    if (p.edge_width === null) continue;
    if (p.edge_width < lo) lo = p.edge_width;
    if (p.edge_width > hi) hi = p.edge_width;
  }
  return Number.isFinite(lo) ? [lo, hi] : [0, 0];
}

/**
 * Where the pour stands and how its movement is drawn. `pour` 0 = as set before the pour (girders
 * cambered, forms at form target), 1 = after it (girders down by their deflection, forms settled to
 * the edge bottom). `deflectionScale` is scene units per bridge unit of deflection (the frame's
 * exaggeration draws it true to the rest of the picture; more magnifies it).
 */
export interface PourState {
  pour: number;
  deflectionScale?: number;
}

/** A row's dead-load deflection (bridge units, positive downward); 0 when the table has none. */
export function deflectionOf(p: Pick<OffsetPoint, 'fraction'> & { deflection?: number | null }): number {
  return p.deflection ?? 0;
}

/**
 * Top of the girder before the pour: the surveyed top of girder, or the bottom of slab plus the
 * deflection still to come (no buildup assumed). Bridge units.
 */
export function prePourGirderTop(p: Pick<OffsetPoint, 'top_of_girder' | 'bottom_of_slab' | 'fraction'> & { deflection?: number | null }): number {
  return p.top_of_girder ?? p.bottom_of_slab + deflectionOf(p);
}

/**
 * Scene y of the top of girder at a pour state: the girder comes down by its deflection as the deck
 * is poured. With no pour state, the pre-pour top (as the forms are set).
 */
export function girderTopY(
  p: Pick<OffsetPoint, 'top_of_girder' | 'bottom_of_slab' | 'fraction'> & { deflection?: number | null },
  frame: { refElevation: number; exaggeration: number },
  state?: PourState,
): number {
  const pre = prePourGirderTop(p);
  const d = deflectionOf(p);
  const scale = state?.deflectionScale ?? frame.exaggeration;
  const final = pre - d;
  return (final - frame.refElevation) * frame.exaggeration + d * scale * (1 - (state?.pour ?? 0));
}

/**
 * Scene y of the form's bottom outside edge at a pour state: at the form target before the pour,
 * down by the form settlement and the deflection to the edge bottom after it.
 */
export function formEdgeY(
  p: Pick<OffsetPoint, 'form_target' | 'edge_bottom' | 'fraction'> & { deflection?: number | null },
  frame: { refElevation: number; exaggeration: number },
  state?: PourState,
): number {
  const target = p.form_target as number;
  const bottom = p.edge_bottom as number;
  const d = deflectionOf(p);
  const settle = target - bottom - d;
  const scale = state?.deflectionScale ?? frame.exaggeration;
  return (bottom - frame.refElevation) * frame.exaggeration + (settle * frame.exaggeration + d * scale) * (1 - (state?.pour ?? 0));
}

/** True when any row of the table carries a non-zero deflection. */
export function hasDeflections(table: Pick<OffsetTable, 'points'>): boolean {
  return table.points.some((p) => (p as { deflection?: number | null }).deflection);
}
