import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { createAlignment, pointOnSkewedLine, type AlignmentElementInput } from '@/lib/geometry';
import { dmsToRadians } from './helpers';

/** Where two tangent lines (point + azimuth) meet. */
function intersect(p: { x: number; y: number }, bp: number, q: { x: number; y: number }, bq: number) {
  const d1 = { x: Math.sin(bp), y: Math.cos(bp) };
  const d2 = { x: Math.sin(bq), y: Math.cos(bq) };
  const den = d1.x * d2.y - d1.y * d2.x;
  const t = ((q.x - p.x) * d2.y - (q.y - p.y) * d2.x) / den;
  return { x: p.x + t * d1.x, y: p.y + t * d1.y };
}

/** Lays out line 100 / arc / line 100 and measures the curve's parts with the engine. */
function measureCurve(radius: number, deltaRad: number, direction: 'left' | 'right', startStation: number) {
  const al = createAlignment({
    start_station: startStation,
    start_x: 1000,
    start_y: 2000,
    start_bearing_deg: 63,
    elements: [
      { type: 'line', length: 100 },
      { type: 'arc', length: radius * deltaRad, radius, direction },
      { type: 'line', length: 100 },
    ],
  });
  const pc = al.pointAt(startStation + 100);
  const pt = al.pointAt(startStation + 100 + radius * deltaRad);
  const pi = intersect(pc, pc.bearing, pt, pt.bearing);
  const chordMid = { x: (pc.x + pt.x) / 2, y: (pc.y + pt.y) / 2 };
  return {
    al,
    T: Math.hypot(pi.x - pc.x, pi.y - pc.y),
    C: Math.hypot(pt.x - pc.x, pt.y - pc.y),
    M: Math.abs(al.stationOffset(chordMid.x, chordMid.y).offset),
    E: Math.abs(al.stationOffset(pi.x, pi.y).offset),
    L: al.stationOffset(pt.x, pt.y).station - al.stationOffset(pc.x, pc.y).station,
    pc,
    pt,
  };
}

describe('circular curve parts against published worked examples', () => {
  it('metric curve I = 29°20′, R = 249.17 m', () => {
    // MSTE 34 Surveying review handout, "Horizontal Curves 1 Solutions": T = 65.2136 m, C = 126.1773 m,
    // M = 8.119 m; E = 8.3926 m and L = 127.566 m recomputed there.
    for (const direction of ['left', 'right'] as const) {
      const c = measureCurve(249.17, dmsToRadians(29, 20), direction, 0);
      expect(Math.abs(c.T - 65.2136)).toBeLessThan(0.00005);
      expect(Math.abs(c.C - 126.1773)).toBeLessThan(0.00005);
      expect(Math.abs(c.M - 8.119)).toBeLessThan(0.0005);
      expect(Math.abs(c.E - 8.3926)).toBeLessThan(0.00005);
      expect(Math.abs(c.L - 127.566)).toBeLessThan(0.0005);
    }
  });

  it('US curve D = 8° (arc definition), Δ = 25°30′, PI at 12+50', () => {
    // A surveying course's worked solution: R = 716.20 ft, T = 162.06 ft, L = 318.75 ft,
    // PC 10+87.94, PT 14+06.69.
    const R = 5729.5779513 / 8; // arc definition: R = 100 ft · (180/π) / D
    expect(Math.abs(R - 716.2)).toBeLessThan(0.005);
    const c = measureCurve(R, dmsToRadians(25, 30), 'right', 0);
    expect(Math.abs(c.T - 162.06)).toBeLessThan(0.005);
    expect(Math.abs(c.L - 318.75)).toBeLessThan(0.005);
    // Station the PC from the PI: PC = PI − T, PT = PC + L (stations run along the curve).
    const pcStation = 1250 - c.T;
    expect(Math.abs(pcStation - 1087.94)).toBeLessThan(0.005);
    expect(Math.abs(pcStation + c.L - 1406.69)).toBeLessThan(0.005);
  });
});

describe('station and offset', () => {
  const al = createAlignment({
    start_station: 1000,
    start_x: 5000,
    start_y: 5000,
    start_bearing_deg: 45,
    elements: [
      { type: 'line', length: 120 },
      { type: 'arc', length: 400, radius: 950, direction: 'right' },
      { type: 'line', length: 200 },
    ],
  });

  it('follows the bearing convention: clockwise from north, offsets positive right', () => {
    // Data contract sign conventions (bridge-format.md); bearing 45° runs north-east.
    const p = al.pointAt(1100);
    expect(p.x - 5000).toBeCloseTo(100 * Math.SQRT1_2, 9);
    expect(p.y - 5000).toBeCloseTo(100 * Math.SQRT1_2, 9);
    const right = al.pointAt(1100, 10);
    // Right of a north-east course is south-east.
    expect(right.x - p.x).toBeCloseTo(10 * Math.SQRT1_2, 9);
    expect(right.y - p.y).toBeCloseTo(-10 * Math.SQRT1_2, 9);
  });

  it('turns the bearing by L/R on an arc and keeps the chord length 2R sin(Δ/2)', () => {
    // Circular curve relation C = 2R sin(Δ/2), Δ = L/R (Schofield & Breach, §10.1).
    const a = al.pointAt(1120);
    const b = al.pointAt(1520);
    expect(b.bearing - a.bearing).toBeCloseTo(400 / 950, 12);
    expect(Math.hypot(b.x - a.x, b.y - a.y)).toBeCloseTo(2 * 950 * Math.sin(200 / 950), 9);
  });

  it('extends the end tangents beyond both ends', () => {
    // Common practice: stations off the ends continue along the end tangents.
    const before = al.pointAt(990, 3);
    const so = al.stationOffset(before.x, before.y);
    expect(so.station).toBeCloseTo(990, 9);
    expect(so.offset).toBeCloseTo(3, 9);
    const end = al.pointAt(1720);
    const after = al.pointAt(1750, -4);
    expect(Math.hypot(after.x - end.x, after.y - end.y)).toBeCloseTo(Math.hypot(30, 4), 9);
    const back = al.stationOffset(after.x, after.y);
    expect(back.station).toBeCloseTo(1750, 9);
    expect(back.offset).toBeCloseTo(-4, 9);
  });

  it('inverts station/offset to 1e-9 on both sides of the curve and across joins (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 960, max: 1760, noNaN: true }), fc.double({ min: -300, max: 300, noNaN: true }), (s, o) => {
        // The inverse is defined as the exact inverse of station/offset → point (data contract,
        // "Top of deck at a plan point Q: find its station s and offset o by the inverse").
        // Offsets on the inside of the curve must stay short of the radius (950 ft).
        const p = al.pointAt(s, o);
        const back = al.stationOffset(p.x, p.y);
        expect(Math.abs(back.station - s)).toBeLessThan(1e-9);
        expect(Math.abs(back.offset - o)).toBeLessThan(1e-9);
      }),
      { numRuns: 400 },
    );
  });

  it('inverts exactly at element joins', () => {
    // Round trip as above, at the PC and PT where two elements meet (tangent-continuous joins).
    for (const s of [1120, 1520]) {
      for (const o of [-25, 0, 25]) {
        const p = al.pointAt(s, o);
        const back = al.stationOffset(p.x, p.y);
        expect(Math.abs(back.station - s)).toBeLessThan(1e-9);
        expect(Math.abs(back.offset - o)).toBeLessThan(1e-9);
      }
    }
  });

  it('inverts on an alignment of hundreds of elements (property)', () => {
    const elements: AlignmentElementInput[] = [];
    // Alternating reverse curves and short tangents, total turning kept small so the road never folds back.
    for (let i = 0; i < 600; i++) {
      if (i % 3 === 0) elements.push({ type: 'line', length: 15 + (i % 7) });
      else elements.push({ type: 'arc', length: 20 + (i % 5), radius: 400 + 10 * (i % 11), direction: i % 2 === 0 ? 'left' : 'right' });
    }
    const long = createAlignment({ start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 10, elements });
    // Round trip (inverse of station/offset → point) on 600 elements.
    expect(long.elementCount).toBe(600);
    fc.assert(
      fc.property(fc.double({ min: 0, max: long.endStation, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }), (s, o) => {
        const p = long.pointAt(s, o);
        const back = long.stationOffset(p.x, p.y);
        expect(Math.abs(back.station - s)).toBeLessThan(1e-9);
        expect(Math.abs(back.offset - o)).toBeLessThan(1e-9);
      }),
      { numRuns: 400 },
    );
  });

  it('skips zero-length elements', () => {
    const a = createAlignment({
      start_station: 0,
      start_x: 0,
      start_y: 0,
      start_bearing_deg: 90,
      elements: [
        { type: 'line', length: 0 },
        { type: 'line', length: 50 },
        { type: 'arc', length: 0, radius: 100, direction: 'left' },
      ],
    });
    // Data contract: stations run continuously along the elements; a zero-length one adds nothing.
    expect(a.endStation).toBeCloseTo(50, 12);
    const p = a.pointAt(25, -2);
    // Due east, left is north.
    expect(p.x).toBeCloseTo(25, 12);
    expect(p.y).toBeCloseTo(2, 12);
  });
});

describe('skewed line', () => {
  it('on a tangent: the point at offset o lies o·tan(skew) up-station (right end up-station for positive skew)', () => {
    // Plane trigonometry; skew convention of the data contract.
    const al = createAlignment({ start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 0, elements: [{ type: 'line', length: 400 }] });
    const p = pointOnSkewedLine(al, 200, 30, 10);
    expect(p.station).toBeCloseTo(200 + 10 * Math.tan(Math.PI / 6), 9);
    expect(p.offset).toBeCloseTo(10, 9);
    const q = pointOnSkewedLine(al, 200, 30, -10);
    expect(q.station).toBeCloseTo(200 - 10 * Math.tan(Math.PI / 6), 9);
  });

  it('on a curve: the solved point lies on the straight bent line at the asked offset', () => {
    // Common practice: bent lines are straight in plan; the offset is measured normal to the curve.
    const al = createAlignment({
      start_station: 0,
      start_x: 0,
      start_y: 0,
      start_bearing_deg: 0,
      elements: [{ type: 'arc', length: 600, radius: 500, direction: 'left' }],
    });
    const base = al.pointAt(300);
    for (const o of [-40, -5, 12, 60]) {
      const p = pointOnSkewedLine(al, 300, 25, o);
      expect(p.offset).toBeCloseTo(o, 9);
      // The point is on the line through the base at azimuth bearing + 90° − skew.
      const lineBearing = base.bearing + Math.PI / 2 - (25 * Math.PI) / 180;
      const cross = (p.x - base.x) * Math.cos(lineBearing) - (p.y - base.y) * Math.sin(lineBearing);
      expect(Math.abs(cross)).toBeLessThan(1e-9);
      // Right end further up-station for positive skew.
      expect(Math.sign(p.station - 300)).toBe(Math.sign(o));
    }
  });
});
