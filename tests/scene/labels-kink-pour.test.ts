/**
 * The label layout, the corner-angle probe, the pour state and the flared deck lines, checked
 * against independent computations written here: brute-force rectangle overlap, the law of cosines,
 * the data contract's definitions worked by hand, and linear interpolation by hand.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boxesIntersect, labelBuffers, placeLabels, type ScreenBox } from '@/scene/builders/labels';
import { bentProbeIndices, screenTurnDeg } from '@/scene/builders/kink';
import { formEdgeY, girderTopY, prePourGirderTop } from '@/scene/builders/runs';
import { sectionLinesAt, outermostEdgeOffset } from '@/scene/builders/edges';
import { captionText, pictureFileName } from '@/scene/picture';
import { fixtureBridge } from './fixture';

function shownBoxes(buf: ReturnType<typeof labelBuffers>): ScreenBox[] {
  const out: ScreenBox[] = [];
  for (let i = 0; i < buf.count; i++) if (buf.shown[i]) out.push({ x: buf.boxes[i * 4], y: buf.boxes[i * 4 + 1], w: buf.boxes[i * 4 + 2], h: buf.boxes[i * 4 + 3] });
  return out;
}

describe('label layout', () => {
  it('never shows two overlapping labels, keeps every shown label inside the picture and clear of the picked point', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            x: fc.double({ min: -50, max: 450, noNaN: true }),
            y: fc.double({ min: -50, max: 350, noNaN: true }),
            d: fc.double({ min: 1, max: 1000, noNaN: true }),
            w: fc.integer({ min: 20, max: 160 }),
            front: fc.boolean(),
          }),
          { maxLength: 40 },
        ),
        fc.option(fc.record({ x: fc.double({ min: 0, max: 390, noNaN: true }), y: fc.double({ min: 0, max: 300, noNaN: true }) })),
        (labels, pick) => {
          const buf = labelBuffers(labels.length);
          labels.forEach((l, i) => {
            buf.anchors.set([l.x, l.y, l.d, l.front ? 1 : 0], i * 4);
            buf.sizes.set([l.w, 18], i * 2);
          });
          const avoid = pick ? { x: pick.x - 18, y: pick.y - 18, w: 36, h: 36 } : null;
          placeLabels(buf, 390, 300, avoid);
          const boxes = shownBoxes(buf);
          // Brute force, pair by pair, with the plain rectangle test (strict: touching is allowed).
          for (let a = 0; a < boxes.length; a++) {
            const A = boxes[a];
            expect(A.x).toBeGreaterThanOrEqual(0);
            expect(A.y).toBeGreaterThanOrEqual(0);
            expect(A.x + A.w).toBeLessThanOrEqual(390 + 1e-9);
            expect(A.y + A.h).toBeLessThanOrEqual(300 + 1e-9);
            if (avoid) expect(A.x >= avoid.x + avoid.w || avoid.x >= A.x + A.w || A.y >= avoid.y + avoid.h || avoid.y >= A.y + A.h).toBe(true);
            for (let b = a + 1; b < boxes.length; b++) {
              const B = boxes[b];
              expect(A.x >= B.x + B.w || B.x >= A.x + A.w || A.y >= B.y + B.h || B.y >= A.y + A.h).toBe(true);
            }
          }
          // Labels behind the camera never show.
          labels.forEach((l, i) => {
            if (!l.front) expect(buf.shown[i]).toBe(0);
          });
        },
      ),
      { numRuns: 300 },
    );
  });

  it('the nearer of two labels on the same spot wins; the farther folds above or hides', () => {
    const buf = labelBuffers(3);
    // Three labels anchored at one point: the middle one is nearest.
    for (let i = 0; i < 3; i++) {
      buf.anchors.set([200, 150, [50, 10, 30][i], 1], i * 4);
      buf.sizes.set([100, 20], i * 2);
    }
    placeLabels(buf, 400, 300, null);
    expect(buf.shown[1]).toBe(1);
    // Centred on its anchor.
    expect(buf.boxes[4]).toBeCloseTo(150, 9);
    expect(buf.boxes[5]).toBeCloseTo(140, 9);
    // The next nearest (index 2) folds above it.
    expect(buf.shown[2]).toBe(1);
    expect(buf.boxes[9] + 20).toBeLessThanOrEqual(140);
    expect(boxesIntersect({ x: buf.boxes[4], y: buf.boxes[5], w: 100, h: 20 }, { x: buf.boxes[8], y: buf.boxes[9], w: 100, h: 20 })).toBe(false);
  });
});

describe('corner angle on the screen', () => {
  it('matches the law of cosines on a hand-drawn corner', () => {
    // a→b along +x, then c→d at 30° from it: 3-4-5 and 1-√3-2 triangles worked by hand.
    expect(screenTurnDeg(0, 0, 10, 0, 10, 0, 10 + Math.sqrt(3), 1)).toBeCloseTo(30, 9);
    expect(screenTurnDeg(0, 0, 4, 3, 4, 3, 8, 6)).toBeCloseTo(0, 6);
    // Law of cosines: sides 3 and 4 at a right angle meet the hypotenuse 5.
    expect(screenTurnDeg(0, 0, 3, 0, 3, 0, 3, 4)).toBeCloseTo(90, 9);
    expect(Number.isNaN(screenTurnDeg(1, 1, 1, 1, 0, 0, 1, 0))).toBe(true);
  });

  it('picks the posts either side of the bent, a reach away', () => {
    const spans = [1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2];
    expect(bentProbeIndices(spans, 1, 2)).toEqual([3, 5, 6, 8]);
    expect(bentProbeIndices(spans, 2, 2)).toBeNull();
  });
});

describe('before and after the pour (data contract definitions, worked by hand)', () => {
  const frame = { refElevation: 100, exaggeration: 2 };
  // Bottom of slab 101.000, deflection 0.100 to come; form target = edge bottom 100.500 + settlement 0.020 + 0.100.
  const row = { top_of_girder: null, bottom_of_slab: 101, fraction: 0.5, deflection: 0.1, form_target: 100.62, edge_bottom: 100.5 };

  it('before the pour the girder top is the bottom of slab plus the deflection still to come', () => {
    expect(prePourGirderTop(row)).toBeCloseTo(101.1, 12);
    expect(girderTopY(row, frame, { pour: 0 })).toBeCloseTo((101.1 - 100) * 2, 12);
    expect(formEdgeY(row, frame, { pour: 0 })).toBeCloseTo((100.62 - 100) * 2, 12);
  });

  it('after the pour the girder is down by its deflection and the form at the edge bottom', () => {
    expect(girderTopY(row, frame, { pour: 1 })).toBeCloseTo((101 - 100) * 2, 12);
    expect(formEdgeY(row, frame, { pour: 1 })).toBeCloseTo((100.5 - 100) * 2, 12);
    // Halfway, halfway down.
    expect(girderTopY(row, frame, { pour: 0.5 })).toBeCloseTo((101.05 - 100) * 2, 12);
  });

  it('a magnified sag moves only the deflection, not the settlement', () => {
    const s = { pour: 0, deflectionScale: 40 };
    expect(girderTopY(row, frame, s)).toBeCloseTo((101 - 100) * 2 + 0.1 * 40, 12);
    expect(formEdgeY(row, frame, s)).toBeCloseTo((100.5 - 100) * 2 + 0.02 * 2 + 0.1 * 40, 12);
  });

  it('a surveyed top of girder is the pre-pour top', () => {
    expect(prePourGirderTop({ ...row, top_of_girder: 101.3 })).toBe(101.3);
    expect(girderTopY({ ...row, top_of_girder: 101.3 }, frame, { pour: 1 })).toBeCloseTo((101.2 - 100) * 2, 12);
  });
});

describe('flared deck lines', () => {
  const base = fixtureBridge('chord');
  const deck = {
    ...base.deck,
    right_edge_offset: [
      { station: 1100, offset: 23 },
      { station: 1300, offset: 31 },
    ],
  } as typeof base.deck;

  it('follow the flare linearly between its stations and hold it beyond them', () => {
    // Halfway: 23 + (31 − 23)/2 = 27; gutter 1.5 inside.
    expect(sectionLinesAt(deck, 1200)).toEqual([-23, -21.5, 0, 25.5, 27]);
    expect(sectionLinesAt(deck, 1000)[4]).toBe(23);
    expect(sectionLinesAt(deck, 1400)[4]).toBe(31);
    expect(outermostEdgeOffset(deck, 'right')).toBe(31);
    expect(outermostEdgeOffset(deck, 'left')).toBe(-23);
  });
});

describe('picture caption', () => {
  it('names the bridge, revision, view, exaggeration and date', () => {
    const c = { bridge: 'Fixture Curve Bridge', revision: 3, view: 'Along the edge', exaggeration: 8, date: new Date(2026, 11, 2) };
    expect(captionText(c)).toBe('Fixture Curve Bridge · revision 3 · Along the edge · heights ×8 · 2026-12-02');
    expect(captionText({ ...c, exaggeration: 1, revision: null })).toBe('Fixture Curve Bridge · Along the edge · true scale · 2026-12-02');
    expect(pictureFileName(c)).toBe('fixture-curve-bridge-r3-along-the-edge.png');
  });
});
