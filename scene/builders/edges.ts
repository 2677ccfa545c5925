/**
 * Deck edges per station for the builders, through the engine's own edge function (a constant
 * offset, or a flared station/offset list), so a flared deck is drawn true to shape.
 */
import { edgeOffsetAt, type BridgeDescription } from '@/lib/geometry';

type Deck = BridgeDescription['deck'];

/** Widest reach of an edge over its whole list (the outermost signed offset; bridge units). */
export function outermostEdgeOffset(deck: Deck, side: 'left' | 'right'): number {
  const e = side === 'left' ? deck.left_edge_offset : deck.right_edge_offset;
  if (typeof e === 'number') return e;
  const offs = e.map((p) => p.offset);
  return side === 'left' ? Math.min(...offs) : Math.max(...offs);
}

/**
 * The five section lines where the deck top changes slope at `station`, left to right: left edge,
 * left gutter line, crown (the alignment), right gutter line, right edge. Lines that would pass each
 * other (a barrier wider than half the deck) are held at their neighbour, so the count never changes.
 */
export function sectionLinesAt(deck: Deck, station: number): number[] {
  const l = edgeOffsetAt(deck, 'left', station);
  const r = edgeOffsetAt(deck, 'right', station);
  const out = [l, l + deck.left_barrier_width, 0, r - deck.right_barrier_width, r];
  for (let i = 1; i < out.length; i++) out[i] = Math.min(r, Math.max(out[i - 1], out[i]));
  return out;
}
