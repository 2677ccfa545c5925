/**
 * The geometry editor's drafts for issue 10's inputs: spiral elements, flared deck edges and the
 * deflection table round-trip exactly through the draft, and deflection rows pasted from a spreadsheet
 * or a CSV are read in the unit chosen on screen and converted to the bridge's unit.
 */
import { describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { bridgeDescriptionSchema, type BridgeDescription } from '@/lib/geometry';
import { convertDeflectionRows, mergeDeflections } from '@/lib/editor/deflection-draft';
import { readDeflectionPaste, unitFactor } from '@/lib/editor/deflection-paste';
import { toDescription, toDraft } from '@/lib/editor/draft';
import { switchEdgeMode } from '@/lib/editor/edge-draft';

const base = demoBridges[0];
const withEverything: BridgeDescription = bridgeDescriptionSchema.parse({
  ...base,
  alignment: {
    ...base.alignment,
    elements: [
      { type: 'line', length: 120 },
      { type: 'spiral', length: 150, radius_start: null, radius_end: 950, direction: 'right' },
      { type: 'arc', length: 250, radius: 950, direction: 'right' },
      { type: 'spiral', length: 90, radius_start: 950, radius_end: 600.25, direction: 'right' },
      { type: 'line', length: 300 },
    ],
  },
  deck: {
    ...base.deck,
    right_edge_offset: [
      { station: 1100, offset: 22 },
      { station: 1210.5, offset: 26.125 },
    ],
  },
  deflections: [
    { girder: base.girders[0].name, span: 1, values: [0, 0.0625, 0.1, 0.0625, 0] },
    { girder: base.girders[1].name, span: 2, values: [0, 0.01, 0.02, 0.03, 0.04, 0.05, 0.04, 0.03, 0.02, 0.01, 0] },
  ],
});

describe('editor draft: spirals, flared edges, deflections', () => {
  it('gives back every element, edge row and deflection value unchanged', () => {
    const { description, errors } = toDescription(toDraft(withEverything));
    expect(errors).toEqual({});
    expect(description.alignment).toEqual(withEverything.alignment);
    expect(description.deck).toEqual(withEverything.deck);
    expect(description.deflections).toEqual(withEverything.deflections);
  });

  it('shows the table in inches by default and stores feet: typed 1.5 in is 0.125 ft', () => {
    const draft = toDraft(withEverything);
    expect(draft.deflection_unit).toBe('in');
    // 0.0625 ft = 0.75 in (1 in = 1/12 ft).
    expect(draft.deflections[0].values[1]).toBe('0.75');
    draft.deflections[0].values[2] = '1.5';
    const d = toDescription(draft).description as { deflections: { values: number[] }[] };
    expect(d.deflections[0].values[2]).toBe(0.125);
    const inFeet = convertDeflectionRows(draft.deflections, 'in', 'ft');
    expect(inFeet[0].values[2]).toBe('0.125');
  });

  it('leaves a bridge without deflections without the field', () => {
    const { description } = toDescription(toDraft(bridgeDescriptionSchema.parse(base)));
    expect('deflections' in description).toBe(false);
  });

  it('reads a spiral end set to "tangent" as null and names an unreadable radius by its path', () => {
    const draft = toDraft(withEverything);
    draft.alignment.elements[3] = { ...draft.alignment.elements[3], end: 'tangent', radius_start: 'abc' };
    const { description, errors } = toDescription(draft);
    expect((description.alignment as { elements: Record<string, unknown>[] }).elements[3].radius_end).toBeNull();
    expect(errors['alignment.elements.3.radius_start'][0]).toMatch(/"abc" is not a number/);
  });

  it('turns a constant edge into a two-row table at the given stations and back', () => {
    const edge = toDraft(withEverything).deck.left_edge_offset;
    const table = switchEdgeMode(edge, 'table', ['11+00.00', '14+50.00']);
    expect(table.rows.map((r) => [r.station, r.offset])).toEqual([
      ['11+00.00', edge.constant],
      ['14+50.00', edge.constant],
    ]);
    expect(switchEdgeMode(table, 'constant', ['', '']).constant).toEqual(edge.constant);
  });
});

describe('deflection rows pasted or uploaded', () => {
  const opts = { into: 'ft' as const, girders: ['G1', 'G2', 'G5'], spans: 3, girder: 'G2', firstSpan: 2 };

  it('converts by the exact definitions: 1 in = 1/12 ft, 1 ft = 0.3048 m, 1 in = 25.4 mm', () => {
    // Source: the international yard and pound agreement (1959) as published by NIST: 1 ft = 0.3048 m exactly.
    expect(unitFactor('in', 'ft').toNumber()).toBe(1 / 12);
    expect(unitFactor('mm', 'm').toNumber()).toBe(0.001);
    expect(unitFactor('ft', 'm').toNumber()).toBe(0.3048);
    expect(unitFactor('in', 'm').toNumber()).toBe(0.0254);
    expect(unitFactor('mm', 'ft').times(304.8).toNumber()).toBe(1);
    expect(unitFactor('in', 'mm').toNumber()).toBe(25.4);
  });

  it('reads tab-separated rows with girder and span, in inches, into feet', () => {
    const got = readDeflectionPaste('Girder\tSpan\t0.0\t0.5\t1.0\nG1\t1\t0\t0.75\t0\ng5\t3\t0\t1.5\t0\n', { ...opts, unit: 'in' });
    // Into a table shown in inches the pasted text stays as it was.
    expect(readDeflectionPaste('G1\t1\t0\t0.31\t0', { ...opts, unit: 'in', into: 'in' }).rows[0].values).toEqual(['0', '0.31', '0']);
    expect(got.header).toBe(true);
    expect(got.problems).toEqual([]);
    // 0.75 in = 0.0625 ft and 1.5 in = 0.125 ft (1 in = 1/12 ft).
    expect(got.rows).toEqual([
      { girder: 'G1', span: 1, values: ['0', '0.0625', '0'] },
      { girder: 'G5', span: 3, values: ['0', '0.125', '0'] },
    ]);
  });

  it('sends comma-separated rows of numbers only to the chosen girder, span after span', () => {
    const got = readDeflectionPaste('0,0.02,0.03,0.02,0\n0,0.04,0.06,0.04,0', { ...opts, unit: 'ft' });
    expect(got.rows.map((r) => [r.girder, r.span, r.values.length])).toEqual([
      ['G2', 2, 5],
      ['G2', 3, 5],
    ]);
  });

  it('reads millimetres into metres and semicolon rows with decimal commas', () => {
    const got = readDeflectionPaste('G1;1;0;12,5;25;12,5;0', { ...opts, into: 'm', unit: 'mm' });
    expect(got.rows[0].values).toEqual(['0', '0.0125', '0.025', '0.0125', '0']);
  });

  it('names every row it cannot read: an unknown girder, a span the bridge lacks, a word among the values, one value only', () => {
    const got = readDeflectionPaste('G1\t1\t0\t0.5\t0\nG9\t1\t0\t1\t0\nG1\t4\t0\t1\t0\nG1\t2\t0\tx\t0\nG1\t2\t0.5', { ...opts, unit: 'in' });
    expect(got.rows).toHaveLength(1);
    expect(got.problems).toEqual([
      expect.stringMatching(/^Row 2: "G9" is not a girder of this bridge \(G1, G2, G5\)/),
      expect.stringMatching(/^Row 3: the bridge has spans 1 to 3, not span 4/),
      expect.stringMatching(/^Row 4, value 2: "x" is not a number/),
      expect.stringMatching(/^Row 5: 1 value; a span needs from 2 to 201/),
    ]);
  });

  it('replaces the row of a girder and span already in the table and adds the others', () => {
    const rows = toDraft(withEverything).deflections;
    const merged = mergeDeflections(rows, [
      { girder: rows[0].girder, span: 1, values: ['0', '0.2', '0'] },
      { girder: 'G5', span: 3, values: ['0', '0.1', '0'] },
    ]);
    expect(merged).toHaveLength(3);
    expect(merged[0].key).toBe(rows[0].key);
    expect(merged[0].values).toEqual(['0', '0.2', '0']);
  });
});
