import { describe, it, expect } from 'vitest';
import { formatFeet, formatFeetInches, formatLength, formatMetres, formatOffset, formatStation } from '@/lib/geometry';

describe('display formats', () => {
  it('rounds feet to 0.01 and metres to 0.001, half up on the decimal value', () => {
    // Display rounding ROUND_HALF_UP: common practice for construction tables.
    expect(formatFeet(1.005)).toBe('1.01');
    expect(formatFeet(-1.005)).toBe('-1.01');
    expect(formatFeet(2.344999)).toBe('2.34');
    expect(formatFeet(-0.001)).toBe('0.00');
    expect(formatMetres(1.2345)).toBe('1.235');
    expect(formatMetres(0.0004)).toBe('0.000');
  });

  it('feet-inches to the nearest 1/8 inch, reduced fractions, carrying 12 inches into the next foot', () => {
    // 1 ft 2 3/8 in = 1.197916… ft (12 in to the foot, common practice).
    expect(formatFeetInches(1 + 2.375 / 12)).toBe('1\'-2 3/8"');
    expect(formatFeetInches(0.5)).toBe('0\'-6"');
    expect(formatFeetInches(3.75 / 12)).toBe('0\'-3 3/4"');
    expect(formatFeetInches(-(2 + 0.5 / 12))).toBe('-2\'-0 1/2"');
    // 11.97 in rounds to 12 in: show 1'-0", never 0'-12".
    expect(formatFeetInches(11.97 / 12)).toBe('1\'-0"');
    expect(formatFeetInches(4 + 11.95 / 12)).toBe('5\'-0"');
    // 0.015625 ft = 3/16 in exactly, half way between 1/8 and 1/4: rounds up.
    expect(formatFeetInches(0.015625)).toBe('0\'-0 1/4"');
    expect(formatFeetInches(-0.015625)).toBe('-0\'-0 1/4"');
    expect(formatFeetInches(-0.0001)).toBe('0\'-0"');
  });

  it('stations in 100 ft and 1000 m blocks', () => {
    // Station notation (domain.md): 1234.56 ft → 12+34.56; metric 1234.567 m → 1+234.567.
    expect(formatStation(1234.56, 'ft')).toBe('12+34.56');
    expect(formatStation(1234.567, 'm')).toBe('1+234.567');
    expect(formatStation(5.1, 'ft')).toBe('0+05.10');
    expect(formatStation(1299.996, 'ft')).toBe('13+00.00');
    expect(formatStation(999.9996, 'm')).toBe('1+000.000');
    expect(formatStation(-50, 'ft')).toBe('-0+50.00');
    expect(formatStation(-1234.5, 'ft')).toBe('-12+34.50');
  });

  it('offsets as LT / RT without sign', () => {
    // Data contract: the UI shows offsets as LT / RT with no sign.
    expect(formatOffset(-18, 'ft')).toBe('18.00 LT');
    expect(formatOffset(3.456, 'ft')).toBe('3.46 RT');
    expect(formatOffset(-1.5, 'ft', 'feet-inches')).toBe('1\'-6" LT');
    expect(formatOffset(2.1234, 'm')).toBe('2.123 RT');
    expect(formatOffset(0.001, 'ft')).toBe('0.00');
  });

  it('lengths carry their unit', () => {
    expect(formatLength(3.14159, 'ft')).toBe('3.14 ft');
    expect(formatLength(3.14159, 'm')).toBe('3.142 m');
    expect(formatLength(3.14159, 'ft', 'feet-inches')).toBe('3\'-1 3/4"');
  });
});
