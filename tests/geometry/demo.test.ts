import { describe, it, expect } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { bridgeDescriptionSchema, computeOffsetTable, offsetTableToCsv, validateGeometry } from '@/lib/geometry';

describe('demo bridges', () => {
  it('are three, pass the schema and compute without geometry issues', () => {
    expect(demoBridges).toHaveLength(3);
    for (const b of demoBridges) {
      expect(bridgeDescriptionSchema.safeParse(b).success).toBe(true);
      expect(validateGeometry(b)).toEqual([]);
    }
  });

  it('have overhangs a real deck would have (about 2.5 to 4.5 ft)', () => {
    // Common practice: overhangs of roughly 2.5–4.5 ft from the exterior girder line.
    for (const b of demoBridges) {
      const t = computeOffsetTable(b);
      for (const p of t.points.filter((q) => q.side !== 'interior')) {
        expect(p.edge_width as number).toBeGreaterThan(2.5);
        expect(p.edge_width as number).toBeLessThan(4.5);
      }
    }
  });

  it('the precast bridge shows the chord effect; the steel one keeps a constant overhang', () => {
    const [precast, steel] = demoBridges.map((b) => computeOffsetTable(b));
    expect(demoBridges[0].girders.every((g) => g.layout === 'chord')).toBe(true);
    expect(demoBridges[0].girders).toHaveLength(5);
    expect(demoBridges[0].bents).toHaveLength(4);
    for (const s of precast.span_summaries) expect(s.max_edge_width - s.min_edge_width).toBeGreaterThan(0.5);
    expect(demoBridges[1].girders.every((g) => g.layout === 'curved')).toBe(true);
    for (const s of steel.span_summaries) expect(s.max_edge_width - s.min_edge_width).toBeLessThan(1e-9);
    // Surveyed tops of girder give buildups on span 1 of the precast bridge.
    expect(precast.points.filter((p) => p.buildup !== null && p.side !== 'interior').length).toBeGreaterThanOrEqual(4);
  });

  it('the ramp shows a spiral, a flared edge and deflections in its targets', () => {
    const ramp = demoBridges[2];
    const els = ramp.alignment.elements;
    expect(els.map((e) => e.type)).toEqual(['line', 'spiral', 'arc', 'spiral', 'line']);
    // Its first two bents lie inside the entry spiral (stations 3120 to 3320).
    expect(ramp.bents.filter((b) => b.station > 3120 && b.station < 3320)).toHaveLength(2);
    expect(Array.isArray(ramp.deck.right_edge_offset)).toBe(true);
    const t = computeOffsetTable(ramp);
    expect(t.warnings).toBeUndefined();
    expect(ramp.deflections).toHaveLength(ramp.girders.length * (ramp.bents.length - 1));
    for (const p of t.points) {
      // Tenth points: the table's values land on the girder points.
      const d = ramp.deflections!.find((e) => e.girder === p.girder && e.span === p.span)!.values[p.point];
      expect(p.deflection).toBe(d);
      expect(p.screed_grade).toBeCloseTo(p.top_of_deck + d, 12);
      if (p.side !== 'interior') expect(p.form_target!).toBeCloseTo(p.edge_bottom! + 0.02 + d, 12);
    }
    // The flare widens the deck toward Abutment 4: the right edge points move outward span by span.
    const right = t.points.filter((p) => p.side === 'right' && p.point === 0);
    for (let i = 1; i < right.length; i++) expect(right[i].offset).toBeGreaterThan(right[i - 1].offset);
  });

  it('export to CSV in every style', () => {
    const t = computeOffsetTable(demoBridges[0]);
    for (const style of ['decimal-feet', 'feet-inches', 'metric'] as const) {
      const csv = offsetTableToCsv(t, { style });
      expect(csv.trim().split('\n')).toHaveLength(t.points.length + 1);
    }
    expect(offsetTableToCsv(t, { style: 'feet-inches' }).split('\n')[0]).toContain('edge_width_ft_in');
    // Metric follows the units: a feet bridge is never labelled in metres.
    expect(offsetTableToCsv(t, { style: 'metric' }).split('\n')[0]).toContain('edge_width_ft');
    const metric = offsetTableToCsv({ ...t, units: 'm' }, { style: 'feet-inches' }).split('\n');
    expect(metric[0]).toContain('edge_width_m');
    // Metric rows: station in 1000 m blocks to 1 mm, offsets LT/RT to 1 mm (data contract display rules).
    const cells = metric[1].split(',');
    const first = t.points[0];
    expect(cells.slice(0, 4)).toEqual(['1', first.girder, first.side, '0']);
    expect(cells[4]).toMatch(/^\d+\+\d{3}\.\d{3}$/);
    const [major, minor] = cells[4].split('+').map(Number);
    expect(Math.abs(major * 1000 + minor - first.station)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(cells[5]).toMatch(first.offset < 0 ? / LT$/ : / RT$/);
    expect(Math.abs(Number(cells[6]) - (first.edge_width as number))).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(cells[6]).toMatch(/^\d+\.\d{3}$/);
  });
});
