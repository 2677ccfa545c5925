/**
 * Random bridges checked against an independent geometry library (@flatten-js/core): the engine's
 * edge points must lie on the edge arc, square to the girder at the reported width, and chord offsets
 * must be the distances between chord and edge arc that flatten measures.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { Arc, Circle, Line, Point, Segment } from '@flatten-js/core';
import { computeOffsetTable, createAlignment } from '@/lib/geometry';
import { arcBridge } from './helpers';

const TOL = 1e-7;

const bridgeArb = fc.record({
  radius: fc.double({ min: 300, max: 3000, noNaN: true }),
  direction: fc.constantFrom('left' as const, 'right' as const),
  // Spans as a share of the radius so the chord's swing stays a few feet, as on a real deck.
  spanShares: fc.array(fc.double({ min: 0.04, max: 0.2, noNaN: true }), { minLength: 1, maxLength: 3 }),
  skews: fc.array(fc.double({ min: -20, max: 20, noNaN: true }), { minLength: 4, maxLength: 4 }),
  layout: fc.constantFrom('chord' as const, 'curved' as const),
  edge: fc.double({ min: 15, max: 30, noNaN: true }),
  overhang: fc.double({ min: 2.5, max: 5, noNaN: true }),
});

/** A buildable random bridge: girders far enough inside both edges for the chord's swing and skew. */
function randomBridge(b: { radius: number; direction: 'left' | 'right'; spanShares: number[]; skews: number[]; layout: 'chord' | 'curved'; edge: number; overhang: number }, n: number, m: number) {
  // At least 60 ft so that skewed bent lines never nearly meet at an edge (a chord of a few
  // thousandths of a foot is below flatten's angular tolerance).
  const spans = b.spanShares.map((f) => Math.min(160, Math.max(60, f * b.radius)));
  const longest = Math.max(...spans) * 1.3;
  const swing = b.layout === 'chord' ? (longest * longest) / (4 * b.radius) : 0;
  const inset = b.overhang + swing;
  return arcBridge({ radius: b.radius, direction: b.direction, spans, skews: b.skews, layout: b.layout, edge: b.edge + swing, girderOffsets: [-b.edge - swing + inset, b.edge + swing - inset], n, m });
}

/** Circle of the edge line: concentric with the alignment's arc, radius R ∓ edge offset. */
function edgeCircle(bridge: ReturnType<typeof arcBridge>, side: 'left' | 'right') {
  const al = createAlignment(bridge.alignment);
  const arc = bridge.alignment.elements[1] as { radius: number; direction: 'left' | 'right' };
  const pc = al.pointAt(bridge.alignment.start_station + bridge.alignment.elements[0].length);
  // Centre from the engine's PC and bearing is the one input taken from the engine; the radius is not.
  const turn = arc.direction === 'right' ? 1 : -1;
  const centre = new Point(pc.x + turn * arc.radius * Math.cos(pc.bearing), pc.y - turn * arc.radius * Math.sin(pc.bearing));
  const edgeOffset = side === 'left' ? bridge.deck.left_edge_offset : bridge.deck.right_edge_offset;
  // A right turn has its centre on the right: offsets to the right shorten the radius.
  const radius = arc.radius - turn * edgeOffset;
  return { centre, radius, circle: new Circle(centre, radius), turn };
}

describe('overhang and chord offsets against @flatten-js/core (property)', () => {
  it('edge points lie on the edge arc, square to the girder, at the reported width', () => {
    fc.assert(
      fc.property(bridgeArb, (b) => {
        const bridge = randomBridge(b, 8, 8);
        const table = computeOffsetTable(bridge);
        for (const side of ['left', 'right'] as const) {
          const { circle } = edgeCircle(bridge, side);
          const rows = table.points.filter((p) => p.side === side);
          for (const span of new Set(rows.map((r) => r.span))) {
            const spanRows = rows.filter((r) => r.span === span);
            const pa = new Point(spanRows[0].x, spanRows[0].y);
            const pb = new Point(spanRows[spanRows.length - 1].x, spanRows[spanRows.length - 1].y);
            for (const p of spanRows) {
              const pk = new Point(p.x, p.y);
              const ek = new Point(p.edge_x as number, p.edge_y as number);
              // Ek on the edge arc.
              expect(ek.distanceTo(circle)[0]).toBeLessThan(TOL);
              // |Pk Ek| is the width.
              expect(Math.abs(pk.distanceTo(ek)[0] - (p.edge_width as number))).toBeLessThan(TOL);
              if (bridge.girders[0].layout === 'chord') {
                // Pk on the chord Pa–Pb, and Ek square to it: its distance to the girder line is the width.
                expect(pk.distanceTo(new Segment(pa, pb))[0]).toBeLessThan(TOL);
                expect(Math.abs(ek.distanceTo(new Line(pa, pb))[0] - (p.edge_width as number))).toBeLessThan(TOL);
              } else {
                // Curved girders are concentric: the width is the nearest distance to the edge arc.
                expect(Math.abs(pk.distanceTo(circle)[0] - (p.edge_width as number))).toBeLessThan(TOL);
              }
            }
          }
        }
      }),
      { numRuns: 60 },
    );
  });

  it('chord offsets are the chord-to-arc distances and the middle ordinate is R(1 − cos(Δ/2))', () => {
    fc.assert(
      fc.property(bridgeArb, (b) => {
        const bridge = randomBridge(b, 10, 10);
        const table = computeOffsetTable(bridge);
        for (const set of table.chord_offsets) {
          const { centre, radius, turn } = edgeCircle(bridge, set.side);
          const ea = set.offsets[0];
          const eb = set.offsets[set.spaces];
          expect(Math.abs(ea.offset)).toBeLessThan(TOL);
          expect(Math.abs(eb.offset)).toBeLessThan(TOL);
          // Rebuild Ea and Eb from the circle: both ends lie on it, chord_length apart.
          const bents = bridge.bents;
          const rows = table.points.filter((p) => p.span === set.span && p.side === set.side);
          expect(rows.length).toBeGreaterThan(0);
          const al = createAlignment(bridge.alignment);
          const edge = new Circle(centre, radius);
          const a = edgeOnBent(al, bents[set.span - 1], edge);
          const c = edgeOnBent(al, bents[set.span], edge);
          const A = new Point(a.x, a.y);
          const B = new Point(c.x, c.y);
          expect(Math.abs(A.distanceTo(B)[0] - set.chord_length)).toBeLessThan(TOL);
          // flatten's arc from Ea to Eb in the direction of travel (clockwise for a right turn).
          const angA = Math.atan2(A.y - centre.y, A.x - centre.x);
          const angB = Math.atan2(B.y - centre.y, B.x - centre.x);
          const edgeArc = new Arc(centre, radius, angA, angB, turn < 0);
          const chord = new Segment(A, B);
          // The edge bows away from the centre: outward (positive) on the outside of the curve.
          const outwardSign = set.side === 'left' ? turn : -turn;
          for (const o of set.offsets) {
            const f = o.distance / set.chord_length;
            const q = new Point(A.x + f * (B.x - A.x), A.y + f * (B.y - A.y));
            // The offset is measured square to the chord, which matches flatten's nearest distance to
            // the arc only at the middle; so check the point it reaches: on the arc, |offset| from the chord.
            const dir = { x: (B.x - A.x) / set.chord_length, y: (B.y - A.y) / set.chord_length };
            const out = set.side === 'left' ? { x: -dir.y, y: dir.x } : { x: dir.y, y: -dir.x };
            const onEdge = new Point(q.x + o.offset * out.x, q.y + o.offset * out.y);
            expect(onEdge.distanceTo(edgeArc)[0]).toBeLessThan(TOL);
            expect(Math.abs(onEdge.distanceTo(chord)[0] - Math.abs(o.offset))).toBeLessThan(TOL);
            if (o.i > 0 && o.i < set.spaces) expect(Math.sign(o.offset)).toBe(outwardSign);
          }
          // Middle ordinate: flatten's distance from the chord midpoint to the arc, and Schofield &
          // Breach §10.1, M = R(1 − cos(Δ/2)) with Δ the central angle of the chord.
          const mid = new Point((A.x + B.x) / 2, (A.y + B.y) / 2);
          const delta = 2 * Math.asin(set.chord_length / (2 * radius));
          const summary = table.span_summaries.find((s) => s.span === set.span && s.side === set.side);
          expect(Math.abs(Math.abs(summary?.middle_ordinate ?? NaN) - mid.distanceTo(edgeArc)[0])).toBeLessThan(TOL);
          expect(Math.abs(Math.abs(summary?.middle_ordinate ?? NaN) - radius * (1 - Math.cos(delta / 2)))).toBeLessThan(TOL);
        }
      }),
      { numRuns: 60 },
    );
  });
});

/**
 * Edge point on a bent line, found independently of the engine's solver: flatten intersects the
 * straight bent line with the edge circle; the crossing nearer the alignment is the one on the deck.
 */
function edgeOnBent(al: ReturnType<typeof createAlignment>, bent: { station: number; skew_deg: number }, circle: Circle): { x: number; y: number } {
  const base = al.pointAt(bent.station);
  const lineBearing = base.bearing + Math.PI / 2 - (bent.skew_deg * Math.PI) / 180;
  const p0 = new Point(base.x, base.y);
  const line = new Line(p0, new Point(base.x + Math.sin(lineBearing), base.y + Math.cos(lineBearing)));
  const hits = line.intersect(circle);
  hits.sort((a, b) => a.distanceTo(p0)[0] - b.distanceTo(p0)[0]);
  return { x: hits[0].x, y: hits[0].y };
}
