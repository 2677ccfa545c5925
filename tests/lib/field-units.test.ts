import { describe, expect, it } from 'vitest';
import { deviationText, parseLength, readingLength, toleranceText } from '@/lib/units';
import { fixHint } from '@/lib/field/verdict';

// Feet-inches arithmetic worked by hand: 4'-6 3/8" = 4 + 6.375/12 = 4.53125 ft.
describe('field-mode length entry', () => {
  it('reads decimal feet and feet-inches the ways a crew writes them', () => {
    expect(parseLength('4.53', 'ft')).toBeCloseTo(4.53, 12);
    expect(parseLength(`4'-6 3/8"`, 'ft')).toBeCloseTo(4.53125, 12);
    expect(parseLength(`4' 6 3/8`, 'ft')).toBeCloseTo(4.53125, 12);
    expect(parseLength('4-6-3/8', 'ft')).toBeCloseTo(4.53125, 12);
    expect(parseLength(`4'-6.5"`, 'ft')).toBeCloseTo(4 + 6.5 / 12, 12);
    expect(parseLength(`4'`, 'ft')).toBeCloseTo(4, 12);
    expect(parseLength('  ', 'ft')).toBeNull();
    expect(parseLength('-0.12', 'ft')).toBeCloseTo(-0.12, 12);
    expect(parseLength('1,382', 'm')).toBeCloseTo(1.382, 12);
  });

  it('turns anything else into NaN instead of guessing', () => {
    for (const bad of ['four', `4'-13"`, '4..5', `4'-6 3/8"`.replace('3/8', '3/0x')]) expect(parseLength(bad, 'ft')).toBeNaN();
    expect(parseLength(`1'-2"`, 'm')).toBeNaN();
  });

  it('shows deviations in inches or millimetres with their sign, tolerances with ±', () => {
    expect(deviationText(0.5, 'ft')).toBe('+6.00 in');
    expect(deviationText(-0.001, 'ft')).toBe('−0.01 in');
    expect(deviationText(-0.004, 'm')).toBe('−4 mm');
    expect(toleranceText(0.25 / 12, 'ft')).toBe('±0.25 in (0.021 ft)');
    expect(toleranceText(0.006, 'm')).toBe('±6 mm');
    expect(deviationText(0.004, 'ft', 'reading')).toBe('+0.004 ft');
    expect(toleranceText(0.01, 'ft', 'reading')).toBe('±0.010 ft');
  });

  it('shows level-bar readings and rods to 0.001 ft, finer than the 0.01 ft reading tolerance', () => {
    // Common practice: a target must be shown finer than the tolerance it is judged by.
    expect(readingLength(-0.1745, 'ft')).toBe('-0.175 ft');
    expect(readingLength(0.0625, 'ft')).toBe('0.063 ft');
    expect(readingLength(-0.0004, 'ft')).toBe('0.000 ft');
    expect(readingLength(0.05349, 'm')).toBe('0.053 m');
    expect(readingLength(null, 'ft')).toBe('—');
  });

  it('says which way to move the form edge to close a deviation (measured − computed)', () => {
    // Common practice: a wider measured edge width means the edge is too far out; a larger drop from
    // the girder top means the edge is too low.
    expect(fixHint('width', 0.5, 'ft')).toBe('Bring the form edge in 6.00 in.');
    expect(fixHint('width', -0.03125, 'ft')).toBe('Set the form edge out 0.38 in.');
    expect(fixHint('reading', 0.0145, 'ft')).toBe('Raise the form edge 0.015 ft.');
    expect(fixHint('reading', -0.012, 'm')).toBe('Lower the form edge 12 mm.');
  });
});
