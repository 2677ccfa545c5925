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
