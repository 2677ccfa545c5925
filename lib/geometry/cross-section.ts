/**
 * Deck cross section: per-side cross slopes and the top of deck at any plan point.
 *
 * Cross slopes are rise/run measured going OUTWARD from the alignment on each side: negative falls
 * away from the alignment (normal crown −0.02 / −0.02), positive rises outward.
 */
import type { Alignment } from '@/lib/geometry/alignment';
import type { Profile } from '@/lib/geometry/profile';

/** Cross slopes at one station. */
export interface CrossSlopeInput {
  station: number;
  left: number;
  right: number;
}

/** Deck edges and barriers; offsets signed (left negative), lengths in the bridge's unit. */
export interface DeckEdgesInput {
  left_edge_offset: number;
  right_edge_offset: number;
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
 * Gutter line offsets: each edge moved inward (toward the alignment side of the deck) by that side's
 * barrier width. Signed offsets in length units.
 */
export function gutterOffsets(deck: DeckEdgesInput): { left: number; right: number } {
  return {
    left: deck.left_edge_offset + deck.left_barrier_width,
    right: deck.right_edge_offset - deck.right_barrier_width,
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
  private readonly gutter: { left: number; right: number };

  constructor(
    private readonly alignment: Alignment,
    private readonly profile: Profile,
    private readonly slopes: readonly CrossSlopeInput[],
    deck: DeckEdgesInput,
  ) {
    this.gutter = gutterOffsets(deck);
  }

  /**
   * Top of deck at a station and offset: PGL(s) + slope_side(s) × min(|o|, |gutter offset of side|).
   * @param station length units; @param offset length units, positive right.
   * @returns elevation in length units.
   */
  topOfDeckAtStationOffset(station: number, offset: number): number {
    const side = sideOfOffset(offset);
    const slope = crossSlopeAt(this.slopes, station)[side];
    const reach = Math.min(Math.abs(offset), Math.abs(this.gutter[side]));
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
