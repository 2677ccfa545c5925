/**
 * LandXML files shaped as several design programs export them (invented names and coordinates, written
 * by tests/fixtures/landxml/make-fixtures.py, which lays the geometry out on its own in Python and
 * checks its spirals against SciPy's Fresnel integrals): clothoid spirals both ways, a spiral between
 * two arcs, circular vertical curves, Latin-1, windows-1252 and UTF-16 text.
 *
 * The outside check throughout is the file's own coordinates: the imported alignment, laid out by the
 * engine, must pass through every element's End point the file gives, to 0.001 (file units).
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { createAlignment } from '@/lib/geometry';
import { LandXmlAlignmentsError, parseLandXml } from '@/lib/import/landxml';
import { decodeXmlBytes } from '@/lib/import/xml-tree';

const bytes = (name: string) => new Uint8Array(fs.readFileSync(path.resolve(__dirname, '../fixtures/landxml', name)));
const text = (name: string) => decodeXmlBytes(bytes(name));

/**
 * Every CoordGeom element's End point as the file writes it ("N E", or a pntRef to a CgPoint), read
 * with regular expressions independently of the importer. Returned as { x: easting, y: northing }.
 */
function fileEnds(xml: string): { kind: string; x: number; y: number }[] {
  const cg = new Map<string, string>();
  for (const m of xml.matchAll(/<CgPoint name="([^"]+)">([^<]+)<\/CgPoint>/g)) cg.set(m[1], m[2]);
  const out: { kind: string; x: number; y: number }[] = [];
  for (const m of xml.matchAll(/<(Line|Curve|Spiral)\b[^>]*>([\s\S]*?)<\/\1>/g)) {
    const end = m[2].match(/<End>([^<]+)<\/End>/)?.[1] ?? cg.get(m[2].match(/<End pntRef="([^"]+)"\/>/)?.[1] ?? '');
    const [n, e] = (end as string).trim().split(/\s+/).map(Number);
    out.push({ kind: m[1], x: e, y: n });
  }
  return out;
}

const FILES = [
  { file: 'ramp-spirals-ft.xml', units: 'ft' as const, name: 'Ramp B-2 CL', kinds: ['line', 'spiral', 'arc', 'spiral', 'line'] },
  { file: 'bretelle-circ-m-latin1.xml', units: 'm' as const, name: 'Bretelle Sud, échangeur Nord', kinds: ['line', 'spiral', 'arc', 'spiral', 'line'] },
  { file: 'loop-compound-m-cp1252.xml', units: 'm' as const, name: 'Schleife C – Überführung', kinds: ['line', 'spiral', 'arc', 'spiral', 'arc', 'spiral', 'line'] },
  { file: 'ramp-left-ft-utf16.xml', units: 'ft' as const, name: 'Ramp D CL', kinds: ['line', 'spiral', 'arc', 'spiral', 'line'] },
];

describe('LandXML import: files from several exporters, with spirals', () => {
  for (const f of FILES) {
    it(`${f.file}: imports "${f.name}" and the engine passes through every End point of the file to 0.001 ${f.units}`, () => {
      const xml = text(f.file);
      const result = parseLandXml(xml, f.units);
      const a = result.alignments[0];
      expect(a.name).toBe(f.name);
      expect(a.alignment.elements.map((e) => e.type)).toEqual(f.kinds);
      const engine = createAlignment(a.alignment);
      const ends = fileEnds(xml);
      expect(ends).toHaveLength(f.kinds.length);
      let station = a.alignment.start_station;
      a.alignment.elements.forEach((el, i) => {
        station += el.length;
        const p = engine.pointAt(station);
        // Outside source: the End coordinates written in the file itself.
        expect(Math.hypot(p.x - ends[i].x, p.y - ends[i].y), `element ${i + 1} (${ends[i].kind})`).toBeLessThan(0.001);
      });
      expect(engine.endStation).toBeCloseTo(station, 9);
    });
  }

  it('reads the spiral attributes as written: length, INF as a tangent end, rot as the turn', () => {
    const els = parseLandXml(text('ramp-spirals-ft.xml')).alignments[0].alignment.elements;
    // Written in the file: Spiral length 150, radiusStart INF, radiusEnd 700, rot cw; and the reverse.
    expect(els[1]).toEqual({ type: 'spiral', length: 150, radius_start: null, radius_end: 700, direction: 'right' });
    expect(els[3]).toEqual({ type: 'spiral', length: 150, radius_start: 700, radius_end: null, direction: 'right' });
    const left = parseLandXml(text('ramp-left-ft-utf16.xml')).alignments[0].alignment.elements;
    expect(left[1]).toMatchObject({ type: 'spiral', radius_start: null, radius_end: 1150, direction: 'left' });
    const loop = parseLandXml(text('loop-compound-m-cp1252.xml')).alignments[0].alignment.elements;
    // A spiral between two arcs of the same direction, R 400 to R 150 (no spiType written: clothoid).
    expect(loop[3]).toMatchObject({ type: 'spiral', length: 70, radius_start: 400, radius_end: 150, direction: 'right' });
  });

  it("the file's entry spiral matches the classical tangent-to-curve spiral series (θs = Ls/2R, X, Y, long and short tangents)", () => {
    // Source: the classical route-surveying spiral formulas (from memory, as in route surveying texts):
    // θ = L/2R; X = L(1 − θ²/10 + θ⁴/216 − θ⁶/9360); Y = L(θ/3 − θ³/42 + θ⁵/1320 − θ⁷/75600);
    // long tangent LT = X − Y/tan θ; short tangent ST = Y/sin θ.
    const xml = text('ramp-spirals-ft.xml');
    const spiral = xml.match(/<Spiral length="150\.000000" radiusEnd="700\.0000" radiusStart="INF"[\s\S]*?<\/Spiral>/)![0];
    const pt = (tag: string) =>
      spiral
        .match(new RegExp(`<${tag}>([^<]+)</${tag}>`))![1]
        .split(/\s+/)
        .map(Number);
    const [s, pi, e] = [pt('Start'), pt('PI'), pt('End')];
    const d = (a: number[], b: number[]) => Math.hypot(a[0] - b[0], a[1] - b[1]);
    const L = 150;
    const R = 700;
    const th = L / (2 * R);
    const X = L * (1 - th ** 2 / 10 + th ** 4 / 216 - th ** 6 / 9360);
    const Y = L * (th / 3 - th ** 3 / 42 + th ** 5 / 1320 - th ** 7 / 75600);
    // The file prints six decimals.
    expect(Math.abs(d(s, e) - Math.hypot(X, Y))).toBeLessThan(2e-6);
    expect(Math.abs(d(s, pi) - (X - Y / Math.tan(th)))).toBeLessThan(2e-6);
    expect(Math.abs(d(pi, e) - Y / Math.sin(th))).toBeLessThan(2e-6);
    // And the engine's bearing at the spiral's end has turned by θs from the tangent (bearing 62.5°); the
    // start bearing comes from points printed to 1e-6 ft, so it is known to about 1e-8 rad.
    const al = createAlignment(parseLandXml(xml).alignments[0].alignment);
    expect(Math.abs(al.pointAt(1000 + 180 + 150).bearing - (62.5 * Math.PI) / 180 - th)).toBeLessThan(1e-7);
  });

  it('decodes Latin-1, windows-1252 and UTF-16 by their declaration or byte-order mark', () => {
    const latin = parseLandXml(text('bretelle-circ-m-latin1.xml'));
    expect(latin.alignments[0].profile_name).toBe("Projet à l'axe");
    const cp1252 = parseLandXml(text('loop-compound-m-cp1252.xml'));
    // ‘ and ’ are bytes 0x91 and 0x92 in windows-1252 (not in ISO-8859-1).
    expect(cp1252.alignments[0].profile_name).toBe('Gradiente ‘Entwurf’');
    // The same UTF-16 file big-endian, with its byte-order mark swapped too.
    const le = bytes('ramp-left-ft-utf16.xml');
    const be = new Uint8Array(le.length);
    for (let i = 0; i + 1 < le.length; i += 2) {
      be[i] = le[i + 1];
      be[i + 1] = le[i];
    }
    expect(parseLandXml(decodeXmlBytes(be)).alignments[0].name).toBe('Ramp D CL');
  });

  it('refuses bytes that are not text in their encoding with a sentence (415)', () => {
    const latin = bytes('bretelle-circ-m-latin1.xml');
    // The same Latin-1 bytes with the declaration removed read as UTF-8 (the XML default) and fail.
    const undeclared = Buffer.from(Buffer.from(latin).toString('latin1').replace(' encoding="ISO-8859-1"', ''), 'latin1');
    expect(() => decodeXmlBytes(new Uint8Array(undeclared))).toThrow(/not UTF-8 and declares no other encoding/);
    const unknown = new TextEncoder().encode('<?xml version="1.0" encoding="x-made-up"?><LandXML/>');
    expect(() => decodeXmlBytes(unknown)).toThrow(/x-made-up/);
  });
});

describe('LandXML import: every problem, with its station, per alignment', () => {
  it('refuses other spiral types by name and lists every one with its station', () => {
    let caught: unknown;
    try {
      parseLandXml(text('several-problems-ft.xml'));
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(LandXmlAlignmentsError);
    const failed = (caught as LandXmlAlignmentsError).failed;
    expect(failed.map((f) => f.name)).toEqual(['Ramp E', 'Ramp F']);
    // Ramp E: the bloss spiral starts at 11+80 and the sinusoid at 15+90 (staStart 1000 + 180; + 150 + 260).
    expect(failed[0].problems).toHaveLength(2);
    expect(failed[0].problems[0]).toMatch(/11\+80\.00.*bloss/);
    expect(failed[0].problems[1]).toMatch(/15\+90\.00.*sinusoid/);
    // Ramp F, in station order: the station equation, both angle points, the curve given by its PI only.
    expect(failed[1].problems).toHaveLength(4);
    expect(failed[1].problems[0]).toMatch(/Station equation at station 3\+45\.00.*not read yet/);
    expect(failed[1].problems[1]).toMatch(/4\+00\.00.*not tangent.*4\.0000°/);
    expect(failed[1].problems[2]).toMatch(/5\+00\.00.*not tangent.*6\.0000°/);
    expect(failed[1].problems[3]).toMatch(/6\+00\.00.*given only by their PI are not read yet/);
  });

  it('keeps a good alignment and lists the problems of the one it skipped', () => {
    const good = text('ramp-spirals-ft.xml').match(/<Alignment [\s\S]*?<\/Alignment>/)![0];
    const mixed = text('several-problems-ft.xml').replace('<Alignments>', `<Alignments>${good}`);
    const result = parseLandXml(mixed);
    expect(result.alignments.map((a) => a.name)).toEqual(['Ramp B-2 CL']);
    expect(result.skipped.map((s) => [s.name, s.problems.length])).toEqual([
      ['Ramp E', 2],
      ['Ramp F', 4],
    ]);
  });
});
