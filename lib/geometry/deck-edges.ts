/**
 * Deck edges: a constant offset, or a flared edge given as a station/offset list (linear between
 * the listed stations, constant before the first and after the last). Offsets are signed, positive
 * right of the alignment looking up-station; stations and offsets in the bridge's length unit.
 */

/** One row of a flared edge. */
export interface EdgeStationOffset {
  station: number;
  offset: number;
}

/** A deck edge as described: constant, or a list of at least two rows with increasing stations. */
export type EdgeOffsetSpec = number | readonly EdgeStationOffset[];

/** The two deck edges of a description. */
export interface DeckEdgeSpecs {
  left_edge_offset: EdgeOffsetSpec;
  right_edge_offset: EdgeOffsetSpec;
}

/**
 * Offset of an edge at a station: the number itself when constant, else linear between the listed
 * stations and constant beyond the first and last (data contract, "deck").
 * @param spec the edge as described; @param station length units.
 * @returns signed offset (length units, positive right).
 */
export function edgeSpecOffsetAt(spec: EdgeOffsetSpec, station: number): number {
  if (typeof spec === 'number') return spec;
  const n = spec.length;
  if (n === 0) return 0;
  if (station <= spec[0].station) return spec[0].offset;
  if (station >= spec[n - 1].station) return spec[n - 1].offset;
  let lo = 0;
  let hi = n - 2;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (spec[mid].station <= station) lo = mid;
    else hi = mid - 1;
  }
  const a = spec[lo];
  const b = spec[lo + 1];
  return a.offset + ((station - a.station) / (b.station - a.station)) * (b.offset - a.offset);
}

/**
 * Offset of the left or right deck edge at a station (length units, signed, positive right).
 * A constant edge gives its number at every station.
 */
export function edgeOffsetAt(deck: DeckEdgeSpecs, side: 'left' | 'right', station: number): number {
  return edgeSpecOffsetAt(side === 'left' ? deck.left_edge_offset : deck.right_edge_offset, station);
}

/** True when the edge is the same offset at every station (a number, or a list of equal offsets). */
export function isConstantEdge(spec: EdgeOffsetSpec): boolean {
  return typeof spec === 'number' || spec.every((r) => r.offset === spec[0].offset);
}

/**
 * Rate of change of the edge offset with station at a station (length per length): 0 for a constant
 * edge and beyond the list; the slope of the row pair on the up-station side at a listed station.
 */
export function edgeSpecSlopeAt(spec: EdgeOffsetSpec, station: number): number {
  if (typeof spec === 'number') return 0;
  const n = spec.length;
  if (n < 2 || station < spec[0].station || station >= spec[n - 1].station) return 0;
  let i = 0;
  while (i + 2 < n && spec[i + 1].station <= station) i++;
  return (spec[i + 1].offset - spec[i].offset) / (spec[i + 1].station - spec[i].station);
}

/** Every offset an edge takes at a listed station (one value for a constant edge). */
export function edgeSpecOffsets(spec: EdgeOffsetSpec): number[] {
  return typeof spec === 'number' ? [spec] : spec.map((r) => r.offset);
}
