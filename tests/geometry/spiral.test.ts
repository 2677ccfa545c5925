/**
 * Clothoid spirals against outside sources: the classical route-surveying series, a published
 * worked spiral curve, and the Fresnel integrals of @stdlib/math as an independent numerical oracle
 * in property tests.
 */
import { describe, it, expect } from 'vitest';
import fc from 'fast-check';
import { createAlignment, type AlignmentElementInput } from '@/lib/geometry';
import { dmsToRadians } from './helpers';
// Independent oracle: Fresnel integrals S(z) = ∫ sin(πt²/2), C(z) = ∫ cos(πt²/2) (@stdlib/math, from the registry).
// eslint-disable-next-line @typescript-eslint/no-require-imports -- @stdlib ships CommonJS without types
const fresnel = require('@stdlib/math/base/special/fresnel') as (z: number) => [number, number];

type P = { x: number; y: number };

/** Where two tangent lines (point + azimuth in radians) meet. */
function intersect(p: P, bp: number, q: P, bq: number): P {
  const d1 = { x: Math.sin(bp), y: Math.cos(bp) };
  const d2 = { x: Math.sin(bq), y: Math.cos(bq) };
  const den = d1.x * d2.y - d1.y * d2.x;
  const t = ((q.x - p.x) * d2.y - (q.y - p.y) * d2.x) / den;
  return { x: p.x + t * d1.x, y: p.y + t * d1.y };
}

const dist = (a: P, b: P) => Math.hypot(a.x - b.x, a.y - b.y);

/** Local coordinates (along the start tangent, toward the turn) of a point relative to a start point and bearing. */
function local(p: P, o: P, bearing: number, turn: number): { X: number; Y: number } {
  const dx = p.x - o.x;
  const dy = p.y - o.y;
  return { X: dx * Math.sin(bearing) + dy * Math.cos(bearing), Y: turn * (dx * Math.cos(bearing) - dy * Math.sin(bearing)) };
}

/**
 * Oracle: a clothoid whose curvature grows from k1 to k2 (k2 > k1 ≥ 0) over L, in its start frame
 * (X along the start tangent, Y toward the turn), as a piece of the clothoid from curvature 0 with
 * A² = L/(k2 − k1): F(s) = A√π (C(s/(A√π)), S(s/(A√π))), rotated back by the heading at s0 = k1·A².
 */
function fresnelLocal(L: number, k1: number, k2: number, t: number): { X: number; Y: number } {
  const A2 = L / (k2 - k1);
  const a = Math.sqrt(A2 * Math.PI);
  const F = (s: number) => {
    const [S, C] = fresnel(s / a);
    return { u: a * C, v: a * S };
  };
  const s0 = k1 * A2;
  const p0 = F(s0);
  const p1 = F(s0 + t);
  const phi = (s0 * s0) / (2 * A2);
  const du = p1.u - p0.u;
  const dv = p1.v - p0.v;
  return { X: du * Math.cos(phi) + dv * Math.sin(phi), Y: -du * Math.sin(phi) + dv * Math.cos(phi) };
}

describe('spiral: classical series (route surveying; θs = Ls/2R, X and Y series, from memory, see domain.md)', () => {
  it.each([
    [200, 300],
    [150, 1000],
    [350, 954.93],
  ])('Ls %d ft into R %d ft: θs, X, Y, long and short tangents', (Ls, R) => {
    const al = createAlignment({
      start_station: 0,
      start_x: 500,
      start_y: 800,
      start_bearing_deg: 33,
      elements: [{ type: 'spiral', length: Ls, radius_start: null, radius_end: R, direction: 'left' }],
    });
    const ts = al.pointAt(0);
    const sc = al.pointAt(Ls);
    const th = Ls / (2 * R);
    // θs = Ls / 2R: the bearing turns by θs (to the left here).
    expect(ts.bearing - sc.bearing).toBeCloseTo(th, 12);
    const X = Ls * (1 - th ** 2 / 10 + th ** 4 / 216 - th ** 6 / 9360);
    const Y = Ls * (th / 3 - th ** 3 / 42 + th ** 5 / 1320 - th ** 7 / 75600);
    const l = local(sc, ts, ts.bearing, -1);
    expect(Math.abs(l.X - X)).toBeLessThan(1e-8 * Ls);
    expect(Math.abs(l.Y - Y)).toBeLessThan(1e-8 * Ls);
    // Long tangent LT = X − Y / tan θs, short tangent ST = Y / sin θs (classical relations, from memory);
    // the series above stop at θ⁶ and θ⁷, so they agree to about θ⁸/685440 of Ls.
    const v = intersect(ts, ts.bearing, sc, sc.bearing);
    expect(dist(ts, v)).toBeCloseTo(X - Y / Math.tan(th), 6);
    expect(dist(sc, v)).toBeCloseTo(Y / Math.sin(th), 6);
  });
});

describe('spiral: published worked example', () => {
  // New Hampshire DOT, CADD/D "Spiral Curve Data" (nh.gov/dot/cadd), sample curve data printed to
  // 0.01 ft and 0.1": PI 23+96.20, Δ = 77°47'44.8" RT, Δc = 39°35'54.9", Ls = 200.00', Rc = 300.00',
  // θs = 19°05'54.9", Ts = 346.15', Es = 92.58', Lc = 207.34', LT = 134.12', ST = 67.38', P = 5.53',
  // K = 99.63', Xc = 197.79', Yc = 22.05', LC = 199.01'.
  const R = 300;
  const Ls = 200;
  const deltaC = dmsToRadians(39, 35, 54.9);
  const Lc = R * deltaC;
  const ts = 2396.2 - 346.15;
  const al = createAlignment({
    start_station: ts - 100,
    start_x: 964000,
    start_y: 405000,
    start_bearing_deg: 20,
    elements: [
      { type: 'line', length: 100 },
      { type: 'spiral', length: Ls, radius_start: null, radius_end: R, direction: 'right' },
      { type: 'arc', length: Lc, radius: R, direction: 'right' },
      { type: 'spiral', length: Ls, radius_start: R, radius_end: null, direction: 'right' },
      { type: 'line', length: 100 },
    ],
  });
  const pTS = al.pointAt(ts);
  const pSC = al.pointAt(ts + Ls);
  const pCS = al.pointAt(ts + Ls + Lc);
  const pST = al.pointAt(ts + 2 * Ls + Lc);

  it('turns θs over each spiral and Δ in all, to 0.1"', () => {
    const sec = Math.PI / 180 / 3600;
    expect(Math.abs(pSC.bearing - pTS.bearing - dmsToRadians(19, 5, 54.9))).toBeLessThan(0.1 * sec);
    expect(Math.abs(pST.bearing - pTS.bearing - dmsToRadians(77, 47, 44.8))).toBeLessThan(0.15 * sec);
    expect(Lc).toBeCloseTo(207.34, 2);
  });

  it('SC at Xc, Yc; long chord, long and short tangents, P and K to 0.01 ft', () => {
    const l = local(pSC, pTS, pTS.bearing, 1);
    expect(Math.abs(l.X - 197.79)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(l.Y - 22.05)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(dist(pTS, pSC) - 199.01)).toBeLessThanOrEqual(0.005);
    const v = intersect(pTS, pTS.bearing, pSC, pSC.bearing);
    expect(Math.abs(dist(pTS, v) - 134.12)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(dist(pSC, v) - 67.38)).toBeLessThanOrEqual(0.005);
    // Centre of the circular arc from three of its points (independent circle through SC, mid, CS).
    const m = al.pointAt(ts + Ls + Lc / 2);
    const c = circumcentre(pSC, m, pCS);
    // Coordinates near a million cost the circle fit some digits; 1e-4 ft is plenty here.
    expect(dist(c, m)).toBeCloseTo(R, 4);
    const lc = local(c, pTS, pTS.bearing, 1);
    expect(Math.abs(lc.Y - R - 5.53)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(lc.X - 99.63)).toBeLessThanOrEqual(0.005);
  });

  it('closes on the PI: Ts and Es to 0.01 ft, PI at 23+96.20 by station', () => {
    const pi = intersect(pTS, pTS.bearing, pST, pST.bearing);
    expect(Math.abs(dist(pTS, pi) - 346.15)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(dist(pST, pi) - 346.15)).toBeLessThanOrEqual(0.005);
    const mid = al.pointAt(ts + Ls + Lc / 2);
    expect(Math.abs(dist(mid, pi) - 92.58)).toBeLessThanOrEqual(0.005);
    expect(ts + 346.15).toBeCloseTo(2396.2, 9);
  });
});

function circumcentre(a: P, b: P, c: P): P {
  const d = 2 * (a.x * (b.y - c.y) + b.x * (c.y - a.y) + c.x * (a.y - b.y));
  const a2 = a.x ** 2 + a.y ** 2;
  const b2 = b.x ** 2 + b.y ** 2;
  const c2 = c.x ** 2 + c.y ** 2;
  return { x: (a2 * (b.y - c.y) + b2 * (c.y - a.y) + c2 * (a.y - b.y)) / d, y: (a2 * (c.x - b.x) + b2 * (a.x - c.x) + c2 * (b.x - a.x)) / d };
}

const radius = fc.double({ min: 150, max: 5000, noNaN: true });
const length = fc.double({ min: 20, max: 400, noNaN: true });

describe('spiral: properties against the Fresnel oracle (fast-check, @stdlib/math)', () => {
  it('positions agree with the Fresnel integrals to 1e-9 of L, for any start bearing and either hand', () => {
    fc.assert(
      fc.property(
        length,
        radius,
        radius,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -360, max: 360, noNaN: true }),
        fc.boolean(),
        fc.boolean(),
        (L, Ra, Rb, f, b0, right, fromTangent) => {
          const r1 = fromTangent ? null : Math.max(Ra, Rb) * 1.5;
          const r2 = Math.min(Ra, Rb);
          fc.pre(r1 === null || Math.abs(1 / r1 - 1 / r2) > 1e-6);
          const turn = right ? 1 : -1;
          const al = createAlignment({
            start_station: 100,
            start_x: 0,
            start_y: 0,
            start_bearing_deg: b0,
            elements: [{ type: 'spiral', length: L, radius_start: r1, radius_end: r2, direction: right ? 'right' : 'left' }],
          });
          const t = f * L;
          const o = fresnelLocal(L, r1 === null ? 0 : 1 / r1, 1 / r2, t);
          const p = al.pointAt(100 + t);
          const l = local(p, { x: 0, y: 0 }, (b0 * Math.PI) / 180, turn);
          expect(Math.abs(l.X - o.X)).toBeLessThan(1e-9 * L);
          expect(Math.abs(l.Y - o.Y)).toBeLessThan(1e-9 * L);
        },
      ),
      { numRuns: 150 },
    );
  });

  it('the bearing changes by L(k1 + k2)/2 over a spiral, k = 1/R (0 for a tangent end)', () => {
    fc.assert(
      fc.property(length, radius, fc.option(radius, { nil: null }), fc.boolean(), (L, Ra, Rb, right) => {
        fc.pre(Rb === null || Math.abs(Ra - Rb) > 1);
        const al = createAlignment({
          start_station: 0,
          start_x: 0,
          start_y: 0,
          start_bearing_deg: 10,
          elements: [{ type: 'spiral', length: L, radius_start: Rb, radius_end: Ra, direction: right ? 'right' : 'left' }],
        });
        const k = (L * (1 / Ra + (Rb === null ? 0 : 1 / Rb))) / 2;
        expect(Math.abs(al.pointAt(L).bearing - al.pointAt(0).bearing - (right ? k : -k))).toBeLessThan(1e-12);
      }),
    );
  });

  it('a symmetric spiral–arc–spiral closes on its hand-computed PI: Ts = (R + p)·tan(Δ/2) + k', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 300, noNaN: true }),
        fc.double({ min: 400, max: 3000, noNaN: true }),
        fc.double({ min: 0.05, max: 0.8, noNaN: true }),
        fc.boolean(),
        (Ls, R, deltaC, right) => {
          const th = Ls / (2 * R);
          const delta = deltaC + 2 * th;
          // Hand: X, Y of the spiral's end from the Fresnel oracle; p = Y − R(1 − cos θs), k = X − R sin θs.
          const { X, Y } = fresnelLocal(Ls, 0, 1 / R, Ls);
          const p = Y - R * (1 - Math.cos(th));
          const k = X - R * Math.sin(th);
          const Ts = (R + p) * Math.tan(delta / 2) + k;
          const dir = right ? 'right' : 'left';
          const al = createAlignment({
            start_station: 0,
            start_x: 10,
            start_y: 20,
            start_bearing_deg: 145,
            elements: [
              { type: 'spiral', length: Ls, radius_start: null, radius_end: R, direction: dir },
              { type: 'arc', length: R * deltaC, radius: R, direction: dir },
              { type: 'spiral', length: Ls, radius_start: R, radius_end: null, direction: dir },
            ],
          });
          const a = al.pointAt(0);
          const b = al.pointAt(al.endStation);
          const pi = intersect(a, a.bearing, b, b.bearing);
          expect(Math.abs(dist(a, pi) - Ts)).toBeLessThan(1e-8 * Ts);
          expect(Math.abs(dist(b, pi) - Ts)).toBeLessThan(1e-8 * Ts);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('curvature is continuous across tangent–spiral–arc–spiral–tangent joins (finite differences of the bearing)', () => {
    fc.assert(
      fc.property(fc.double({ min: 60, max: 300, noNaN: true }), fc.double({ min: 300, max: 3000, noNaN: true }), fc.boolean(), (Ls, R, right) => {
        const dir = right ? 'right' : 'left';
        const els: AlignmentElementInput[] = [
          { type: 'line', length: 100 },
          { type: 'spiral', length: Ls, radius_start: null, radius_end: R, direction: dir },
          { type: 'arc', length: 150, radius: R, direction: dir },
          { type: 'spiral', length: Ls, radius_start: R, radius_end: null, direction: dir },
          { type: 'line', length: 100 },
        ];
        const al = createAlignment({ start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 0, elements: els });
        const h = 0.01;
        const kappa = (s: number, side: -1 | 1) => (side * (al.pointAt(s + side * h).bearing - al.pointAt(s).bearing)) / h;
        for (const join of [100, 100 + Ls, 250 + Ls, 250 + 2 * Ls]) {
          // Both one-sided slopes of the bearing agree to O(h·dκ/ds) = h/(R·Ls).
          expect(Math.abs(kappa(join, -1) - kappa(join, 1))).toBeLessThan((2 * h) / (R * Ls) + 1e-9);
          expect(Math.abs(al.curvatureAt(join - 1e-7) - al.curvatureAt(join + 1e-7))).toBeLessThan(1e-9);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('station and offset of points on and near a spiral invert pointAt (any side, before and past its ends)', () => {
    const al = createAlignment({
      start_station: 500,
      start_x: 0,
      start_y: 0,
      start_bearing_deg: 300,
      elements: [
        { type: 'line', length: 80 },
        { type: 'spiral', length: 250, radius_start: null, radius_end: 600, direction: 'left' },
        { type: 'arc', length: 100, radius: 600, direction: 'left' },
        { type: 'spiral', length: 120, radius_start: 600, radius_end: 1500, direction: 'left' },
      ],
    });
    fc.assert(
      fc.property(fc.double({ min: 420, max: 1150, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }), (s, o) => {
        const p = al.pointAt(s, o);
        const q = al.stationOffset(p.x, p.y);
        expect(Math.abs(q.station - s)).toBeLessThan(1e-8);
        expect(Math.abs(q.offset - o)).toBeLessThan(1e-8);
      }),
      { numRuns: 300 },
    );
  });
});
