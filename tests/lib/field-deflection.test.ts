/**
 * With a deflection table, the field sheet and field mode (which reads the sheet's rows: the level-bar
 * reading is the engine's drop_from_girder_top) follow the raised form target and buildup; without one,
 * nothing changes and no deflection column appears.
 *
 * The checks are the data contract's definitions worked by hand at single points (bridge-format.md,
 * "Definitions the engine computes"): form target = edge bottom + settlement + deflection; buildup =
 * bottom of slab + deflection − top of girder; drop from girder top = top of girder − form target.
 */
import { describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, type BridgeDescription } from '@/lib/geometry';
import { buildSheetGroups, fieldSheetCsv, levelBarRods, ROD_DEFINITION, SHEET_CAUTION, type FieldSheet } from '@/lib/services/field-sheet';

// Demo bridge 1: girder points at twentieths (points_per_span 20), G1 and G5 exterior, tops surveyed in
// span 1 at points 0, 10 and 20. Deflections in feet at tenth points, positive downward.
const G1 = [0, 0.031, 0.058, 0.079, 0.092, 0.096, 0.092, 0.079, 0.058, 0.031, 0];
const G5 = [0, 0.025, 0.047, 0.064, 0.075, 0.078, 0.075, 0.064, 0.047, 0.025, 0];
const plain = demoBridges[0] as BridgeDescription;
const deflected = {
  ...plain,
  deflections: [
    { girder: 'G1', span: 1, values: G1 },
    { girder: 'G5', span: 1, values: G5 },
  ],
} as BridgeDescription;

const before = computeOffsetTable(plain);
const after = computeOffsetTable(deflected);
const at = (t: typeof before, girder: string, span: number, point: number) => t.points.find((p) => p.girder === girder && p.span === span && p.point === point)!;

const sheetOf = (table: typeof before, deflections: boolean): FieldSheet => ({
  bridge: { id: 1, name: 'Deflected' },
  units: 'ft',
  revision: 1,
  base_rod_length: 0.5,
  span: null,
  spans: [1, 2, 3],
  groups: buildSheetGroups(table, 0.5, null),
  deflections,
  caution: SHEET_CAUTION,
  rod_definition: ROD_DEFINITION,
});

describe('field sheet and field mode with deflections', () => {
  it('raises the form target and buildup by the deflection and lowers the level-bar reading by it (hand-worked at G1, span 1, point 10)', () => {
    const p0 = at(before, 'G1', 1, 10);
    const p1 = at(after, 'G1', 1, 10);
    // Point 10 of 20 is fraction 0.5: the table's value at 0.5, 0.096 ft.
    expect(p1.deflection).toBeCloseTo(0.096, 12);
    expect(p1.form_target! - p0.form_target!).toBeCloseTo(0.096, 9);
    expect(p1.buildup! - p0.buildup!).toBeCloseTo(0.096, 9);
    expect(p1.screed_grade - p1.top_of_deck).toBeCloseTo(0.096, 9);
    // Drop from girder top = top of girder (surveyed 253.68) − form target.
    expect(p1.drop_from_girder_top!).toBeCloseTo(253.68 - p1.form_target!, 9);
    expect(p0.drop_from_girder_top! - p1.drop_from_girder_top!).toBeCloseTo(0.096, 9);
  });

  it('interpolates between tenth points at a twentieth point (G5, span 1, point 5 = fraction 0.25)', () => {
    const p = at(after, 'G5', 1, 5);
    // Fraction 0.25 lies halfway between the values at 0.2 (0.047) and 0.3 (0.064): 0.0555 ft.
    expect(p.deflection).toBeCloseTo(0.0555, 12);
    expect(p.form_target! - at(before, 'G5', 1, 5).form_target!).toBeCloseTo(0.0555, 9);
  });

  it("gives field mode the engine's reading at every bracket, and rods that read it", () => {
    for (const g of buildSheetGroups(after, 0.5, null)) {
      for (const r of g.rows) {
        const p = at(after, g.girder, g.span, r.point);
        expect(r.reading).toBe(p.drop_from_girder_top);
        expect(r.form_target).toBe(p.form_target);
        expect(r.deflection).toBe(p.deflection);
        expect(r.screed_grade).toBe(p.screed_grade);
        if (r.reading !== null) {
          // Level bar: form rod − girder rod = reading = top of girder − form target (ROD_DEFINITION).
          expect(r.form_rod! - r.girder_rod!).toBeCloseTo(p.top_of_girder! - p.form_target!, 9);
          expect(levelBarRods(r.reading, 0.5).formRod).toBe(r.form_rod);
        }
      }
    }
  });

  it('adds deflection and screed-grade columns to the sheet CSV only when the bridge has deflections', () => {
    const withColumns = fieldSheetCsv(sheetOf(after, true)).split('\n');
    expect(withColumns[2]).toContain('form_target_ft,deflection_ft,screed_grade_ft,measured_edge_width_ft');
    const row = withColumns.find((l) => l.startsWith('1,G1,left,10,'))!.split(',');
    expect(row[withColumns[2].split(',').indexOf('deflection_ft')]).toBe('0.10');
    const without = fieldSheetCsv(sheetOf(before, false));
    expect(without).not.toContain('deflection');
    expect(without).not.toContain('screed_grade');
  });

  it('leaves a bridge without deflections exactly as before: zero deflection, screed grade = top of deck', () => {
    for (const p of before.points) {
      expect(p.deflection).toBe(0);
      expect(p.screed_grade).toBe(p.top_of_deck);
    }
  });
});
