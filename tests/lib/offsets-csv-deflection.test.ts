/**
 * The offsets CSV carries deflection and screed-grade columns only when the bridge has deflections.
 * Values: the contract's definitions (bridge-format.md): screed grade = top of deck + deflection.
 */
import { describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, offsetTableToCsv, type BridgeDescription } from '@/lib/geometry';

const plain = demoBridges[0] as BridgeDescription;
const deflected = { ...plain, deflections: [{ girder: 'G1', span: 2, values: [0, 0.05, 0.08, 0.05, 0] }] } as BridgeDescription;

describe('offsets CSV with deflections', () => {
  it('adds deflection and screed grade at the end of each row, in the display style', () => {
    const lines = offsetTableToCsv(computeOffsetTable(deflected), { style: 'decimal-feet' }).trim().split('\n');
    const header = lines[0].split(',');
    expect(header.slice(-2)).toEqual(['deflection_ft', 'screed_grade_ft']);
    // G1, span 2, point 10 of 20 = fraction 0.5: the middle value, 0.08 ft (hand-worked from the table above).
    const row = lines.find((l) => l.startsWith('2,G1,left,10,'))!.split(',');
    expect(row[header.indexOf('deflection_ft')]).toBe('0.08');
    const topOfDeck = Number(row[header.indexOf('top_of_deck_ft')]);
    expect(Number(row[header.indexOf('screed_grade_ft')])).toBeCloseTo(topOfDeck + 0.08, 2);
    const inches = offsetTableToCsv(computeOffsetTable(deflected), { style: 'feet-inches' }).split('\n')[0];
    expect(inches.endsWith('deflection_ft_in,screed_grade_ft')).toBe(true);
  });

  it('keeps the columns of a bridge without deflections exactly as they were', () => {
    const header = offsetTableToCsv(computeOffsetTable(plain)).split('\n')[0];
    expect(header).not.toMatch(/deflection|screed/);
    expect(header.split(',').at(-1)).toBe('bottom_of_slab_ft');
  });
});
