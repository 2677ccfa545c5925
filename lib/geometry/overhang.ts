/**
 * Overhang numbers at exterior girder points: edge point, edge width and the elevations a crew sets.
 */
import { distanceAlongRayToOffset, type Alignment, type PlanPoint } from './alignment';
import type { DeckSurface } from '@/lib/geometry/cross-section';
import type { GirderPoint } from './framing';

/** Edge point Ek of a girder point and the signed edge width (≤ 0 when the girder is at or past the edge). */
export interface EdgePoint {
  x: number;
  y: number;
  station: number;
  offset: number;
  /** Distance from Pk to Ek, measured outward; positive for a girder inside the deck. */
  edgeWidth: number;
}

/**
 * Outward unit normal of a direction in plan: to the left of travel for the left edge, to the right
 * for the right edge.
 */
export function outwardNormal(direction: PlanPoint, side: 'left' | 'right'): PlanPoint {
  const len = Math.hypot(direction.x, direction.y);
  const ux = direction.x / len;
  const uy = direction.y / len;
  return side === 'left' ? { x: -uy, y: ux } : { x: uy, y: -ux };
}

/**
 * Edge point of a chord-layout girder point: from Pk horizontally along the girder's plan
 * perpendicular, outward, to the deck edge line (constant offset `edgeOffset`), solved numerically.
 * @param girderDirection plan direction of the girder (Pa → Pb), any length.
 * @param edgeOffset signed offset of the edge line (length units, positive right).
 */
export function chordEdgePoint(
  alignment: Alignment,
  pk: GirderPoint,
  girderDirection: PlanPoint,
  side: 'left' | 'right',
  edgeOffset: number,
): EdgePoint {
  const w = outwardNormal(girderDirection, side);
  const guess = side === 'left' ? pk.offset - edgeOffset : edgeOffset - pk.offset;
  const t = distanceAlongRayToOffset(alignment, pk, w, edgeOffset, guess);
  const x = pk.x + t * w.x;
  const y = pk.y + t * w.y;
  const so = alignment.stationOffset(x, y);
  return { x, y, station: so.station, offset: so.offset, edgeWidth: t };
}

/**
 * Edge point of a curved-layout girder point: along the alignment normal at the girder point's
 * station, so Ek lies at the same station on the edge line and the width is the offset difference.
 */
export function curvedEdgePoint(alignment: Alignment, pk: GirderPoint, side: 'left' | 'right', edgeOffset: number): EdgePoint {
  const p = alignment.pointAt(pk.station, edgeOffset);
  const edgeWidth = side === 'left' ? pk.offset - edgeOffset : edgeOffset - pk.offset;
  return { x: p.x, y: p.y, station: pk.station, offset: edgeOffset, edgeWidth };
}

/** Elevations of one overhang point (length units). */
export interface OverhangElevations {
  topOfDeck: number;
  bottomOfSlab: number;
  edgeBottom: number;
  edgeDrop: number;
  formTarget: number;
  buildup: number | null;
  dropFromGirderTop: number | null;
}

/**
 * Elevations at a girder point and its edge point.
 * bottom of slab = top of deck at Pk − slab thickness; edge bottom = top of deck at Ek − edge
 * thickness; edge drop = bottom of slab − edge bottom (positive when the edge is lower); form target
 * = edge bottom + form settlement; buildup = bottom of slab − top of girder; drop from girder top =
 * top of girder − form target.
 */
export function overhangElevations(
  surface: DeckSurface,
  pk: { station: number; offset: number },
  ek: { station: number; offset: number },
  slabThickness: number,
  edgeThickness: number,
  formSettlement: number,
  topOfGirder: number | null,
): OverhangElevations {
  const topOfDeck = surface.topOfDeckAtStationOffset(pk.station, pk.offset);
  const bottomOfSlab = topOfDeck - slabThickness;
  const edgeBottom = surface.topOfDeckAtStationOffset(ek.station, ek.offset) - edgeThickness;
  const formTarget = edgeBottom + formSettlement;
  return {
    topOfDeck,
    bottomOfSlab,
    edgeBottom,
    edgeDrop: bottomOfSlab - edgeBottom,
    formTarget,
    buildup: topOfGirder === null ? null : bottomOfSlab - topOfGirder,
    dropFromGirderTop: topOfGirder === null ? null : topOfGirder - formTarget,
  };
}
