import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseStation, stationInputText, type Units } from '@/lib/units';
import { formatStation } from '@/lib/geometry';

// Station notation: 100-ft stations written 12+34.56 = 1234.56 ft, and in metric work 1000-m
// stations written 1+234.567 = 1234.567 m (common practice; the data contract states both).
describe('station text typed in the editor', () => {
  it('reads feet and metric station notation and plain numbers', () => {
    const cases: Array<[string, Units, number]> = [
      ['12+34.56', 'ft', 1234.56],
      ['0+00', 'ft', 0],
      [' 10 + 87.94 ', 'ft', 1087.94],
      ['1+234.567', 'm', 1234.567],
      ['1234.56', 'ft', 1234.56],
      ['-1+50', 'ft', -150],
    ];
    for (const [text, units, value] of cases) {
      const r = parseStation(text, units);
      expect(r.ok, text).toBe(true);
      if (r.ok) expect(r.value).toBeCloseTo(value, 9);
    }
  });

  it('refuses text that is not a station, naming an example', () => {
    for (const text of ['12+', 'abc', '12+100', '1+1000', '']) {
      const units = text === '1+1000' ? 'm' : 'ft';
      const r = parseStation(text, units);
      expect(r.ok, text).toBe(false);
      // Either an example of the notation or the typed text itself, so the user sees what to fix.
      if (!r.ok) expect(r.message.includes('e.g.') || r.message.includes(text.trim())).toBe(true);
    }
  });

  it('reads back what the display prints, to the displayed precision', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 99999, noNaN: true }), fc.constantFrom<Units>('ft', 'm'), (value, units) => {
        const r = parseStation(formatStation(value, units), units);
        expect(r.ok).toBe(true);
        if (r.ok) expect(Math.abs(r.value - value)).toBeLessThanOrEqual(units === 'm' ? 0.0005 + 1e-9 : 0.005 + 1e-9);
        const exact = parseStation(stationInputText(value, units), units);
        if (exact.ok) expect(Math.abs(exact.value - value)).toBeLessThan(1e-6);
      }),
    );
  });
});
