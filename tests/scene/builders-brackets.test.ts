/**
 * The scene's mesh builders must put every vertex where the engine says: the expected positions are
 * worked out here from the engine's offset table rows and the frame's documented transform
 * (x = easting − originX, y = (elevation − refElevation) × exaggeration, z = −(northing − originY)),
 * never from the builder's own output. Tolerances account for float32 storage.
 */
import { describe, expect, it } from 'vitest';
import { type OffsetPoint } from '@/lib/geometry';
import { frameForTable } from '@/scene/builders/frame';
import { buildBracketInstances, defaultBracketDims, placeBrackets } from '@/scene/builders/brackets';
import { applyMatrix } from '@/scene/builders/instances';

import { TOL, expected, expectNear, exteriorRows, table } from './builder-setup';

describe('brackets', () => {
  const girderLength = (rows: OffsetPoint[]) => {
    let L = 0;
    for (let i = 1; i < rows.length; i++) L += Math.hypot(rows[i].x - rows[i - 1].x, rows[i].y - rows[i - 1].y);
    return L;
  };

  it('spaces brackets evenly along each exterior girder, centred in the span', () => {
    const spacing = 4;
    const placements = placeBrackets(table, spacing);
    for (const side of ['left', 'right'] as const) {
      for (const span of [1, 2]) {
        const rows = exteriorRows(side, span);
        const L = girderLength(rows);
        const mine = placements.filter((p) => p.side === side && p.span === span);
        expect(mine.length).toBe(Math.floor(L / spacing) + 1);
        expect(Math.abs(mine[0].distance - (L - mine[mine.length - 1].distance))).toBeLessThan(1e-9);
        for (let i = 1; i < mine.length; i++) expect(Math.abs(mine[i].distance - mine[i - 1].distance - spacing)).toBeLessThan(1e-9);
      }
    }
  });

  it('a bracket that falls on a girder point carries that point’s edge width and form target', () => {
    const rows = exteriorRows('right', 2);
    const L = girderLength(rows);
    // Spacing of one twentieth point: the brackets land on the girder points.
    const placements = placeBrackets(table, L / 20).filter((p) => p.side === 'right' && p.span === 2);
    expect(placements.length).toBe(21);
    placements.forEach((p, i) => {
      expect(Math.abs(p.edgeWidth - rows[i].edge_width!)).toBeLessThan(1e-6);
      expect(Math.abs(p.formTarget - rows[i].form_target!)).toBeLessThan(1e-6);
      expect(Math.abs(p.girderX - rows[i].x)).toBeLessThan(1e-6);
      expect(Math.abs(p.edgeY - rows[i].edge_y!)).toBeLessThan(1e-6);
    });
  });

  it('arms are one length per span, square to the girder, a fixed depth under the girder top; jacks reach the form; posts stand on the arm ends', () => {
    const f = frameForTable(table, 1);
    const placements = placeBrackets(table, 4);
    const dims = defaultBracketDims('ft', 6);
    const inst = buildBracketInstances(placements, f, dims);
    expect(inst.count).toBe(placements.length);
    // Expected from the engine's rows: the widest edge width of the run is the arm's reach, plus the walkway.
    const widest = (side: 'left' | 'right', span: number) => Math.max(...exteriorRows(side, span).map((r) => r.edge_width!));
    for (const side of ['left', 'right'] as const) {
      const mine = placements.filter((p) => p.side === side);
      // Arm half depth plus a jack at least one member long under the form (common practice: a screw jack is always there).
      const hang = Math.max(...mine.map((p) => p.topOfGirder - p.formTarget)) + dims.formDepth + dims.member * 1.5;
      expect(Math.abs(inst.hang[side] - hang)).toBeLessThan(1e-9);
    }
    for (const i of [0, 5, placements.length - 1]) {
      const p = placements[i];
      const ux = (p.edgeX - p.girderX) / p.edgeWidth;
      const uy = (p.edgeY - p.girderY) / p.edgeWidth;
      const reach = widest(p.side, p.span) + dims.walkway;
      const end = expected(f, p.girderX + ux * reach, p.girderY + uy * reach, p.topOfGirder - inst.hang[p.side]);
      expectNear(inst.armEnds, i * 3, end);
      expectNear(applyMatrix(inst.arms, i, 0.5, 0, 0), 0, end);
      // The jack stands at the edge point and its head carries the form's bottom at the form target.
      const head = applyMatrix(inst.jacks, i, 0.5, 0, 0);
      expectNear(head, 0, expected(f, p.edgeX, p.edgeY, p.formTarget - dims.formDepth));
      // Posts are vertical (length axis is x of the unit cube), postHeight tall, on the arm end.
      const pa = applyMatrix(inst.posts, i, -0.5, 0, 0);
      const pb = applyMatrix(inst.posts, i, 0.5, 0, 0);
      expectNear(pa, 0, end);
      expect(Math.abs(pb[1] - pa[1] - dims.postHeight)).toBeLessThan(TOL);
    }
    // One rail piece between each pair of neighbouring posts on a side.
    const left = placements.filter((p) => p.side === 'left').length;
    const right = placements.filter((p) => p.side === 'right').length;
    expect(inst.railCount).toBe(left - 1 + right - 1);
  });

  it('the handrail is straight along each chord and turns at the bent by the angle between the chords', () => {
    const f = frameForTable(table, 1);
    const placements = placeBrackets(table, 4);
    const inst = buildBracketInstances(placements, f, defaultBracketDims('ft', 6));
    const side = 'left';
    const tops = (span: number) =>
      placements
        .map((p, i) => ({ p, i }))
        .filter(({ p }) => p.side === side && p.span === span)
        .map(({ i }) => [inst.postTops[i * 3], inst.postTops[i * 3 + 2]]);
    const dir = (pts: number[][]) => Math.atan2(pts[pts.length - 1][1] - pts[0][1], pts[pts.length - 1][0] - pts[0][0]);
    for (const span of [1, 2]) {
      const pts = tops(span);
      const a = dir(pts);
      // Every post of the span on one straight line (plan), within float32 noise.
      for (const q of pts) {
        const cross = (q[0] - pts[0][0]) * Math.sin(a) - (q[1] - pts[0][1]) * Math.cos(a);
        expect(Math.abs(cross)).toBeLessThan(TOL);
      }
    }
    // The chords' turn at bent 2 from the engine's girder points (scene z is −northing).
    const chord = (span: number) => {
      const r = exteriorRows(side, span);
      return Math.atan2(-(r[r.length - 1].y - r[0].y), r[r.length - 1].x - r[0].x);
    };
    const turn = Math.abs(chord(2) - chord(1));
    expect(turn).toBeGreaterThan(0.05);
    expect(Math.abs(Math.abs(dir(tops(2)) - dir(tops(1))) - turn)).toBeLessThan(1e-4);
  });
});
