import { describe, it, expect } from 'vitest';
import { computeOffsetTable, type OffsetPoint } from '@/lib/geometry';
import { arcBridge, straightBridge } from './helpers';

const TOL = 1e-9;

function rows(points: OffsetPoint[], side: 'left' | 'right', span = 1) {
  return points.filter((p) => p.side === side && p.span === span);
}

describe('straight square bridge (hand-checkable)', () => {
  const bridge = straightBridge();
  const table = computeOffsetTable(bridge);

  it('edge width is the girder-to-edge offset difference', () => {
    // Plane geometry: girder at 16 ft, edge at 20 ft, both square to a straight road.
    for (const p of [...rows(table.points, 'left'), ...rows(table.points, 'right')]) {
      expect(Math.abs((p.edge_width ?? NaN) - 4)).toBeLessThan(TOL);
      expect(Math.abs((p.edge_station ?? NaN) - p.station)).toBeLessThan(TOL);
    }
  });

  it('edge drop = fall of the deck top to the gutter line + edge thickness − slab thickness', () => {
    // domain.md "What the crew must set", item 2, walks from the bottom of slab up the slab thickness,
    // across the cross slope to the gutter, level under the barrier, down the edge thickness; the data
    // contract's edge drop (bottom of slab − edge bottom, positive when the edge is lower) is the
    // negative of that walk. Slope −0.03 falls outward; gutter 18.5 ft, girder 16 ft.
    const expected = 0.03 * (18.5 - 16) + 0.75 - 0.7;
    for (const p of [...rows(table.points, 'left'), ...rows(table.points, 'right')]) {
      expect(Math.abs((p.edge_drop ?? NaN) - expected)).toBeLessThan(TOL);
    }
  });

  it('sets the form 0.02 ft high when the allowance is omitted', () => {
    // Form settlement allowance 0.02 ft: common practice (domain.md).
    for (const p of rows(table.points, 'left')) {
      expect(Math.abs((p.form_target ?? NaN) - ((p.edge_bottom ?? NaN) + 0.02))).toBeLessThan(TOL);
    }
    const metric = computeOffsetTable({ ...bridge, units: 'm' });
    // 5 mm in metric work: common practice (domain.md).
    for (const p of rows(metric.points, 'right')) {
      expect(Math.abs((p.form_target ?? NaN) - ((p.edge_bottom ?? NaN) + 0.005))).toBeLessThan(TOL);
    }
  });

  it('top of deck follows the grade line and cross slope; interior rows carry no overhang', () => {
    // Profile 100 → 105 over 500 ft (1 %); crown −0.03 each way, 16 ft out.
    for (const p of table.points) {
      const expected = 100 + 0.01 * p.station - 0.03 * Math.abs(p.offset);
      expect(Math.abs(p.top_of_deck - expected)).toBeLessThan(TOL);
      expect(Math.abs(p.bottom_of_slab - (expected - 0.7))).toBeLessThan(TOL);
    }
    const interior = table.points.filter((p) => p.side === 'interior');
    expect(interior).toHaveLength(11);
    for (const p of interior) {
      expect(p.edge_width).toBeNull();
      expect(p.edge_drop).toBeNull();
      expect(p.form_target).toBeNull();
    }
  });

  it('level under the barrier: a girder outside the gutter line sees no slope to the edge', () => {
    // Data contract: top of deck is level from the gutter line to the edge.
    const t = computeOffsetTable(
      straightBridge({
        girders: [
          { name: 'G1', layout: 'chord', offsets: [-19, -19] },
          { name: 'G2', layout: 'chord', offsets: [19, 19] },
        ],
      }),
    );
    for (const p of t.points) expect(Math.abs((p.edge_drop ?? NaN) - (0.75 - 0.7))).toBeLessThan(TOL);
  });

  it('buildup and the level-bar reading come from the surveyed top of girder', () => {
    // domain.md item 4: reading = edge drop − buildup − settlement allowance.
    const t = computeOffsetTable(straightBridge({ top_of_girder: [{ girder: 'G1', span: 1, point: 5, elevation: 99.9 }] }));
    const p = t.points.find((q) => q.girder === 'G1' && q.point === 5) as OffsetPoint;
    expect(Math.abs((p.buildup ?? NaN) - (p.bottom_of_slab - 99.9))).toBeLessThan(TOL);
    expect(Math.abs((p.drop_from_girder_top ?? NaN) - ((p.edge_drop ?? NaN) - (p.buildup ?? NaN) - 0.02))).toBeLessThan(TOL);
    const other = t.points.find((q) => q.girder === 'G1' && q.point === 4) as OffsetPoint;
    expect(other.buildup).toBeNull();
  });

  it('a lone girder faces both edges, one row per side', () => {
    const t = computeOffsetTable(straightBridge({ girders: [{ name: 'G1', layout: 'chord', offsets: [2, 2] }] }));
    expect(t.points.filter((p) => p.side === 'left')).toHaveLength(11);
    expect(t.points.filter((p) => p.side === 'right')).toHaveLength(11);
    expect(Math.abs((t.points.find((p) => p.side === 'left')?.edge_width ?? NaN) - 22)).toBeLessThan(TOL);
    expect(Math.abs((t.points.find((p) => p.side === 'right')?.edge_width ?? NaN) - 18)).toBeLessThan(TOL);
  });

  it('a tie at the first bent goes to the girder listed first, on either side', () => {
    // Data contract: exterior girders by offset at the first bent; on a tie, the first listed (the
    // result of a minimum or maximum search that keeps the first it finds; common practice).
    const g = (name: string, a: number, b: number) => ({ name, layout: 'chord' as const, offsets: [a, b] });
    const t = computeOffsetTable(straightBridge({ girders: [g('G1', 6, 6), g('G2', -12, -14), g('G3', 12, 14), g('G4', -12, -10), g('G5', 12, 10)] }));
    const facing = (side: 'left' | 'right') => [...new Set(t.points.filter((p) => p.side === side).map((p) => p.girder))];
    expect(facing('left')).toEqual(['G2']);
    expect(facing('right')).toEqual(['G3']);
    const same = computeOffsetTable(straightBridge({ girders: [g('G1', 3, 3), g('G2', 3, 3)] }));
    expect([...new Set(same.points.filter((p) => p.side !== 'interior').map((p) => p.girder))]).toEqual(['G1']);
  });

  it('orders points by span, then girder in input order, then point', () => {
    const t = computeOffsetTable(
      straightBridge({
        bents: [
          { name: 'A', station: 100, skew_deg: 0 },
          { name: 'B', station: 200, skew_deg: 0 },
          { name: 'C', station: 300, skew_deg: 0 },
        ],
        girders: [
          { name: 'G1', layout: 'chord', offsets: [-16, -16, -16] },
          { name: 'G2', layout: 'chord', offsets: [16, 16, 16] },
        ],
      }),
    );
    const keys = t.points.map((p) => `${p.span}-${p.girder}-${String(p.point).padStart(2, '0')}`);
    expect(keys.slice(0, 11).every((k) => k.startsWith('1-G1'))).toBe(true);
    expect(keys[11]).toBe('1-G2-00');
    expect(keys[22]).toBe('2-G1-00');
    expect(t.points[21].point).toBe(10);
  });

  it('skewed bents on a straight road: edge width still square to the girder', () => {
    // Parallel lines stay 4 ft apart whatever the skew; the edge point slides along the skew.
    const t = computeOffsetTable(
      straightBridge({
        bents: [
          { name: 'A', station: 100, skew_deg: 30 },
          { name: 'B', station: 200, skew_deg: -20 },
        ],
      }),
    );
    for (const p of t.points.filter((q) => q.side !== 'interior')) expect(Math.abs((p.edge_width ?? NaN) - 4)).toBeLessThan(TOL);
    const g3 = t.points.find((p) => p.girder === 'G3' && p.point === 0) as OffsetPoint;
    expect(g3.station).toBeCloseTo(100 + 16 * Math.tan(Math.PI / 6), 9);
  });
});

describe('chorded girders on a curve', () => {
  it('outside overhang widest and inside narrowest at midspan', () => {
    // domain.md "The geometry": with straight girders the outside overhang is widest at midspan,
    // the inside one narrowest.
    const t = computeOffsetTable(arcBridge({ radius: 800, direction: 'right', spans: [100], n: 20 }));
    const left = rows(t.points, 'left').map((p) => p.edge_width as number);
    const right = rows(t.points, 'right').map((p) => p.edge_width as number);
    expect(left.indexOf(Math.max(...left))).toBe(10);
    expect(right.indexOf(Math.min(...right))).toBe(10);
    // The chord's middle ordinate c²/(8R) is the swing, roughly (from memory of precast manuals).
    expect(Math.abs(left[10] - left[0] - 100 ** 2 / (8 * 800))).toBeLessThan(0.05);
  });

  it('the same on a curve to the left (sides swap)', () => {
    const t = computeOffsetTable(arcBridge({ radius: 800, direction: 'left', spans: [100], n: 20 }));
    const left = rows(t.points, 'left').map((p) => p.edge_width as number);
    const right = rows(t.points, 'right').map((p) => p.edge_width as number);
    expect(right.indexOf(Math.max(...right))).toBe(10);
    expect(left.indexOf(Math.min(...left))).toBe(10);
  });

  it('curved girders keep a constant overhang', () => {
    const t = computeOffsetTable(arcBridge({ radius: 800, direction: 'right', spans: [120, 120], layout: 'curved', skews: [0, 15, -10] }));
    for (const p of t.points) expect(Math.abs((p.edge_width ?? NaN) - 3.5)).toBeLessThan(1e-9);
    for (const s of t.span_summaries) expect(s.fastest_change).toBeNull();
  });

  it('curved layout interpolates station and offset between the bent-line points', () => {
    // Data contract: "curved": station and offset interpolated linearly between Pa's and Pb's; the
    // edge point lies along the alignment normal, so the width is the offset difference.
    const b = arcBridge({ radius: 700, direction: 'left', spans: [140], skews: [20, -15], layout: 'curved', girderOffsets: [-16, 14] });
    b.girders[0].offsets = [-16, -14.5];
    const t = computeOffsetTable(b);
    const left = rows(t.points, 'left');
    const pa = left[0];
    const pb = left[left.length - 1];
    expect(pa.offset).toBeCloseTo(-16, 9);
    expect(pb.offset).toBeCloseTo(-14.5, 9);
    // The 20° skew puts the left end of bent 1 down-station of the bent's station.
    expect(pa.station).toBeLessThan(b.bents[0].station);
    for (const p of left) {
      expect(Math.abs(p.station - (pa.station + p.fraction * (pb.station - pa.station)))).toBeLessThan(1e-9);
      expect(Math.abs(p.offset - (-16 + p.fraction * 1.5))).toBeLessThan(1e-9);
      expect(Math.abs((p.edge_width as number) - (p.offset + 20))).toBeLessThan(1e-9);
      expect(Math.abs((p.edge_station as number) - p.station)).toBeLessThan(1e-9);
    }
  });

  it('chord of 100 ft on R = 500 ft: middle ordinate 2.5063 ft', () => {
    // domain.md published check values (computed): exact 2.5063 ft, approximation c²/8R = 2.500 ft.
    // Outside edge of a 480 ft curve to the right, 20 ft out, is a 500 ft arc; bents square, placed so
    // that the edge chord between them is 100 ft.
    const edgeAngle = 2 * Math.asin(100 / (2 * 500));
    const t = computeOffsetTable(arcBridge({ radius: 480, direction: 'right', spans: [480 * edgeAngle], edge: 20 }));
    const left = t.chord_offsets.find((c) => c.side === 'left');
    expect(Math.abs((left?.chord_length ?? NaN) - 100)).toBeLessThan(1e-9);
    expect(Math.abs((left?.offsets[10].offset ?? NaN) - 2.5063)).toBeLessThan(0.00005);
    const summary = t.span_summaries.find((s) => s.side === 'left');
    expect(Math.abs((summary?.middle_ordinate ?? NaN) - 2.5063)).toBeLessThan(0.00005);
    // The inside edge bows toward the alignment: negative chord offsets.
    const right = t.chord_offsets.find((c) => c.side === 'right');
    expect(right?.offsets[10].offset).toBeLessThan(0);
    expect(Math.abs(left?.offsets[0].offset ?? NaN)).toBeLessThan(1e-9);
    expect(Math.abs(left?.offsets[20].offset ?? NaN)).toBeLessThan(1e-9);
    expect(Math.abs((left?.offsets[20].distance ?? NaN) - 100)).toBeLessThan(1e-9);
  });
});
