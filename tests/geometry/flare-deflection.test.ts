/**
 * Flared deck edges and dead-load deflections against closed forms worked by hand from the data
 * contract's definitions, and the hostile inputs the contract refuses.
 */
import { describe, it, expect } from 'vitest';
import { computeOffsetTable, parseBridge, validateGeometry, type BridgeDescription } from '@/lib/geometry';
import { straightBridge } from './helpers';

// The straight test bridge runs due north from (0, 0): x is the offset, y the station; grade +1 %
// from 100.00 at station 0; cross slopes −3 % both sides; barriers 1.5 ft; edge thickness 0.75 ft.
const pgl = (s: number) => 100 + 0.01 * s;

function flared(right: Array<{ station: number; offset: number }>, extra: Partial<BridgeDescription> = {}): BridgeDescription {
  const b = straightBridge({
    bents: [
      { name: 'Bent 1', station: 100, skew_deg: 0 },
      { name: 'Bent 2', station: 400, skew_deg: 0 },
    ],
    ...extra,
  });
  return { ...b, deck: { ...b.deck, right_edge_offset: right } };
}

describe('flared edge on a straight alignment (closed form by hand)', () => {
  it('chord girder under a linear flare: edge width, edge station and edge bottom', () => {
    // Right edge 20 → 26 ft from station 100 to 400: e(s) = 20 + 0.02(s − 100). G3 runs from offset 16
    // to 18 (direction (2, 300)); from Pk outward square to the girder, w = (300, −2)/n, n = √(300² + 2²):
    // x_k + 300t/n = e(s_k − 2t/n)  ⇒  t = n (e(s_k) − x_k) / 300.04 while the edge point's station is
    // within the list; before station 100 the edge is constant (20 ft): t = n (20 − x_k) / 300.
    const b = flared(
      [
        { station: 100, offset: 20 },
        { station: 400, offset: 26 },
      ],
      {
        girders: [
          { name: 'G1', layout: 'chord', offsets: [-16, -16] },
          { name: 'G3', layout: 'chord', offsets: [16, 18] },
        ],
      },
    );
    const t = computeOffsetTable(b);
    const n = Math.hypot(300, 2);
    const e = (s: number) => (s <= 100 ? 20 : 20 + 0.02 * (s - 100));
    const rows = t.points.filter((p) => p.side === 'right');
    expect(rows).toHaveLength(11);
    for (const p of rows) {
      const f = p.point / 10;
      const xk = 16 + 2 * f;
      const sk = 100 + 300 * f;
      const onFlare = (n * (e(sk) - xk)) / 300.04;
      const w = sk - (2 * onFlare) / n >= 100 ? onFlare : (n * (20 - xk)) / 300;
      const sE = sk - (2 * w) / n;
      expect(p.edge_width).toBeCloseTo(w, 9);
      expect(p.edge_station).toBeCloseTo(sE, 9);
      expect(p.edge_x).toBeCloseTo(xk + (300 * w) / n, 9);
      // Level under the barrier: the gutter line lies 1.5 ft inside the edge at the edge point's own station.
      expect(p.edge_bottom).toBeCloseTo(pgl(sE) - 0.03 * (e(sE) - 1.5) - 0.75, 9);
    }
    // A straight edge over a straight chord: every chord offset is zero.
    for (const c of t.chord_offsets.filter((x) => x.side === 'right')) for (const o of c.offsets) expect(Math.abs(o.offset)).toBeLessThan(1e-9);
  });

  it('chord offsets to an edge that kinks inside the span', () => {
    // Edge (20 at 100) → (23 at 250), then 23 to 400. Chord Ea (20, 100) → Eb (23, 400); outward
    // normal w = (300, −3)/n. Against the first leg: t(300 + 0.06)/n = 20 + 0.02(y − 100) − x; against
    // the second: t = n(23 − x)/300; the leg whose station range holds the foot is the answer.
    const b = flared(
      [
        { station: 100, offset: 20 },
        { station: 250, offset: 23 },
        { station: 400, offset: 23 },
      ],
      { chord_spaces: 10 },
    );
    const set = computeOffsetTable(b).chord_offsets.find((c) => c.side === 'right')!;
    const n = Math.hypot(300, 3);
    expect(set.chord_length).toBeCloseTo(n, 9);
    for (const o of set.offsets) {
      const f = o.i / 10;
      const x = 20 + 3 * f;
      const y = 100 + 300 * f;
      const t2 = (n * (23 - x)) / 300;
      const t1 = (n * (20 + 0.02 * (y - 100) - x)) / 300.06;
      const expected = y - (3 * t2) / n >= 250 ? t2 : t1;
      expect(o.offset).toBeCloseTo(expected, 9);
    }
    expect(set.offsets[5].offset).toBeGreaterThan(1.4);
  });

  it('curved layout: Ek at the girder point station, at the edge offset of that station; constant beyond the list', () => {
    const b = flared(
      [
        { station: 150, offset: 20 },
        { station: 350, offset: 24 },
      ],
      {
        girders: [
          { name: 'G1', layout: 'curved', offsets: [-16, -16] },
          { name: 'G3', layout: 'curved', offsets: [16, 16] },
        ],
      },
    );
    const e = (s: number) => (s <= 150 ? 20 : s >= 350 ? 24 : 20 + 0.02 * (s - 150));
    for (const p of computeOffsetTable(b).points.filter((q) => q.side === 'right')) {
      expect(p.edge_station).toBeCloseTo(p.station, 9);
      expect(p.edge_width).toBeCloseTo(e(p.station) - 16, 9);
    }
  });
});

describe('deflections (hand-worked point)', () => {
  const base = straightBridge({
    top_of_girder: [{ girder: 'G1', span: 1, point: 3, elevation: 99.9 }],
    deflections: [
      { girder: 'G1', span: 1, values: [0, 0.03, 0.04, 0.03, 0] },
      { girder: 'G2', span: 1, values: [0, 0.05] },
    ],
  });

  it('G1 point 3 of 10: deflection, form target, screed grade, buildup, drop from girder top', () => {
    // Station 130, offset −16 ft. PGL 101.30; top of deck 101.30 − 0.03 × 16 = 100.82; bottom of slab
    // 100.12. Fraction 0.3 = 1.2 table spaces of 0.25: d = 0.03 + 0.2 × (0.04 − 0.03) = 0.032.
    // Edge point (−20, 130): 101.30 − 0.03 × 18.5 = 100.745; edge bottom 99.995.
    // Form target 99.995 + 0.02 + 0.032 = 100.047; screed 100.852; buildup 100.12 + 0.032 − 99.90
    // = 0.252; drop from girder top 99.90 − 100.047 = −0.147 = edge drop 0.125 − 0.252 − 0.02.
    const p = computeOffsetTable(base).points.find((q) => q.girder === 'G1' && q.point === 3)!;
    expect(p.deflection).toBeCloseTo(0.032, 12);
    expect(p.top_of_deck).toBeCloseTo(100.82, 12);
    expect(p.edge_bottom).toBeCloseTo(99.995, 12);
    expect(p.form_target).toBeCloseTo(100.047, 12);
    expect(p.screed_grade).toBeCloseTo(100.852, 12);
    expect(p.buildup).toBeCloseTo(0.252, 12);
    expect(p.drop_from_girder_top).toBeCloseTo(-0.147, 12);
    expect(p.drop_from_girder_top!).toBeCloseTo(p.edge_drop! - p.buildup! - 0.02, 12);
  });

  it('table points land exactly; an interior girder carries its deflection into the screed grade; no entry is 0', () => {
    const t = computeOffsetTable(base);
    const g1 = t.points.filter((q) => q.girder === 'G1');
    expect([0, 2.5, 5, 7.5, 10].map((k) => g1.find((q) => q.point === k)?.deflection)).toEqual([0, undefined, 0.04, undefined, 0]);
    expect(g1.find((q) => q.point === 5)!.deflection).toBe(0.04);
    const g2 = t.points.find((q) => q.girder === 'G2' && q.point === 7)!;
    expect(g2.side).toBe('interior');
    expect(g2.deflection).toBeCloseTo(0.035, 12);
    expect(g2.screed_grade).toBeCloseTo(g2.top_of_deck + 0.035, 12);
    for (const q of t.points.filter((x) => x.girder === 'G3')) expect(q.deflection).toBe(0);
  });

  it('zero deflections give exactly the table without them', () => {
    const zero = straightBridge({ deflections: [{ girder: 'G1', span: 1, values: [0, 0, 0] }] });
    expect(computeOffsetTable(zero)).toEqual(computeOffsetTable(straightBridge()));
  });
});

describe('hostile inputs are refused naming the field', () => {
  const messages = (b: unknown) => {
    const r = parseBridge(b);
    if (r.ok) return '';
    return r.kind === 'schema'
      ? Object.entries(r.fields)
          .map(([k, v]) => `${k}: ${v.join('; ')}`)
          .join('\n')
      : r.issues.map((i) => `${i.path} | ${i.message}`).join('\n');
  };
  const withElements = (elements: unknown[]) => {
    const b = straightBridge();
    return { ...b, alignment: { ...b.alignment, elements } };
  };

  it('a spiral with both radii null, or equal radii', () => {
    expect(messages(withElements([{ type: 'spiral', length: 500, radius_start: null, radius_end: null, direction: 'left' }]))).toMatch(
      /alignment\.elements\.0\.radius_end: a spiral with both radii infinite/,
    );
    expect(messages(withElements([{ type: 'spiral', length: 500, radius_start: 900, radius_end: 900, direction: 'left' }]))).toMatch(/alignment\.elements\.0\.radius_end: a spiral with equal radii/);
  });

  it('a flare whose edges cross, even beyond the bents', () => {
    const b = straightBridge();
    const crossing = {
      ...b,
      deck: {
        ...b.deck,
        right_edge_offset: [
          { station: 100, offset: 20 },
          { station: 300, offset: -25 },
        ],
      },
    };
    expect(messages(crossing)).toMatch(/deck\.left_edge_offset \| .*touch or cross/);
    const beyond = {
      ...b,
      deck: {
        ...b.deck,
        left_edge_offset: [
          { station: 0, offset: 20 },
          { station: 50, offset: -20 },
        ],
      },
    };
    expect(messages(beyond)).toMatch(/touch or cross/);
  });

  it('deflection tables: one value, an unknown girder or span, a second entry, too many values', () => {
    const b = straightBridge();
    expect(messages({ ...b, deflections: [{ girder: 'G1', span: 1, values: [0.02] }] })).toMatch(/^deflections\.0\.values: /);
    const bad = messages({
      ...b,
      deflections: [
        { girder: 'G9', span: 1, values: [0, 0] },
        { girder: 'G1', span: 2, values: [0, 0] },
        { girder: 'G2', span: 1, values: [0, 1] },
        { girder: 'G2', span: 1, values: [0, 1] },
      ],
    });
    expect(bad).toMatch(/deflections\.0\.girder \| .*no girder named G9/);
    expect(bad).toMatch(/deflections\.1\.span \| .*span 2 does not exist/);
    expect(bad).toMatch(/deflections\.3 \| .*second deflection table for girder G2, span 1/);
    expect(messages({ ...b, deflections: [{ girder: 'G1', span: 1, values: new Array(202).fill(0) }] })).toMatch(/deflections\.0\.values: .*201/);
  });

  it('a cross slope of 0.8 (and 15 % itself is accepted)', () => {
    const b = straightBridge();
    expect(messages({ ...b, cross_slopes: [{ station: 0, left: 0.8, right: -0.02 }] })).toMatch(/cross_slopes\.0\.left \| cross_slopes\.0\.left: 0\.8 is steeper than 15 %; did you mean 0\.08\?/);
    expect(validateGeometry({ ...b, cross_slopes: [{ station: 0, left: 0.15, right: -0.15 }] })).toEqual([]);
  });

  it('a 25 ft barrier on a 22 ft half-deck reaches over the alignment; a gutter exactly on it is accepted', () => {
    const b = straightBridge();
    expect(messages({ ...b, deck: { ...b.deck, left_edge_offset: -22, right_edge_offset: 22, left_barrier_width: 25 } })).toMatch(/deck\.left_barrier_width \| .*reaches over the alignment/);
    const onIt = { ...b, girders: [{ name: 'G3', layout: 'chord' as const, offsets: [16, 16] }], deck: { ...b.deck, left_edge_offset: -20, left_barrier_width: 20 } };
    expect(messages(onIt)).not.toMatch(/reaches over/);
  });

  it('sizes no bridge reaches, before any work', () => {
    const b = straightBridge();
    expect(messages({ ...b, points_per_span: 201 })).toMatch(/^points_per_span: /);
    expect(messages({ ...b, chord_spaces: 201 })).toMatch(/^chord_spaces: /);
    expect(messages({ ...b, girders: Array.from({ length: 41 }, (_, i) => ({ name: `G${i}`, layout: 'chord', offsets: [0, 0] })) })).toMatch(/girders: 41 girders; at most 40/);
    expect(messages({ ...b, bents: Array.from({ length: 201 }, (_, i) => ({ name: `B${i}`, station: i, skew_deg: 0 })) })).toMatch(/bents: 201 bents/);
    expect(messages(withElements(Array.from({ length: 10001 }, () => ({ type: 'line', length: 1 }))))).toMatch(/alignment\.elements: 10001 alignment elements/);
  });

  it('a spiral that kinks against its arc is warned about, not refused', () => {
    const b = straightBridge();
    const els = (arcRadius: number) => [
      { type: 'spiral', length: 100, radius_start: null, radius_end: 800, direction: 'right' },
      { type: 'arc', length: 100, radius: arcRadius, direction: 'right' },
      { type: 'line', length: 400 },
    ];
    const kinked = { ...b, alignment: { ...b.alignment, elements: els(790) } } as BridgeDescription;
    const t = computeOffsetTable(kinked);
    expect(t.warnings?.[0].path).toBe('alignment.elements.0.radius_end');
    expect(computeOffsetTable({ ...kinked, alignment: { ...kinked.alignment, elements: els(800.5) } } as BridgeDescription).warnings).toBeUndefined();
  });
});
