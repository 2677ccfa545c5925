import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable } from '@/lib/geometry';
import { buildSheetGroups, fieldSheetCsv, levelBarRods, SHEET_CAUTION, ROD_DEFINITION, type FieldSheet } from '@/lib/services/field-sheet';

const TOL = 1e-9;

describe('level-bar rods', () => {
  it('matches hand-worked cases', () => {
    // Worked by hand: bar level, girder rod on the top of girder, form rod down to the form edge.
    // Reading 0.35 ft, base 0.50 ft → girder rod 0.50, form rod 0.85, no extra.
    const a = levelBarRods(0.35, 0.5);
    expect(a.girderRod).toBeCloseTo(0.5, 12);
    expect(a.formRod).toBeCloseTo(0.85, 12);
    expect(a.extra).toBe(0);
    // Reading −0.62 ft (form edge above the girder top), base 0.50 → the form rod would be −0.12 ft;
    // both rods get 0.62 ft extra: girder 1.12, form 0.50.
    const b = levelBarRods(-0.62, 0.5);
    expect(b.girderRod).toBeCloseTo(1.12, 12);
    expect(b.formRod).toBeCloseTo(0.5, 12);
    expect(b.extra).toBeCloseTo(0.62, 12);
    // Metric: reading 0.085 m, base 0.150 m → 0.150 and 0.235.
    expect(levelBarRods(0.085, 0.15).formRod).toBeCloseTo(0.235, 12);
  });

  it('always keeps form rod − girder rod = reading, both rods at least the base, the same extra on both', () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 0.05, max: 2, noNaN: true }), (reading, base) => {
        const r = levelBarRods(reading, base);
        expect(r.formRod - r.girderRod).toBeCloseTo(reading, 9);
        expect(r.girderRod).toBeGreaterThanOrEqual(base - TOL);
        expect(r.formRod).toBeGreaterThanOrEqual(base - TOL);
        expect(r.girderRod - r.extra).toBeCloseTo(base, 9);
        expect(r.extra).toBeGreaterThanOrEqual(0);
        if (reading >= 0) expect(r.extra).toBe(0);
      }),
    );
  });
});

describe('field sheet', () => {
  const table = computeOffsetTable(demoBridges[0]);
  const n = demoBridges[0].points_per_span ?? 10;
  const sheet = (span: number | null): FieldSheet => ({
    bridge: { id: 1, name: 'Sheet, "quoted" bridge' },
    units: 'ft',
    revision: 3,
    base_rod_length: 0.5,
    span,
    spans: [1, 2, 3],
    groups: buildSheetGroups(table, 0.5, span),
    caution: SHEET_CAUTION,
    rod_definition: ROD_DEFINITION,
  });

  it('has one table per span and exterior girder, left first, with every girder point in order', () => {
    const groups = buildSheetGroups(table, 0.5, null);
    expect(groups.map((g) => `${g.span}${g.girder}${g.side}`)).toEqual(['1G1left', '1G5right', '2G1left', '2G5right', '3G1left', '3G5right']);
    for (const g of groups) expect(g.rows.map((r) => r.point)).toEqual(Array.from({ length: n + 1 }, (_, k) => k));
    expect(buildSheetGroups(table, 0.5, 2).every((g) => g.span === 2)).toBe(true);
  });

  it('carries the engine values and rods only where the top of girder was surveyed', () => {
    for (const g of buildSheetGroups(table, 0.5, null)) {
      for (const r of g.rows) {
        const p = table.points.find((q) => q.span === g.span && q.girder === g.girder && q.point === r.point)!;
        expect(r.edge_width).toBeCloseTo(p.edge_width!, 12);
        expect(r.form_target).toBeCloseTo(p.form_target!, 12);
        expect(r.reading).toBe(p.drop_from_girder_top);
        if (p.drop_from_girder_top === null) expect(r.form_rod).toBeNull();
        else expect(r.form_rod! - r.girder_rod!).toBeCloseTo(p.drop_from_girder_top, 9);
      }
    }
  });

  it('writes feet-inches to the nearest 1/8 inch that read back within 1/16 inch', () => {
    for (const r of buildSheetGroups(table, 0.5, 1)[0].rows) {
      const m = /^(\d+)'-(\d+)(?: (\d)\/(2|4|8))?"$/.exec(r.edge_width_text);
      expect(m, r.edge_width_text).not.toBeNull();
      const inches = Number(m![1]) * 12 + Number(m![2]) + (m![3] ? Number(m![3]) / Number(m![4]) : 0);
      expect(Math.abs(inches - r.edge_width * 12)).toBeLessThanOrEqual(1 / 16 + 1e-9);
    }
  });

  it('exports CSV: revision and caution lines, a header, one row per bracket, blank measurement columns', () => {
    const csv = fieldSheetCsv(sheet(1));
    const lines = csv.trimEnd().split('\n');
    // Comment lines are one quoted cell each: the bridge name's comma and quotes do not split them.
    expect(lines[0]).toBe('"# Chordline field sheet: Sheet, ""quoted"" bridge; revision 3; base rod 0.50 ft; span 1"');
    expect(lines[1]).toMatch(/^"# Caution: Geometry only\..*"$/);
    const header = lines[2].split(',');
    expect(header).toContain('edge_width_ft_in');
    expect(header).toContain('girder_rod_ft');
    const rows = lines.slice(3);
    expect(rows).toHaveLength(2 * (n + 1));
    const idx = (name: string) => header.indexOf(name);
    for (const line of rows) {
      const cells = line.split(',');
      expect(cells).toHaveLength(header.length);
      expect(cells[idx('measured_edge_width_ft')]).toBe('');
      expect(cells[idx('measured_reading_ft')]).toBe('');
      expect(cells[idx('revision')]).toBe('3');
      const p = table.points.find((q) => q.span === 1 && q.girder === cells[idx('girder')] && q.point === Number(cells[idx('point')]))!;
      expect(Math.abs(Number(cells[idx('edge_width_ft')]) - p.edge_width!)).toBeLessThanOrEqual(0.005 + 1e-9);
      expect(Math.abs(Number(cells[idx('form_target_ft')]) - p.form_target!)).toBeLessThanOrEqual(0.005 + 1e-9);
      if (p.drop_from_girder_top === null) expect(cells[idx('level_bar_reading_ft')]).toBe('');
      else expect(Math.abs(Number(cells[idx('level_bar_reading_ft')]) - p.drop_from_girder_top)).toBeLessThanOrEqual(0.005 + 1e-9);
    }
  });
});
