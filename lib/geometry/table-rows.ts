/**
 * Table steps 2 and 3, edge points and elevations: one row per girder point, with the overhang
 * numbers for exterior girders (edge point, edge width, elevations) and the deflection and screed
 * grade for every girder.
 */
import { deflectionAt } from './deflections';
import type { GeometryIssue } from './errors';
import { formatLength } from './format';
import type { GirderPoint, LocatedPoint } from './framing';
import { chordEdgePoint, curvedEdgePoint, overhangElevations, type EdgePoint } from './overhang';
import type { BridgeDescription } from './schema';
import { edgeSpecOf, solveProblem } from './table-framing';
import type { BridgeModel } from './table-model';
import type { OffsetPoint } from './types';

/** What the row steps share for one bridge. */
export interface RowContext {
  bridge: BridgeDescription;
  model: BridgeModel;
  issues: GeometryIssue[];
  /** Surveyed top of girder by girder, span and point. */
  topOfGirder: Map<string, number>;
  /** Deflection table values by girder and span. */
  deflections: Map<string, readonly number[]>;
  /** Girder points found at or beyond a deck edge so far (only the first 20 are listed). */
  edgeIssues: number;
}

/** Key of a girder point in the top-of-girder lookup. */
export function girderPointKey(girder: string, span: number, point: number): string {
  return `${girder}\u0000${span}\u0000${point}`;
}

/** Elevation step for an interior girder: top of deck, bottom of slab, buildup, deflection, screed grade. */
export function interiorRows(ctx: RowContext, gi: number, span: number, gps: GirderPoint[], values: readonly number[] | undefined): OffsetPoint[] {
  const { bridge, model } = ctx;
  const g = bridge.girders[gi];
  const n = model.pointsPerSpan;
  return gps.map((pk) => {
    const tog = ctx.topOfGirder.get(girderPointKey(g.name, span, pk.point)) ?? null;
    const deflection = deflectionAt(values, pk.point, n);
    const topOfDeck = model.surface.topOfDeckAtStationOffset(pk.station, pk.offset);
    const bottomOfSlab = topOfDeck - bridge.deck.slab_thickness;
    return {
      span,
      girder: g.name,
      side: 'interior',
      point: pk.point,
      fraction: pk.fraction,
      station: pk.station,
      offset: pk.offset,
      x: pk.x,
      y: pk.y,
      edge_x: null,
      edge_y: null,
      edge_station: null,
      edge_width: null,
      top_of_deck: topOfDeck,
      bottom_of_slab: bottomOfSlab,
      edge_bottom: null,
      edge_drop: null,
      form_target: null,
      top_of_girder: tog,
      buildup: tog === null ? null : bottomOfSlab + deflection - tog,
      drop_from_girder_top: null,
      deflection,
      screed_grade: topOfDeck + deflection,
    };
  });
}

/** Edge-point step: Ek of one girder point (square to a chord girder, along the normal for a curved one), or null with an issue. */
function edgePointOf(ctx: RowContext, gi: number, span: number, pk: GirderPoint, girderDirection: LocatedPoint, side: 'left' | 'right'): EdgePoint | null {
  const { bridge, model } = ctx;
  const g = bridge.girders[gi];
  const edge = edgeSpecOf(bridge, side);
  try {
    return g.layout === 'chord' ? chordEdgePoint(model.alignment, pk, girderDirection, side, edge) : curvedEdgePoint(model.alignment, pk, side, edge);
  } catch (err) {
    ctx.issues.push({
      path: `girders.${gi}`,
      span,
      girder: g.name,
      point: pk.point,
      message: `Span ${span}, girder ${g.name}, point ${pk.point}: the ${side} deck edge cannot be reached square to the girder (${solveProblem(err)})`,
    });
    return null;
  }
}

/** A girder point at or beyond the edge is refused; one line per point would bury the cause, so the first 20 are listed. */
function checkEdgeWidth(ctx: RowContext, gi: number, span: number, pk: GirderPoint, ek: EdgePoint, side: 'left' | 'right'): void {
  if (ek.edgeWidth > 0) return;
  ctx.edgeIssues++;
  if (ctx.edgeIssues > 20) return;
  const g = ctx.bridge.girders[gi];
  ctx.issues.push({
    path: `girders.${gi}.offsets`,
    span,
    girder: g.name,
    point: pk.point,
    message: `Span ${span}, girder ${g.name}, point ${pk.point}: the girder point is at or beyond the ${side} deck edge (edge width ${formatLength(ek.edgeWidth, ctx.model.units)})`,
  });
}

/**
 * Edge-point and elevation steps for an exterior girder facing `side`: rows with every overhang
 * number, and the edge widths (null when a point failed).
 */
export function overhangRows(
  ctx: RowContext,
  gi: number,
  span: number,
  frame: { pa: LocatedPoint; pb: LocatedPoint; points: GirderPoint[] },
  side: 'left' | 'right',
  values: readonly number[] | undefined,
): { rows: OffsetPoint[]; widths: number[] | null } {
  const { bridge, model } = ctx;
  const g = bridge.girders[gi];
  const deck = bridge.deck;
  const dir = { x: frame.pb.x - frame.pa.x, y: frame.pb.y - frame.pa.y, station: 0, offset: 0 };
  const rows: OffsetPoint[] = [];
  const widths: number[] = [];
  for (const pk of frame.points) {
    const ek = edgePointOf(ctx, gi, span, pk, dir, side);
    if (!ek) continue;
    checkEdgeWidth(ctx, gi, span, pk, ek, side);
    widths.push(ek.edgeWidth);
    const tog = ctx.topOfGirder.get(girderPointKey(g.name, span, pk.point)) ?? null;
    const deflection = deflectionAt(values, pk.point, model.pointsPerSpan);
    const elev = overhangElevations(model.surface, pk, ek, deck.slab_thickness, deck.edge_thickness, model.formSettlement, tog, deflection);
    rows.push({
      span,
      girder: g.name,
      side,
      point: pk.point,
      fraction: pk.fraction,
      station: pk.station,
      offset: pk.offset,
      x: pk.x,
      y: pk.y,
      edge_x: ek.x,
      edge_y: ek.y,
      edge_station: ek.station,
      edge_width: ek.edgeWidth,
      top_of_deck: elev.topOfDeck,
      bottom_of_slab: elev.bottomOfSlab,
      edge_bottom: elev.edgeBottom,
      edge_drop: elev.edgeDrop,
      form_target: elev.formTarget,
      top_of_girder: tog,
      buildup: elev.buildup,
      drop_from_girder_top: elev.dropFromGirderTop,
      deflection: elev.deflection,
      screed_grade: elev.screedGrade,
    });
  }
  return { rows, widths: widths.length === frame.points.length ? widths : null };
}
