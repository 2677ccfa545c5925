import { describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, type BridgeDescription } from '@/lib/geometry';
import { diffFields, diffRevisions } from '@/lib/services/revision-diff';
import { fieldKind, fieldLabel } from '@/lib/services/revision-field-labels';

const copy = (d: BridgeDescription): BridgeDescription => JSON.parse(JSON.stringify(d));

/**
 * A straight bridge: one long tangent, square bents, constant crown. On a tangent the girder chords
 * and the deck edges are parallel lines, so the edge width is |girder offset − edge offset| at every
 * point (plane geometry of parallel lines).
 */
function straightBridge(): BridgeDescription {
  const d = copy(demoBridges[0]);
  d.alignment.elements = [{ type: 'line', length: 1000 }];
  d.bents = d.bents.map((b) => ({ ...b, skew_deg: 0 }));
  d.cross_slopes = [{ station: 1000, left: -0.02, right: -0.02 }];
  return d;
}

describe('revision diff: fields', () => {
  it('finds nothing between a description and its copy', () => {
    const d = demoBridges[0];
    const diff = diffRevisions(d, copy(d));
    expect(diff.fields).toEqual([]);
    expect(diff.edge_widths).toEqual([]);
    expect(diff.spans.every((s) => s.largest_change === 0)).toBe(true);
  });

  it('lists exactly the changed, added and removed fields, in reading order', () => {
    const a = copy(demoBridges[0]);
    const b = copy(a);
    b.girders[0].offsets[1] = -17.9;
    b.deck.form_settlement = undefined as unknown as number;
    delete (b.deck as { form_settlement?: number }).form_settlement;
    b.bents[3].name = 'Abutment Four';
    b.chord_spaces = 10;
    const fields = diffFields(a, b);
    expect(fields).toEqual([
      { path: 'deck.form_settlement', before: 0.02, after: undefined },
      { path: 'bents.3.name', before: 'Abutment 4', after: 'Abutment Four' },
      { path: 'girders.0.offsets.1', before: -18.2, after: -17.9 },
      { path: 'chord_spaces', before: 20, after: 10 },
    ]);
  });

  it('names bents and girders in its labels and knows each quantity', () => {
    const d = demoBridges[0];
    expect(fieldLabel('girders.0.offsets.2', d)).toBe('Girder G1 · offset at Pier 3');
    expect(fieldLabel('bents.1.station', d)).toBe('Pier 2 · station');
    expect(fieldLabel('alignment.elements.1.radius', d)).toBe('Alignment element 2 · radius');
    expect(fieldLabel('profile.pvis.0.elevation', d)).toBe('PVI 1 · elevation');
    expect(fieldLabel('deck.left_edge_offset', d)).toBe('Deck · left edge offset');
    expect(fieldKind('girders.0.offsets.2')).toBe('offset');
    expect(fieldKind('bents.1.station')).toBe('station');
    expect(fieldKind('cross_slopes.0.left')).toBe('slope');
    expect(fieldKind('bents.0.skew_deg')).toBe('angle');
    expect(fieldKind('deck.slab_thickness')).toBe('length');
  });
});

describe('revision diff: edge widths', () => {
  it('on a tangent, moving the left exterior girder 0.5 ft inward widens every one of its overhang points by 0.5 ft', () => {
    const a = straightBridge();
    const b = copy(a);
    b.girders[0].offsets = b.girders[0].offsets.map((o) => o + 0.5);
    const diff = diffRevisions(a, b);
    const spans = a.bents.length - 1;
    const n = a.points_per_span as number;
    expect(diff.before_problem).toBeNull();
    expect(diff.edge_widths).toHaveLength(spans * (n + 1));
    for (const c of diff.edge_widths) {
      expect(c.side).toBe('left');
      expect(c.girder).toBe('G1');
      // Parallel lines: width = |−18.2 − (−21)| = 2.8 before, |−17.7 − (−21)| = 3.3 after.
      expect(Math.abs((c.before as number) - 2.8)).toBeLessThan(1e-9);
      expect(Math.abs((c.after as number) - 3.3)).toBeLessThan(1e-9);
      expect(Math.abs((c.difference as number) - 0.5)).toBeLessThan(1e-9);
    }
    const leftSpans = diff.spans.filter((s) => s.side === 'left');
    expect(leftSpans).toHaveLength(spans);
    for (const s of leftSpans) expect(Math.abs((s.largest_change as number) - 0.5)).toBeLessThan(1e-9);
    for (const s of diff.spans.filter((x) => x.side === 'right')) expect(s.largest_change).toBeLessThan(1e-9);
  });

  it('a girder offset changed at one bent moves only the points of the two spans that meet there', () => {
    const a = copy(demoBridges[0]);
    const b = copy(a);
    b.girders[4].offsets[1] = 17.0; // G5 at Pier 2 (bent 2): spans 1 and 2 change, span 3 does not.
    const diff = diffRevisions(a, b);
    expect(diff.edge_widths.length).toBeGreaterThan(0);
    expect(new Set(diff.edge_widths.map((c) => c.span))).toEqual(new Set([1, 2]));
    expect(diff.edge_widths.every((c) => c.girder === 'G5' && c.side === 'right')).toBe(true);
    // Span 1 point 0 stays on Abutment 1; only the chord's direction turns (by about 0.2/90 rad), so
    // the width there, measured square to the chord, hardly changes.
    const atAbutment = diff.edge_widths.find((c) => c.span === 1 && c.point === 0);
    expect(Math.abs(atAbutment?.difference ?? 0)).toBeLessThan(0.01);
    // Each listed difference is the engine's own after − before at that point.
    const ta = computeOffsetTable(a).points;
    const tb = computeOffsetTable(b).points;
    for (const c of diff.edge_widths) {
      const pa = ta.find((p) => p.span === c.span && p.girder === c.girder && p.point === c.point)!;
      const pb = tb.find((p) => p.span === c.span && p.girder === c.girder && p.point === c.point)!;
      expect(Math.abs((c.difference as number) - ((pb.edge_width as number) - (pa.edge_width as number)))).toBeLessThan(1e-12);
    }
    // Moving G5 inward (17.2 → 17.0) at the pier widens the right overhang there.
    const atPier = diff.edge_widths.find((c) => c.span === 1 && c.point === a.points_per_span)!;
    expect(atPier.difference as number).toBeGreaterThan(0.1);
  });

  it('lists points that exist in only one revision and says when a revision cannot be computed', () => {
    const a = copy(demoBridges[0]);
    delete a.top_of_girder; // its surveyed points 20 would not exist with 10 points per span
    const b = copy(a);
    b.points_per_span = 10;
    const diff = diffRevisions(a, b);
    expect(diff.edge_widths.some((c) => c.after === null && c.difference === null)).toBe(true);
    const broken = copy(a);
    broken.girders[0].offsets = [-25, -25, -25, -25]; // beyond the −21 ft left edge: no overhang to build
    const bad = diffRevisions(a, broken);
    expect(bad.after_problem).toMatch(/G1/);
    expect(bad.edge_widths).toEqual([]);
    expect(bad.fields.length).toBe(4);
  });
});
