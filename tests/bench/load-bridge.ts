/**
 * The load benchmark's compute bodies (tests/bench/loadtest.ts): a held-out bridge (not one of the demo
 * bridges the tests use) whose geometry differs in every request, so no cache can stand in for the work.
 */
import { demoBridges } from '../../lib/demo/bridges';

/**
 * The n-th request's bridge: 40th points, and a curve radius, deck edge offsets and girder offsets
 * moved by a few thousandths of a foot that change with n, so every body computes a different table.
 */
export function variedBridge(n: number): string {
  const b = structuredClone(demoBridges[0]) as (typeof demoBridges)[0];
  const nudge = ((n * 7919) % 1000) / 1000; // 0 … 0.999, a different value each request
  b.name = `Held-out load bridge ${n}`;
  b.points_per_span = 40;
  b.alignment.elements = b.alignment.elements.map((e) => (e.type === 'arc' ? { ...e, radius: e.radius + nudge * 5 } : e));
  b.deck = { ...b.deck, left_edge_offset: b.deck.left_edge_offset - nudge * 0.01, right_edge_offset: b.deck.right_edge_offset + nudge * 0.01 };
  b.girders = b.girders.map((g) => ({ ...g, offsets: g.offsets.map((o, i) => o + (i % 2 ? 1 : -1) * nudge * 0.004) }));
  return JSON.stringify(b);
}
