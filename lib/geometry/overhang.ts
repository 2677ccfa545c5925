/**
 * Overhang numbers at exterior girder points: edge point, edge width and the elevations a crew sets.
 */
import { distanceAlongRayToOffset, type Alignment, type PlanPoint } from './alignment';
import { edgeSpecOffsetAt, type EdgeOffsetSpec } from './deck-edges';
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
 * perpendicular, outward, to the deck edge line, solved numerically. A flared edge line is the set of
 * points whose offset equals the edge offset at their own station, so the solve iterates on both.
 * @param girderDirection plan direction of the girder (Pa → Pb), any length.
 * @param edgeOffset the edge: a signed offset (length units, positive right) or a flared station/offset list.
 */
export function chordEdgePoint(alignment: Alignment, pk: GirderPoint, girderDirection: PlanPoint, side: 'left' | 'right', edgeOffset: EdgeOffsetSpec): EdgePoint {
  const w = outwardNormal(girderDirection, side);
  const here = edgeSpecOffsetAt(edgeOffset, pk.station);
  const guess = side === 'left' ? pk.offset - here : here - pk.offset;
  const t = distanceAlongRayToOffset(alignment, pk, w, edgeOffset, guess);
  const x = pk.x + t * w.x;
  const y = pk.y + t * w.y;
  const so = alignment.stationOffset(x, y);
  return { x, y, station: so.station, offset: so.offset, edgeWidth: t };
}

/**
 * Edge point of a curved-layout girder point: along the alignment normal at the girder point's
 * station, so Ek lies at the same station on the edge line (at the edge's offset at that station) and
 * the width is the offset difference.
 */
export function curvedEdgePoint(alignment: Alignment, pk: GirderPoint, side: 'left' | 'right', edge: EdgeOffsetSpec): EdgePoint {
  const edgeOffset = edgeSpecOffsetAt(edge, pk.station);
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
  /** Deflection still to come at Pk (positive downward) and the screed grade over the girder. */
  deflection: number;
  screedGrade: number;
}

/**
 * Elevations at a girder point and its edge point (data contract, "Definitions").
 * bottom of slab = top of deck at Pk − slab thickness; edge bottom = top of deck at Ek − edge
 * thickness; edge drop = bottom of slab − edge bottom (positive when the edge is lower); form target
 * = edge bottom + form settlement + deflection; buildup = bottom of slab + deflection − top of girder;
 * drop from girder top = top of girder − form target; screed grade = top of deck + deflection.
 * @param deflection dead-load deflection still to come at Pk (length units, positive downward; Ek
 * rides with its girder point).
 */
export function overhangElevations(
  surface: DeckSurface,
  pk: { station: number; offset: number },
  ek: { station: number; offset: number },
  slabThickness: number,
  edgeThickness: number,
  formSettlement: number,
  topOfGirder: number | null,
  deflection = 0,
): OverhangElevations {
  const topOfDeck = surface.topOfDeckAtStationOffset(pk.station, pk.offset);
  const bottomOfSlab = topOfDeck - slabThickness;
  const edgeBottom = surface.topOfDeckAtStationOffset(ek.station, ek.offset) - edgeThickness;
  const formTarget = edgeBottom + formSettlement + deflection;
  return {
    topOfDeck,
    bottomOfSlab,
    edgeBottom,
    edgeDrop: bottomOfSlab - edgeBottom,
    formTarget,
    buildup: topOfGirder === null ? null : bottomOfSlab + deflection - topOfGirder,
    dropFromGirderTop: topOfGirder === null ? null : topOfGirder - formTarget,
    deflection,
    screedGrade: topOfDeck + deflection,
  };
}
