/**
 * Chord offsets: the old way of marking a curved deck edge from a string line stretched between
 * its points on two bent lines.
 */
import { distanceAlongRayToOffset, type Alignment, type PlanPoint } from '@/lib/geometry/alignment';
import { outwardNormal } from '@/lib/geometry/overhang';
import type { EdgeOffsetSpec } from '@/lib/geometry/deck-edges';
import type { ChordOffsetSet } from '@/lib/geometry/types';

/**
 * Perpendicular distance from a point of a chord to the edge line (a constant offset, or a flared
 * station/offset list whose line is the points at the edge offset of their own station),
 * positive when the edge lies outward of the chord (away from the alignment).
 * @param chordDirection plan direction Ea → Eb (up-station).
 */
export function chordOffsetAt(alignment: Alignment, chordPoint: PlanPoint, chordDirection: PlanPoint, side: 'left' | 'right', edgeOffset: EdgeOffsetSpec): number {
  return distanceAlongRayToOffset(alignment, chordPoint, outwardNormal(chordDirection, side), edgeOffset, 0);
}

/**
 * Chord offsets of one span and side: the chord Ea → Eb in m equal spaces, the offset to the edge
 * line at each division point i = 0..m, `distance` along the chord from Ea.
 * @param ea, eb the edge line's points on the span's two bent lines.
 */
export function chordOffsetSet(alignment: Alignment, span: number, side: 'left' | 'right', ea: PlanPoint, eb: PlanPoint, edgeOffset: EdgeOffsetSpec, spaces: number): ChordOffsetSet {
  const dx = eb.x - ea.x;
  const dy = eb.y - ea.y;
  const chordLength = Math.hypot(dx, dy);
  const dir = { x: dx, y: dy };
  const offsets = new Array(spaces + 1);
  for (let i = 0; i <= spaces; i++) {
    const f = i / spaces;
    const p = { x: ea.x + f * dx, y: ea.y + f * dy };
    offsets[i] = { i, distance: f * chordLength, offset: chordOffsetAt(alignment, p, dir, side, edgeOffset) };
  }
  return { span, side, chord_length: chordLength, spaces, offsets };
}

/**
 * Middle ordinate of the edge chord: the chord offset at the chord's midpoint (length units,
 * positive when the edge bows outward). On a single arc of radius R with central angle Δ this is
 * R(1 − cos(Δ/2)).
 */
export function edgeMiddleOrdinate(alignment: Alignment, ea: PlanPoint, eb: PlanPoint, side: 'left' | 'right', edgeOffset: EdgeOffsetSpec): number {
  const dir = { x: eb.x - ea.x, y: eb.y - ea.y };
  const mid = { x: (ea.x + eb.x) / 2, y: (ea.y + eb.y) / 2 };
  return chordOffsetAt(alignment, mid, dir, side, edgeOffset);
}
