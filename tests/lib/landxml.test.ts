import fs from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { LandXmlError, parseLandXml } from '@/lib/import/landxml';
import { hasDtdOrEntity } from '@/lib/import/xml-tree';
import { createAlignment, createProfile } from '@/lib/geometry';
import type { Units } from '@/lib/units';

const fixture = (name: string) => fs.readFileSync(path.resolve(__dirname, '../fixtures/landxml', name), 'utf8');

/** Expects parseLandXml to refuse the text with this status and a message matching `pattern`. */
function expectRefused(text: string, status: number, pattern: RegExp, units?: Units) {
  let caught: unknown;
  try {
    parseLandXml(text, units);
  } catch (err) {
    caught = err;
  }
  expect(caught).toBeInstanceOf(LandXmlError);
  expect((caught as LandXmlError).status).toBe(status);
  expect((caught as LandXmlError).message).toMatch(pattern);
}

type RawElement = { kind: 'Line' | 'Curve'; length: number; rot?: string; radius?: number; start: number[]; end: number[]; center?: number[] };

/**
 * Reads the elements straight from the fixture text with regular expressions, independently of the
 * importer, so the check below compares the engine against what the file itself says.
 */
function rawElements(text: string): RawElement[] {
  const out: RawElement[] = [];
  const re = /<(Line|Curve)([^>]*)>([\s\S]*?)<\/\1>/g;
  const nums = (s: string | undefined) => (s ?? '').trim().split(/\s+/).map(Number);
  for (const m of text.matchAll(re)) {
    const attr = (n: string) => m[2].match(new RegExp(`${n}="([^"]*)"`))?.[1];
    const inner = (n: string) => m[3].match(new RegExp(`<${n}>([^<]*)</${n}>`))?.[1];
    out.push({
      kind: m[1] as 'Line' | 'Curve',
      length: Number(attr('length')),
      rot: attr('rot'),
      radius: attr('radius') ? Number(attr('radius')) : undefined,
      start: nums(inner('Start')),
      end: nums(inner('End')),
      center: inner('Center') ? nums(inner('Center')) : undefined,
    });
  }
  return out;
}

describe('LandXML import: a hand-written file in US survey feet', () => {
  const text = fixture('creek-road-ft.xml');
  const result = parseLandXml(text, 'ft');
  const imported = result.alignments[0];

  it('reads one alignment, its name, unit and stationing', () => {
    expect(result.units).toBe('ft');
    expect(result.linear_unit).toBe('USSurveyFoot');
    expect(result.alignments).toHaveLength(1);
    expect(imported.name).toBe('Willowmere Creek Road CL');
    expect(imported.alignment.start_station).toBeCloseTo(1000, 9);
    // LandXML points are "N E": the first Start is N 10000, E 20000 → x = 20000, y = 10000.
    expect(imported.alignment.start_x).toBeCloseTo(20000, 9);
    expect(imported.alignment.start_y).toBeCloseTo(10000, 9);
    // First tangent: ΔE 125, ΔN 216.5063509461 → azimuth atan(125 / 216.506…) = 30° (plain trigonometry).
    expect(imported.alignment.start_bearing_deg).toBeCloseTo((Math.atan2(125, 216.5063509461) * 180) / Math.PI, 8);
  });

  it('turns Line and Curve into line and arc elements with the lengths, radii and turns the file states', () => {
    const raw = rawElements(text);
    expect(imported.alignment.elements.map((e) => e.type)).toEqual(raw.map((r) => (r.kind === 'Line' ? 'line' : 'arc')));
    imported.alignment.elements.forEach((el, i) => {
      expect(el.length).toBeCloseTo(raw[i].length, 6);
      if (el.type === 'arc') {
        expect(el.radius).toBeCloseTo(raw[i].radius as number, 6);
        // LandXML 1.2: rot="cw" turns clockwise (right looking ahead), "ccw" left.
        expect(el.direction).toBe(raw[i].rot === 'cw' ? 'right' : 'left');
      }
    });
  });

  it("agrees with the file's Start, Center and End points through the engine's pointAt to 1e-6", () => {
    const alignment = createAlignment(imported.alignment);
    const raw = rawElements(text);
    // Stations of each element's ends from the file's own staStart and length attributes.
    let station = 1000;
    for (const el of raw) {
      const a = alignment.pointAt(station);
      const b = alignment.pointAt(station + el.length);
      expect(Math.abs(a.x - el.start[1])).toBeLessThan(1e-6);
      expect(Math.abs(a.y - el.start[0])).toBeLessThan(1e-6);
      expect(Math.abs(b.x - el.end[1])).toBeLessThan(1e-6);
      expect(Math.abs(b.y - el.end[0])).toBeLessThan(1e-6);
      if (el.center) {
        for (const f of [0.25, 0.5, 0.75]) {
          const p = alignment.pointAt(station + f * el.length);
          const r = Math.hypot(p.x - el.center[1], p.y - el.center[0]);
          expect(Math.abs(r - (el.radius as number))).toBeLessThan(1e-6);
        }
      }
      station += el.length;
    }
    expect(alignment.endStation).toBeCloseTo(1900, 6);
  });

  it('reads the design profile (ProfAlign) and leaves the ground profile (ProfSurf) alone', () => {
    expect(imported.profile_name).toBe('Finished grade');
    // The values written in the fixture's ProfAlign.
    expect(imported.profile?.pvis).toEqual([
      { station: 900, elevation: 250 },
      { station: 1300, elevation: 254, curve_length: 300 },
      { station: 1650, elevation: 251.5, curve_length: 200 },
      { station: 1950, elevation: 249.25 },
    ]);
    // The engine lays it out: the PVI at 19+50 sits on a straight grade, so the profile passes through it.
    const profile = createProfile(imported.profile!.pvis);
    expect(profile.elevationAt(1950)).toBeCloseTo(249.25, 9);
  });
});

describe('LandXML import: several alignments in metres, points by reference', () => {
  const result = parseLandXml(fixture('two-ramps-m.xml'), 'm');

  it('offers every alignment with its own profile', () => {
    expect(result.units).toBe('m');
    expect(result.alignments.map((a) => a.name)).toEqual(['Ramp A', 'Ramp K']);
    expect(result.alignments[1].profile?.pvis[1]).toEqual({ station: 1380, elevation: 46.6, curve_length: 100 });
    // Ramp A: the tangent runs due east (N stays 5000) → azimuth 90°.
    expect(result.alignments[0].alignment.start_bearing_deg).toBeCloseTo(90, 9);
    const arc = result.alignments[0].alignment.elements[1];
    expect(arc).toMatchObject({ type: 'arc', direction: 'left' });
    if (arc.type === 'arc') {
      expect(arc.radius).toBeCloseTo(200, 6);
      expect(arc.length).toBeCloseTo(80, 6);
    }
  });

  it('resolves pntRef points from CgPoints and ends where the file ends', () => {
    const k = result.alignments[1];
    const alignment = createAlignment(k.alignment);
    // CgPoint K5 = N 7114.3487810685, E 3742.7142196302, the End of the last Line, at 12+50 + 260 m.
    const end = alignment.pointAt(1250 + 260);
    expect(Math.abs(end.x - 3742.7142196302)).toBeLessThan(1e-6);
    expect(Math.abs(end.y - 7114.3487810685)).toBeLessThan(1e-6);
  });

  it('refuses the file for a bridge in feet (LinearUnits mismatch)', () => {
    expectRefused(fixture('two-ramps-m.xml'), 422, /in metres .* this bridge is in feet/, 'ft');
  });
});

describe('LandXML import: refused files', () => {
  it('refuses a DOCTYPE with entity declarations at once, before any parsing (no expansion)', () => {
    const text = fixture('entity-expansion.xml');
    expect(hasDtdOrEntity(text)).toBe(true);
    const t0 = performance.now();
    expectRefused(text, 400, /DOCTYPE or ENTITY/);
    expect(performance.now() - t0).toBeLessThan(1000);
  });

  it('refuses an ENTITY declaration even without a DOCTYPE keyword in capitals', () => {
    expectRefused('<?xml version="1.0"?><!doctype x [<!entity e "x">]><LandXML/>', 400, /DOCTYPE or ENTITY/);
  });

  it('never expands an undeclared entity reference and decodes only the predefined ones', () => {
    const text = fixture('creek-road-ft.xml').replace('name="Willowmere Creek Road CL"', 'name="Creek &amp; Mill &undefined; CL"');
    expect(parseLandXml(text).alignments[0].name).toBe('Creek & Mill &undefined; CL');
  });

  it('imports a clothoid spiral after a tangent (radius INF at its start)', () => {
    const els = parseLandXml(fixture('spiral-ft.xml')).alignments[0].alignment.elements;
    // Written in the file: Line 200 ft, then Spiral length 200, radiusStart INF, radiusEnd 1000, rot cw.
    expect(els.map((e) => e.type)).toEqual(['line', 'spiral']);
    expect(els[1]).toEqual({ type: 'spiral', length: 200, radius_start: null, radius_end: 1000, direction: 'right' });
  });

  it('refuses text that is not well-formed XML with the line of the fault', () => {
    expectRefused('<LandXML>\n<Units>\n</LandXML>', 400, /not well-formed XML \(line \d+/);
  });

  it('refuses a file with no alignment', () => {
    expectRefused('<LandXML><Units><Metric linearUnit="meter"/></Units><Surfaces/></LandXML>', 422, /no Alignment/);
  });

  it('refuses a file that does not state its linear unit', () => {
    expectRefused('<LandXML><Alignments><Alignment name="A"/></Alignments></LandXML>', 422, /linear unit/);
  });

  it('refuses a root other than LandXML', () => {
    expectRefused('<svg xmlns="http://www.w3.org/2000/svg"/>', 422, /not <LandXML>/);
  });

  it('refuses tangents meeting at an angle point', () => {
    expectRefused(fixture('kinked-ft.xml'), 422, /not tangent/);
  });

  it('catches a rot attribute that contradicts the stated length', () => {
    const flipped = fixture('creek-road-ft.xml').replace('rot="cw"', 'rot="ccw"');
    expectRefused(flipped, 422, /check the rot attribute/);
  });

  it('refuses absurdly deep nesting without crashing', () => {
    const deep = '<LandXML>' + '<a>'.repeat(5000) + '</a>'.repeat(5000) + '</LandXML>';
    expectRefused(deep, 422, /nests elements/);
  });

  it('keeps the usable alignments of a file and names the ones it skipped', () => {
    const text = fixture('two-ramps-m.xml').replace('<Line length="80.0">', '<Spiral length="80.0" rot="cw" spiType="cubic"><Start>0 0</Start></Spiral><Line length="80.0">');
    const result = parseLandXml(text);
    expect(result.alignments.map((a) => a.name)).toEqual(['Ramp A']);
    expect(result.skipped[0]).toMatchObject({ name: 'Ramp K' });
    expect(result.skipped[0].reason).toMatch(/a cubic spiral \(spiType="cubic"\); only clothoid spirals are read/);
  });
});

/** Plan point and bearing after laying `elements` from a start, by plain trigonometry (independent of the engine). */
function layOut(x: number, y: number, bearing: number, elements: { type: 'line' | 'arc'; length: number; radius: number; direction: 'left' | 'right' }[]) {
  const parts: { start: [number, number]; end: [number, number]; center?: [number, number] }[] = [];
  for (const el of elements) {
    if (el.type === 'line') {
      const ex = x + el.length * Math.sin(bearing);
      const ey = y + el.length * Math.cos(bearing);
      parts.push({ start: [x, y], end: [ex, ey] });
      x = ex;
      y = ey;
    } else {
      const t = el.direction === 'right' ? 1 : -1;
      const cx = x + t * el.radius * Math.cos(bearing);
      const cy = y - t * el.radius * Math.sin(bearing);
      const b1 = bearing + (t * el.length) / el.radius;
      const ex = cx - t * el.radius * Math.cos(b1);
      const ey = cy + t * el.radius * Math.sin(b1);
      parts.push({ start: [x, y], end: [ex, ey], center: [cx, cy] });
      x = ex;
      y = ey;
      bearing = b1;
    }
  }
  return parts;
}

describe('LandXML import: property', () => {
  it('reads back any tangent chain of lines and arcs written as LandXML (lengths and radii to 1e-6)', () => {
    const element = fc.record({
      type: fc.constantFrom('line' as const, 'arc' as const),
      length: fc.double({ min: 5, max: 800, noNaN: true }),
      radius: fc.double({ min: 200, max: 5000, noNaN: true }),
      direction: fc.constantFrom('left' as const, 'right' as const),
    });
    fc.assert(
      fc.property(fc.double({ min: 0, max: 359.9, noNaN: true }), fc.array(element, { minLength: 1, maxLength: 6 }), (bearingDeg, els) => {
        // Keep each arc under a full turn: the sweep is what the points tell, modulo one turn.
        const elements = els.map((e) => ({ ...e, length: e.type === 'arc' ? Math.min(e.length, 5 * e.radius) : e.length }));
        const parts = layOut(5000, 8000, (bearingDeg * Math.PI) / 180, elements);
        const ne = (p: [number, number]) => `${p[1].toFixed(12)} ${p[0].toFixed(12)}`;
        const geom = parts
          .map((p, i) =>
            p.center
              ? `<Curve rot="${elements[i].direction === 'right' ? 'cw' : 'ccw'}"><Start>${ne(p.start)}</Start><Center>${ne(p.center)}</Center><End>${ne(p.end)}</End></Curve>`
              : `<Line><Start>${ne(p.start)}</Start><End>${ne(p.end)}</End></Line>`,
          )
          .join('');
        const xml = `<LandXML><Units><Imperial linearUnit="foot"/></Units><Alignments><Alignment name="P" staStart="0"><CoordGeom>${geom}</CoordGeom></Alignment></Alignments></LandXML>`;
        const got = parseLandXml(xml).alignments[0].alignment;
        expect(got.elements).toHaveLength(elements.length);
        got.elements.forEach((g, i) => {
          expect(g.type).toBe(elements[i].type);
          expect(Math.abs(g.length - elements[i].length)).toBeLessThan(1e-6);
          if (g.type === 'arc') {
            expect(Math.abs(g.radius - elements[i].radius)).toBeLessThan(1e-6);
            expect(g.direction).toBe(elements[i].direction);
          }
        });
        const bearingDiff = Math.abs(((got.start_bearing_deg - bearingDeg + 540) % 360) - 180);
        expect(bearingDiff).toBeLessThan(1e-7);
      }),
      { numRuns: 200 },
    );
    // 200 generated files: room for a busy machine (this is not a speed check).
  }, 60_000);
});
