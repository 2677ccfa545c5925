/**
 * The scene's mesh builders must put every vertex where the engine says: the expected positions are
 * worked out here from the engine's offset table rows and the frame's documented transform
 * (x = easting − originX, y = (elevation − refElevation) × exaggeration, z = −(northing − originY)),
 * never from the builder's own output. Tolerances account for float32 storage.
 */
import { describe, expect, it } from 'vitest';
import { computeOffsetTable, createBridgeModel, type OffsetPoint } from '@/lib/geometry';
import { fixtureBridge } from './fixture';
import { bridgePoint, frameForTable, type SceneFrame } from '@/scene/builders/frame';
import { girderRuns, overhangRuns } from '@/scene/builders/runs';
import { buildGirderMesh, defaultGirderShape } from '@/scene/builders/girders';
import { buildAlignmentSegments, buildFormEdgeSegments, buildStringLineSegments, stringLineLift } from '@/scene/builders/lines';
import { buildDeckTop, buildDeckUnderside, buildEdgeBand } from '@/scene/builders/deck';
import { buildBracketInstances, defaultBracketDims, placeBrackets } from '@/scene/builders/brackets';
import { applyMatrix, writeBeamMatrix } from '@/scene/builders/instances';
import { buildBents } from '@/scene/builders/bents';
import { RAMP_STOPS } from '@/scene/builders/ramp';

const desc = fixtureBridge('chord');
const table = computeOffsetTable(desc);
const model = createBridgeModel(desc);
// float32 keeps ~7 significant digits; scene coordinates stay under ~1000 units here.
const TOL = 2e-3;

function expected(f: SceneFrame, e: number, n: number, z: number): [number, number, number] {
  return [e - f.originX, (z - f.refElevation) * f.exaggeration, -(n - f.originY)];
}

function expectNear(actual: ArrayLike<number>, at: number, want: [number, number, number], tol = TOL) {
  for (let k = 0; k < 3; k++) expect(Math.abs(actual[at + k] - want[k])).toBeLessThan(tol);
}

const exteriorRows = (side: 'left' | 'right', span: number): OffsetPoint[] => table.points.filter((p) => p.side === side && p.span === span).sort((a, b) => a.point - b.point);

describe('scene frame', () => {
  it('puts the origin inside the bridge so float32 keeps hundredths of a foot', () => {
    const f = frameForTable(table);
    for (const p of table.points) {
      expect(Math.abs(p.x - f.originX)).toBeLessThan(500);
      expect(Math.abs(p.y - f.originY)).toBeLessThan(500);
      expect(p.bottom_of_slab - f.refElevation).toBeGreaterThanOrEqual(0);
    }
  });

  it('exaggeration scales elevations about the reference and is limited to 1×–50×', () => {
    expect(frameForTable(table, 200).exaggeration).toBeCloseTo(50, 12);
    expect(frameForTable(table, 0.2).exaggeration).toBeCloseTo(1, 12);
    const f = frameForTable(table, 10);
    const back = bridgePoint(f, 12, (420.5 - f.refElevation) * 10, -7);
    expect(back.elevation).toBeCloseTo(420.5, 9);
    expect(back.easting).toBeCloseTo(f.originX + 12, 9);
    expect(back.northing).toBeCloseTo(f.originY + 7, 9);
  });
});

describe('form edge line', () => {
  for (const ex of [1, 10]) {
    it(`has its vertices at (edge_x, edge_y, form_target) of every overhang row at ${ex}×`, () => {
      const f = frameForTable(table, ex);
      const seg = buildFormEdgeSegments(table, f);
      let o = 0;
      let count = 0;
      for (const side of ['left', 'right'] as const) {
        for (const span of [1, 2]) {
          const rows = exteriorRows(side, span);
          expect(rows.length).toBe(21);
          for (let i = 0; i + 1 < rows.length; i++) {
            expectNear(seg, o, expected(f, rows[i].edge_x!, rows[i].edge_y!, rows[i].form_target!));
            expectNear(seg, o + 3, expected(f, rows[i + 1].edge_x!, rows[i + 1].edge_y!, rows[i + 1].form_target!));
            o += 6;
            count++;
          }
        }
      }
      expect(seg.length).toBe(count * 6);
    });
  }
});

describe('girders', () => {
  it('runs one girder per span and girder line, rows in point order', () => {
    const runs = girderRuns(table);
    expect(runs.length).toBe(10);
    for (const r of runs) {
      expect(r.rows.length).toBe(21);
      r.rows.forEach((p, i) => expect(p.point).toBe(i));
    }
  });

  it('puts the top flange centre of each girder end on the girder point (top of girder or bottom of slab)', () => {
    const f = frameForTable(table, 1);
    const runs = girderRuns(table);
    const shape = defaultGirderShape('ft');
    const mesh = buildGirderMesh(runs, f, shape);
    // Layout: per run three swept boxes (flange, web, flange); each box has 8 vertices per row plus
    // 8 cap vertices. The first box's row i starts at vertex base + 8i; vertices 0 and 1 are the top
    // corners, so their midpoint is the girder centre.
    const perBox = 21 * 8 + 8;
    runs.forEach((run, r) => {
      const base = r * perBox * 3;
      for (const i of [0, run.rows.length - 1]) {
        const p = run.rows[i];
        const top = p.top_of_girder ?? p.bottom_of_slab;
        const v = (base + i * 8) * 3;
        const mid = [0, 1, 2].map((k) => (mesh.positions[v + k] + mesh.positions[v + 3 + k]) / 2);
        expectNear(mid, 0, expected(f, p.x, p.y, top));
        // Flange width is true size.
        const w = Math.hypot(mesh.positions[v] - mesh.positions[v + 3], mesh.positions[v + 2] - mesh.positions[v + 5]);
        expect(Math.abs(w - shape.flangeWidth)).toBeLessThan(TOL);
      }
    });
    // The girder is `depth` deep: the lowest vertex of a run's bottom flange is depth under its top.
    const firstRunTop = expected(f, runs[0].rows[0].x, runs[0].rows[0].y, runs[0].rows[0].top_of_girder ?? runs[0].rows[0].bottom_of_slab)[1];
    const bottomBox = 2 * perBox * 3;
    expect(Math.abs(mesh.positions[bottomBox + 3 * 3 + 1] - (firstRunTop - shape.depth))).toBeLessThan(TOL);
    for (const i of mesh.indices) expect(i).toBeLessThan(mesh.positions.length / 3);
  });

  it('uses the surveyed top of girder where there is one', () => {
    const surveyed = table.points.find((p) => p.top_of_girder !== null)!;
    expect(surveyed.top_of_girder).toBeCloseTo(413.9, 9);
    const f = frameForTable(table, 1);
    const runs = girderRuns(table);
    const r = runs.findIndex((run) => run.span === surveyed.span && run.girder === surveyed.girder);
    const mesh = buildGirderMesh(runs, f, defaultGirderShape('ft'));
    const v = (r * (21 * 8 + 8) + surveyed.point * 8) * 3;
    expect(Math.abs(mesh.positions[v + 1] - (413.9 - f.refElevation))).toBeLessThan(TOL);
  });
});

describe('string line', () => {
  it('runs from the exterior girder centre at point 0 to point n of each span', () => {
    const f = frameForTable(table, 5);
    const lift = stringLineLift('ft');
    const seg = buildStringLineSegments(table, f, lift);
    expect(seg.length).toBe(4 * 6);
    let o = 0;
    for (const side of ['left', 'right'] as const) {
      for (const span of [1, 2]) {
        const rows = exteriorRows(side, span);
        const a = rows[0];
        const b = rows[rows.length - 1];
        const ea = expected(f, a.x, a.y, a.top_of_girder ?? a.bottom_of_slab);
        const eb = expected(f, b.x, b.y, b.top_of_girder ?? b.bottom_of_slab);
        ea[1] += lift;
        eb[1] += lift;
        expectNear(seg, o, ea);
        expectNear(seg, o + 3, eb);
        o += 6;
      }
    }
  });
});

describe('alignment', () => {
  it('follows the alignment at the profile grade', () => {
    const f = frameForTable(table, 1);
    const seg = buildAlignmentSegments(desc, model, f, 0, 10);
    // First vertex at the first bent's station on the centreline; last at the last bent.
    const first = model.alignment.pointAt(1100);
    expectNear(seg, 0, expected(f, first.x, first.y, model.profile.elevationAt(1100)));
    const last = model.alignment.pointAt(1340);
    expectNear(seg, seg.length - 3, expected(f, last.x, last.y, model.profile.elevationAt(1340)));
  });
});

describe('deck', () => {
  it('top surface vertices lie on the engine deck surface', () => {
    const f = frameForTable(table, 1);
    const top = buildDeckTop(desc, model, f, 12);
    expect(top.positions.length).toBeGreaterThan(0);
    for (let v = 0; v < top.positions.length; v += 3 * 7) {
      const b = bridgePoint(f, top.positions[v], top.positions[v + 1], top.positions[v + 2]);
      // topOfDeckAt runs the inverse itself: an independent path to the same surface.
      expect(Math.abs(b.elevation - model.surface.topOfDeckAt(b.easting, b.northing))).toBeLessThan(5e-3);
      const so = model.alignment.stationOffset(b.easting, b.northing);
      expect(so.offset).toBeGreaterThan(desc.deck.left_edge_offset - 0.01);
      expect(so.offset).toBeLessThan(desc.deck.right_edge_offset + 0.01);
    }
  });

  it('overhang underside spans girder point at bottom of slab to edge point at edge bottom', () => {
    const f = frameForTable(table, 3);
    const under = buildDeckUnderside(table, f);
    const rows = exteriorRows('left', 1);
    for (const i of [0, 7, 20]) {
      expectNear(under.positions, i * 6, expected(f, rows[i].x, rows[i].y, rows[i].bottom_of_slab));
      expectNear(under.positions, i * 6 + 3, expected(f, rows[i].edge_x!, rows[i].edge_y!, rows[i].edge_bottom!));
    }
  });

  it('edge band colours the narrowest row with the ramp start and the widest with its end', () => {
    const f = frameForTable(table, 1);
    const band = buildEdgeBand(table, desc, f);
    const rows = overhangRuns(table).flatMap((r) => r.rows);
    const widths = rows.map((r) => r.edge_width!);
    const lo = Math.min(...widths);
    const hi = Math.max(...widths);
    const iLo = widths.indexOf(lo);
    const iHi = widths.indexOf(hi);
    for (let k = 0; k < 3; k++) {
      expect(band.colors[iLo * 12 + k]).toBeCloseTo(RAMP_STOPS[0][k], 5);
      expect(band.colors[iHi * 12 + k]).toBeCloseTo(RAMP_STOPS[RAMP_STOPS.length - 1][k], 5);
    }
    // The outside face runs from the edge bottom up by the edge thickness at the edge point.
    const r = rows[iLo];
    expectNear(band.positions, iLo * 12, expected(f, r.edge_x!, r.edge_y!, r.edge_bottom!));
    expectNear(band.positions, iLo * 12 + 3, expected(f, r.edge_x!, r.edge_y!, r.edge_bottom! + desc.deck.edge_thickness));
  });
});

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

describe('instance matrices', () => {
  it('stretch the unit cube between two points with the given width and height', () => {
    const m = new Float32Array(32);
    writeBeamMatrix(m, 1, 1, 2, 3, 11, 2, 3, 0.5, 2);
    expectNear(applyMatrix(m, 1, -0.5, 0, 0), 0, [1, 2, 3], 1e-6);
    expectNear(applyMatrix(m, 1, 0.5, 0, 0), 0, [11, 2, 3], 1e-6);
    const up = applyMatrix(m, 1, 0, 0.5, 0);
    expect(up[1] - 2).toBeCloseTo(1, 6);
    const side = applyMatrix(m, 1, 0, 0, 0.5);
    expect(Math.hypot(side[0] - 6, side[1] - 2, side[2] - 3)).toBeCloseTo(0.25, 6);
    writeBeamMatrix(m, 0, 0, 0, 0, 0, 5, 0, 1, 1);
    expectNear(applyMatrix(m, 0, 0.5, 0, 0), 0, [0, 5, 0], 1e-6);
  });
});

describe('bents', () => {
  it('one cap per bent under the girders, columns down to the ground', () => {
    const f = frameForTable(table, 1);
    const b = buildBents(desc, model, table, f, 6, 'ft');
    expect(b.caps.length).toBe(3 * 16);
    expect(b.columnCount).toBe(9);
    for (let i = 0; i < 3; i++) {
      const top = applyMatrix(b.caps, i, 0, 0.5, 0)[1];
      const tops = table.points.filter((p) => (p.span === i && p.point === 20) || (p.span === i + 1 && p.point === 0)).map((p) => (p.top_of_girder ?? p.bottom_of_slab) - f.refElevation - 6);
      expect(Math.abs(top - Math.min(...tops))).toBeLessThan(TOL);
      expect(applyMatrix(b.columns, i * 3, -0.5, 0, 0)[1]).toBeCloseTo(b.groundY, 3);
    }
  });
});
