import { describe, it, expect } from 'vitest';
import { createProfile } from '@/lib/geometry';

describe('vertical curves against published solved problems', () => {
  it('crest: PVI 56+50 at 1325.00, +5.0 % to −3.5 %, L = 500 ft', () => {
    // J. Mahun, Open Access Surveying Library, ch. VII vertical curves, solved problem 2.
    const p = createProfile([
      { station: 5000, elevation: 1325 - 0.05 * 650 },
      { station: 5650, elevation: 1325, curve_length: 500 },
      { station: 6500, elevation: 1325 - 0.035 * 850 },
    ]);
    const expected: Array<[number, number]> = [
      [5400, 1312.5],
      [5500, 1316.65],
      [5600, 1319.1],
      [5700, 1319.85],
      [5800, 1318.9],
      [5900, 1316.25],
    ];
    for (const [s, e] of expected) expect(Math.abs(p.elevationAt(s) - e)).toBeLessThan(0.0005);
    const curve = p.curves[0];
    expect(curve.bvcStation).toBeCloseTo(5400, 9);
    expect(curve.evcStation).toBeCloseTo(5900, 9);
    expect(curve.turningPoint?.kind).toBe('high');
    expect(Math.abs((curve.turningPoint?.station ?? NaN) - 5694.12)).toBeLessThan(0.005);
    expect(Math.abs((curve.turningPoint?.elevation ?? NaN) - 1319.853)).toBeLessThan(0.0005);
    // Grade at the high point is zero; at the ends it equals the tangents (definition of the parabola).
    expect(Math.abs(p.gradeAt(curve.turningPoint?.station ?? NaN))).toBeLessThan(1e-12);
    expect(p.gradeAt(5400)).toBeCloseTo(0.05, 12);
    expect(p.gradeAt(5900)).toBeCloseTo(-0.035, 12);
  });

  it('sag: −3.50 % meets +2.00 % at 12+17.53, elevation 634.25, L = 400 ft', () => {
    // J. Mahun, Open Access Surveying Library, vertical curves, example 2: low point 12+72.07 at 636.80.
    const p = createProfile([
      { station: 800, elevation: 634.25 + 0.035 * 417.53 },
      { station: 1217.53, elevation: 634.25, curve_length: 400 },
      { station: 1700, elevation: 634.25 + 0.02 * 482.47 },
    ]);
    const low = p.curves[0].turningPoint;
    expect(low?.kind).toBe('low');
    // The source prints the station cut (not rounded) to 0.01 ft: x = 0.035·400/0.055 = 254.545 ft from
    // the BVC at 10+17.53 gives 12+72.0755, so allow one unit of the last printed digit.
    expect(Math.abs((low?.station ?? NaN) - 1272.07)).toBeLessThan(0.01);
    expect(Math.abs((low?.elevation ?? NaN) - 636.8)).toBeLessThan(0.005);
  });

  it('extends the first and last grades beyond the PVIs and is straight between curves', () => {
    // Data contract: grades straight between PVIs; common practice to extend the end grades.
    const p = createProfile([
      { station: 100, elevation: 10 },
      { station: 300, elevation: 14 },
    ]);
    expect(p.elevationAt(0)).toBeCloseTo(8, 12);
    expect(p.elevationAt(500)).toBeCloseTo(18, 12);
    expect(p.gradeAt(-1000)).toBeCloseTo(0.02, 12);
    expect(p.curves).toHaveLength(0);
  });

  it('gives a level profile for a single PVI', () => {
    const p = createProfile([{ station: 100, elevation: 42 }]);
    expect(p.elevationAt(-500)).toBeCloseTo(42, 12);
    expect(p.gradeAt(900)).toBeCloseTo(0, 12);
  });

  it('has no turning point when the grade keeps its sign', () => {
    const p = createProfile([
      { station: 0, elevation: 0 },
      { station: 500, elevation: 20, curve_length: 200 },
      { station: 1000, elevation: 30 },
    ]);
    expect(p.curves[0].turningPoint).toBeNull();
    // The curve is tangent to both grades at its ends.
    expect(p.elevationAt(400)).toBeCloseTo(16, 12);
    expect(p.elevationAt(600)).toBeCloseTo(22, 12);
  });
});
