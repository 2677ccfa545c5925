/**
 * The scene's mesh builders must put every vertex where the engine says: the expected positions are
 * worked out here from the engine's offset table rows and the frame's documented transform
 * (x = easting − originX, y = (elevation − refElevation) × exaggeration, z = −(northing − originY)),
 * never from the builder's own output. Tolerances account for float32 storage.
 */
import { describe, expect, it } from 'vitest';
import { bridgePoint, frameForTable } from '@/scene/builders/frame';
import { girderRuns, overhangRuns } from '@/scene/builders/runs';
import { buildGirderMesh, defaultGirderShape } from '@/scene/builders/girders';
import { buildAlignmentSegments, buildFormEdgeSegments, buildStringLineSegments, stringLineLift } from '@/scene/builders/lines';
import { buildDeckTop, buildDeckUnderside, buildEdgeBand } from '@/scene/builders/deck';
import { applyMatrix, writeBeamMatrix } from '@/scene/builders/instances';
import { buildBents } from '@/scene/builders/bents';
import { RAMP_STOPS } from '@/scene/builders/ramp';

import { TOL, desc, expected, expectNear, exteriorRows, model, table } from './builder-setup';

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
