/**
 * LandXML design profiles: circular vertical curves (CircCurve) read as the symmetric parabola with the
 * same PVI and length, the stated largest difference checked against an independent construction of
 * the circle, refusal beyond 0.001 ft / 0.3 mm, and profiles that are missing, unusable or too short
 * leaving the horizontal alignment in place.
 */
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { createProfile } from '@/lib/geometry';
import { parseLandXml } from '@/lib/import/landxml';
import { decodeXmlBytes } from '@/lib/import/xml-tree';

const text = (name: string) => decodeXmlBytes(new Uint8Array(fs.readFileSync(path.resolve(__dirname, '../fixtures/landxml', name))));

/**
 * Elevation on a circle of radius R tangent to the grade lines through the PVI (s0, z0) with grades g1
 * and g2, built the textbook way: the centre is the point at distance R from both grade lines on the
 * concave side (two linear equations), the tangent points are the feet of the perpendiculars.
 */
function circleByOffsetLines(s0: number, z0: number, g1: number, g2: number, R: number) {
  const n1 = [-g1 / Math.hypot(1, g1), 1 / Math.hypot(1, g1)];
  const n2 = [-g2 / Math.hypot(1, g2), 1 / Math.hypot(1, g2)];
  const side = g2 > g1 ? 1 : -1; // sag: centre above both grade lines
  // n1·(C − V) = side·R and n2·(C − V) = side·R.
  const det = n1[0] * n2[1] - n1[1] * n2[0];
  const cs = (side * R * n2[1] - side * R * n1[1]) / det;
  const cz = (n1[0] * side * R - n2[0] * side * R) / det;
  const t1 = s0 + cs - side * R * n1[0];
  const t2 = s0 + cs - side * R * n2[0];
  return (s: number) => {
    if (s <= t1) return z0 + g1 * (s - s0);
    if (s >= t2) return z0 + g2 * (s - s0);
    return z0 + cz - side * Math.sqrt(R * R - (s - s0 - cs) ** 2);
  };
}

describe('LandXML import: circular vertical curves', () => {
  const a = parseLandXml(text('bretelle-circ-m-latin1.xml'), 'm').alignments[0];

  it('reads each CircCurve as a parabola at the same PVI, with the length of the circle', () => {
    const pvis = a.profile!.pvis;
    // The PVIs written in the file.
    expect(pvis.map((p) => [p.station, p.elevation])).toEqual([
      [2300, 112.4],
      [2420, 114.8],
      [2560, 113.2],
      [2750, 110.5],
    ]);
    // Common practice (from memory): a parabola of length L = R·A stands in for a circle of radius R
    // (A the algebraic difference of grades); the exact horizontal length differs by far less than 0.1 %.
    const A1 = Math.abs(-1.6 / 140 - 2.4 / 120);
    expect(Math.abs(pvis[1].curve_length! - 4000 * A1) / (4000 * A1)).toBeLessThan(1e-3);
  });

  it('states the largest circle–parabola difference, which an independent construction confirms', () => {
    const profile = createProfile(a.profile!.pvis);
    const g1 = 2.4 / 120;
    const g2 = -1.6 / 140;
    const circle = circleByOffsetLines(2420, 114.8, g1, g2, 4000);
    let worst = 0;
    for (let s = 2300; s <= 2540; s += 0.01) worst = Math.max(worst, Math.abs(circle(s) - profile.elevationAt(s)));
    const note = a.notes.find((n) => n.includes('2+420.000'))!;
    const stated = Number(note.match(/differ by at most ([0-9.e-]+) m/)![1]);
    expect(Math.abs(stated - worst)).toBeLessThan(2e-6);
    expect(worst).toBeLessThan(0.0003048);
  });

  it('leaves the profile out, and keeps the alignment, when circle and parabola differ by more than 0.001 ft', () => {
    // R 500 ft between +10 % and −10 %: the circle and its parabola part by about x⁴/8R³ ≈ 0.006 ft (from memory).
    const steep = text('ramp-spirals-ft.xml').replace(
      /<ProfAlign name="Ramp B-2 FG">[\s\S]*?<\/ProfAlign>/,
      '<ProfAlign name="Steep"><PVI>1000 100</PVI><CircCurve radius="500">1100 110</CircCurve><PVI>1200 100</PVI></ProfAlign>',
    );
    const got = parseLandXml(steep).alignments[0];
    expect(got.alignment.elements).toHaveLength(5);
    expect(got.profile).toBeNull();
    expect(got.profile_left_out).toHaveLength(1);
    expect(got.profile_left_out![0]).toMatch(/CircCurve at station 11\+00\.00 .*more than 0\.001 ft/);
    expect(got.notes.join(' ')).toMatch(/Enter the profile from the plans/);
  });
});

describe('LandXML import: profiles that are missing, unusable or short', () => {
  it('imports the alignment of a file with no profile and says so', () => {
    const a = parseLandXml(text('ramp-left-ft-utf16.xml')).alignments[0];
    expect(a.alignment.elements).toHaveLength(5);
    expect(a.profile).toBeNull();
    expect(a.profile_left_out![0]).toMatch(/no design profile/);
  });

  it('leaves out a profile with an unsymmetrical curve, naming its station', () => {
    const xml = text('ramp-spirals-ft.xml').replace('<ParaCurve length="200.000000">1720.000000 845.400000</ParaCurve>', '<UnsymParaCurve lengthIn="80" lengthOut="120">1720.0 845.4</UnsymParaCurve>');
    const a = parseLandXml(xml).alignments[0];
    expect(a.profile).toBeNull();
    expect(a.profile_left_out![0]).toMatch(/UnsymParaCurve at station 17\+20\.00/);
    expect(a.alignment.elements.map((e) => e.type)).toEqual(['line', 'spiral', 'arc', 'spiral', 'line']);
  });

  it('says when the profile ends before the alignment or starts after it', () => {
    const loop = parseLandXml(text('loop-compound-m-cp1252.xml')).alignments[0];
    // The alignment runs 0+500 to 0+970 (lengths in the file: 40 + 50 + 80 + 70 + 120 + 60 + 50 = 470 m); the profile ends at 0+920.
    expect(loop.notes.join(' ')).toMatch(/ends at station 0\+920\.000, before the alignment's end \(station 0\+970\.000\)/);
    const late = text('ramp-spirals-ft.xml').replace('<PVI>900.000000 840.000000</PVI>', '<PVI>1100.000000 842.000000</PVI>');
    expect(parseLandXml(late).alignments[0].notes.join(' ')).toMatch(/starts at station 11\+00\.00, after the alignment's start \(station 10\+00\.00\)/);
  });

  it('leaves out a profile whose curves overlap', () => {
    const xml = text('ramp-spirals-ft.xml').replace('<ParaCurve length="200.000000">1720', '<ParaCurve length="600.000000">1720');
    const a = parseLandXml(xml).alignments[0];
    expect(a.profile).toBeNull();
    expect(a.profile_left_out![0]).toMatch(/13\+50\.00 and station 17\+20\.00 overlap/);
  });
});
