import { describe, it, expect } from 'vitest';
import { bridgeDescriptionSchema, computeOffsetTable, GeometryError, parseBridge, validateGeometry, type BridgeDescription } from '@/lib/geometry';
import { straightBridge } from './helpers';

function messages(bridge: BridgeDescription): string {
  return validateGeometry(bridge)
    .map((i) => i.message)
    .join('\n');
}

describe('schema', () => {
  it('accepts the contract example and keeps unknown extra fields', () => {
    // Data contract (bridge-format.md): "add new optional fields freely".
    const input = { ...straightBridge(), survey_note: 'shot 2 May', deck: { ...straightBridge().deck, rail_type: 'F-shape' } };
    const parsed = bridgeDescriptionSchema.parse(input) as Record<string, unknown>;
    expect(parsed.survey_note).toBe('shot 2 May');
    expect((parsed.deck as Record<string, unknown>).rail_type).toBe('F-shape');
  });

  it('rejects NaN and Infinity, unknown element types and units, naming the field', () => {
    const bad = straightBridge();
    const r1 = parseBridge({ ...bad, deck: { ...bad.deck, slab_thickness: Infinity } });
    expect(r1.ok).toBe(false);
    if (!r1.ok && r1.kind === 'schema') expect(Object.keys(r1.fields)).toContain('deck.slab_thickness');
    const r2 = parseBridge({ ...bad, alignment: { ...bad.alignment, start_x: NaN } });
    expect(r2.ok === false && r2.kind === 'schema').toBe(true);
    const r3 = parseBridge({ ...bad, alignment: { ...bad.alignment, elements: [{ type: 'clothoid', length: 10 }] } });
    expect(r3.ok === false && r3.kind === 'schema' && r3.message).toMatch(/line|arc|spiral/);
    // Data contract "Spirals": a spiral needs both radii (null for infinite) and a direction.
    const r3b = parseBridge({ ...bad, alignment: { ...bad.alignment, elements: [{ type: 'spiral', length: 10 }] } });
    expect(r3b.ok === false && r3b.kind === 'schema' && Object.keys(r3b.fields)).toEqual(expect.arrayContaining(['alignment.elements.0.radius_start', 'alignment.elements.0.direction']));
    const r4 = parseBridge({ ...bad, units: 'furlongs' });
    expect(r4.ok === false && r4.kind === 'schema' && r4.fields.units?.[0]).toMatch(/ft/);
    const r5 = parseBridge('not a bridge');
    expect(r5.ok === false && r5.kind === 'schema' && Object.keys(r5.fields)).toEqual(['_']);
  });

  it('rejects zero-length elements and a zero radius', () => {
    const b = straightBridge();
    const r = parseBridge({
      ...b,
      alignment: {
        ...b.alignment,
        elements: [
          { type: 'line', length: 0 },
          { type: 'arc', length: 10, radius: 0, direction: 'left' },
        ],
      },
    });
    expect(r.ok).toBe(false);
    if (!r.ok && r.kind === 'schema') {
      expect(Object.keys(r.fields)).toEqual(expect.arrayContaining(['alignment.elements.0.length', 'alignment.elements.1.radius']));
    }
  });

  it('keeps points_per_span within 1..200 (data contract: above 200 is refused)', () => {
    for (const n of [0, 201, 10001, 2.5]) {
      const r = parseBridge(straightBridge({ points_per_span: n }));
      expect(r.ok === false && r.kind === 'schema' && Object.keys(r.fields)).toEqual(['points_per_span']);
    }
    expect(parseBridge(straightBridge({ points_per_span: 200 })).ok).toBe(true);
  });
});

describe('geometric checks', () => {
  it('passes a sound bridge', () => {
    // Hand-checked straight bridge: 4 ft overhangs, nothing out of order.
    expect(validateGeometry(straightBridge())).toEqual([]);
    expect(parseBridge(straightBridge()).ok).toBe(true);
  });

  it('finds non-finite numbers even without the schema', () => {
    const b = straightBridge();
    const issues = validateGeometry({
      ...b,
      profile: {
        pvis: [
          { station: 0, elevation: NaN },
          { station: 500, elevation: 105 },
        ],
      },
    });
    expect(issues[0].path).toBe('profile.pvis.0.elevation');
  });

  it('names zero-length elements and a radius not larger than an inside offset', () => {
    const b = straightBridge();
    expect(
      messages({
        ...b,
        alignment: {
          ...b.alignment,
          elements: [
            { type: 'line', length: 0 },
            { type: 'line', length: 500 },
          ],
        },
      }),
    ).toMatch(/Alignment element 1: the length must be greater than zero/);
    // A 15 ft radius to the right is smaller than the 20 ft right edge offset on its inside.
    const tight = messages({
      ...b,
      alignment: {
        ...b.alignment,
        elements: [
          { type: 'line', length: 500 },
          { type: 'arc', length: 10, radius: 15, direction: 'right' },
        ],
      },
    });
    expect(tight).toMatch(/right edge offset 20\.00 ft is on the inside of the curve and not smaller than the radius 15\.00 ft/);
    expect(tight).toMatch(/Girder G3: the offset 16\.00 ft at bent 1/);
  });

  it('refuses a bent beyond the alignment and bents out of order', () => {
    // Data contract: bents in up-station order; the bridge lies on the described alignment.
    const b = straightBridge();
    expect(messages({ ...b, bents: [b.bents[0], { name: 'Bent 2', station: 520, skew_deg: 0 }] })).toMatch(/Bent 2 at 5\+20\.00 is off the alignment, which runs from 0\+00\.00 to 5\+00\.00/);
    expect(messages({ ...b, bents: [b.bents[1], b.bents[0]] })).toMatch(/Bent 1 at 1\+00\.00 must be up-station of Bent 2 at 2\+00\.00/);
    // Just past the end by a thousandth of a foot: refused, saying by how much.
    expect(messages({ ...b, bents: [b.bents[0], { name: 'Bent 2', station: 500.001, skew_deg: 0 }] })).toMatch(/Bent 2 at 5\+00\.00 is off the alignment.*\(0\.0010 ft beyond its end\)/);
    expect(messages({ ...b, bents: [{ name: 'Bent 1', station: -0.5, skew_deg: 0 }, b.bents[1]] })).toMatch(/\(0\.50 ft before its start\)/);
  });

  it('takes a bent at the end station give or take rounding noise (common practice: stations summed elsewhere)', () => {
    const b = straightBridge();
    const end = b.alignment.start_station + b.alignment.elements.reduce((s, e) => s + e.length, 0);
    const at = (station: number) => computeOffsetTable({ ...b, bents: [b.bents[0], { name: 'Bent 2', station, skew_deg: 0 }] });
    const exact = at(end);
    const noisy = at(end + 1e-9);
    expect(noisy.points.length).toBe(exact.points.length);
    for (let i = 0; i < exact.points.length; i++) expect(Math.abs((noisy.points[i].edge_width ?? 0) - (exact.points[i].edge_width ?? 0))).toBeLessThan(1e-8);
  });

  it('counts offsets against bents and spots duplicate girder names', () => {
    // Data contract: a girder's offsets have one value per bent.
    const b = straightBridge();
    const m = messages({
      ...b,
      girders: [
        { name: 'G1', layout: 'chord', offsets: [-16, -16, -16] },
        { name: 'G1', layout: 'chord', offsets: [16, 16] },
      ],
    });
    expect(m).toMatch(/Girder G1 has 3 offsets but the bridge has 2 bents/);
    expect(m).toMatch(/Girder name G1 is used twice/);
  });

  it('names the span, girder and point of a girder at or beyond the deck edge', () => {
    const b = straightBridge({
      girders: [
        { name: 'G1', layout: 'chord', offsets: [-16, -20.3] },
        { name: 'G2', layout: 'chord', offsets: [16, 16] },
      ],
    });
    const issues = validateGeometry(b);
    expect(issues.length).toBeGreaterThan(0);
    // The girder runs from 16 ft to 20.3 ft left: it crosses the 20 ft edge at 93 % of the span.
    expect(issues[0]).toMatchObject({ span: 1, girder: 'G1', point: 10 });
    expect(issues[0].message).toBe('Span 1, girder G1, point 10: the girder point is at or beyond the left deck edge (edge width -0.30 ft)');
    expect(() => computeOffsetTable(b)).toThrow(GeometryError);
    const r = parseBridge(b);
    expect(r.ok === false && r.kind).toBe('geometry');
  });

  it('refuses overlapping vertical curves, a curve on an end PVI, and PVIs out of order', () => {
    // Data contract: PVIs in station order; the first and last PVI carry no curve; a curve runs
    // from s − L/2 to s + L/2, so 200 + 100 > 350 − 75 overlaps.
    const b = straightBridge();
    const overlap = messages({
      ...b,
      profile: {
        pvis: [
          { station: 0, elevation: 100 },
          { station: 200, elevation: 104, curve_length: 200 },
          { station: 350, elevation: 101, curve_length: 150 },
          { station: 600, elevation: 103 },
        ],
      },
    });
    expect(overlap).toMatch(/vertical curves at PVI 2 \(2\+00\.00\) and PVI 3 \(3\+50\.00\) overlap/);
    // A curve reaching past a neighbouring PVI that has no curve of its own is named alone:
    // 200 − 250/2 = 75 < 100 (the PVI before it) and 200 + 250/2 = 325 > 300 (the PVI after it).
    const before = parseBridge({
      ...b,
      profile: {
        pvis: [
          { station: 100, elevation: 100 },
          { station: 200, elevation: 104, curve_length: 250 },
          { station: 300, elevation: 101 },
        ],
      },
    });
    expect(before.ok).toBe(false);
    if (!before.ok && before.kind === 'geometry') {
      expect(before.issues.map((i) => i.message)).toEqual([
        'The vertical curve at PVI 2 (2+00.00) begins at 0+75.00, before the previous point of intersection, PVI 1 (1+00.00): shorten the curve',
        'The vertical curve at PVI 2 (2+00.00) ends at 3+25.00, beyond the next point of intersection, PVI 3 (3+00.00): shorten the curve',
      ]);
      expect(before.issues.map((i) => i.path)).toEqual(['profile.pvis.1.curve_length', 'profile.pvis.1.curve_length']);
    }
    expect(
      messages({
        ...b,
        profile: {
          pvis: [
            { station: 0, elevation: 100, curve_length: 50 },
            { station: 500, elevation: 104 },
          ],
        },
      }),
    ).toMatch(/PVI 1: the first PVI cannot carry a vertical curve/);
    expect(
      messages({
        ...b,
        profile: {
          pvis: [
            { station: 300, elevation: 100 },
            { station: 200, elevation: 104 },
          ],
        },
      }),
    ).toMatch(/PVI 2 at 2\+00\.00 must be up-station of PVI 1/);
  });

  it('refuses cross-slope stations out of order and crossing deck edges', () => {
    // Data contract: cross slopes linear between listed stations (which must increase); left edge negative.
    const b = straightBridge();
    expect(
      messages({
        ...b,
        cross_slopes: [
          { station: 200, left: -0.02, right: -0.02 },
          { station: 200, left: 0.02, right: -0.02 },
        ],
      }),
    ).toMatch(/Cross slope 2 at 2\+00\.00 must be up-station/);
    expect(messages({ ...b, deck: { ...b.deck, left_edge_offset: 20, right_edge_offset: -20 } })).toMatch(/left edge offset/);
  });

  it('checks top-of-girder references', () => {
    // Data contract: surveyed elevations at girder points, which exist only for listed girders, spans 1..bents−1, points 0..n.
    const m = messages(straightBridge({ top_of_girder: [{ girder: 'G9', span: 3, point: 11, elevation: 100 }] }));
    expect(m).toMatch(/no girder named G9/);
    expect(m).toMatch(/span 3 does not exist/);
    expect(m).toMatch(/point 11 does not exist/);
  });
});
