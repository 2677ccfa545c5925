/**
 * Deck cross section: per-side cross slopes and the top of deck at any plan point.
 *
 * Cross slopes are rise/run measured going OUTWARD from the alignment on each side: negative falls
 * away from the alignment (normal crown −0.02 / −0.02), positive rises outward.
 */
import type { Alignment } from '@/lib/geometry/alignment';
import type { Profile } from '@/lib/geometry/profile';
import { edgeSpecOffsetAt, isConstantEdge, type EdgeOffsetSpec } from '@/lib/geometry/deck-edges';

/** Cross slopes at one station. */
export interface CrossSlopeInput {
  station: number;
  left: number;
  right: number;
}

/** Deck edges (constant or flared) and barriers; offsets signed (left negative), lengths in the bridge's unit. */
export interface DeckEdgesInput {
  left_edge_offset: EdgeOffsetSpec;
  right_edge_offset: EdgeOffsetSpec;
  left_barrier_width: number;
  right_barrier_width: number;
}

/** Side of the alignment: left when the offset is negative, else right. */
export type DeckSide = 'left' | 'right';

/**
 * Cross slopes on both sides at a station: linear between listed stations, constant before the
 * first and after the last. Stations must be increasing; an empty list gives level slopes.
 */
export function crossSlopeAt(slopes: readonly CrossSlopeInput[], station: number): { left: number; right: number } {
  const n = slopes.length;
  if (n === 0) return { left: 0, right: 0 };
  if (station <= slopes[0].station) return { left: slopes[0].left, right: slopes[0].right };
  if (station >= slopes[n - 1].station) return { left: slopes[n - 1].left, right: slopes[n - 1].right };
  let lo = 0;
  let hi = n - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (slopes[mid].station <= station) lo = mid;
    else hi = mid - 1;
  }
  const a = slopes[lo];
  const b = slopes[lo + 1];
  const f = (station - a.station) / (b.station - a.station);
  return { left: a.left + f * (b.left - a.left), right: a.right + f * (b.right - a.right) };
}

/**
 * Gutter line offsets at a station: each edge (its offset at that station, for a flared edge) moved
 * inward by that side's barrier width. Signed offsets in length units.
 */
export function gutterOffsets(deck: DeckEdgesInput, station = 0): { left: number; right: number } {
  return {
    left: edgeSpecOffsetAt(deck.left_edge_offset, station) + deck.left_barrier_width,
    right: edgeSpecOffsetAt(deck.right_edge_offset, station) - deck.right_barrier_width,
  };
}

/** Side of a signed offset: left when o < 0, else right. */
export function sideOfOffset(offset: number): DeckSide {
  return offset < 0 ? 'left' : 'right';
}

/**
 * Evaluates the deck surface: profile grade at the alignment, the side's cross slope out to the
 * gutter line, level from there to the edge (under the barrier).
 */
export class DeckSurface {
  // Constant gutter offsets when both edges are constant; null when an edge flares.
  private readonly gutter: { left: number; right: number } | null;

  constructor(
    private readonly alignment: Alignment,
    private readonly profile: Profile,
    private readonly slopes: readonly CrossSlopeInput[],
    private readonly deck: DeckEdgesInput,
  ) {
    this.gutter = isConstantEdge(deck.left_edge_offset) && isConstantEdge(deck.right_edge_offset) ? gutterOffsets(deck) : null;
  }

  /**
   * Top of deck at a station and offset: PGL(s) + slope_side(s) × min(|o|, |gutter offset of side at s|).
   * @param station length units; @param offset length units, positive right.
   * @returns elevation in length units.
   */
  topOfDeckAtStationOffset(station: number, offset: number): number {
    const side = sideOfOffset(offset);
    const slope = crossSlopeAt(this.slopes, station)[side];
    const gutter = this.gutter ?? gutterOffsets(this.deck, station);
    const reach = Math.min(Math.abs(offset), Math.abs(gutter[side]));
    return this.profile.elevationAt(station) + slope * reach;
  }

  /**
   * Top of deck at a plan point (x easting, y northing; length units): the inverse gives its
   * station and offset, then {@link DeckSurface.topOfDeckAtStationOffset}.
   */
  topOfDeckAt(x: number, y: number): number {
    const so = this.alignment.stationOffset(x, y);
    return this.topOfDeckAtStationOffset(so.station, so.offset);
  }
}
