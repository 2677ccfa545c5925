/**
 * Plane geometry of a clothoid transition for the LandXML import's own checks (the engine has its
 * own implementation; the import lays spirals out independently to compare with the file's points).
 * Bearings are azimuths in radians, clockwise from north; x = easting, y = northing.
 */

/** 10-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, table 25.4). */
const NODES = [
  -0.9739065285171717, -0.8650633666889845, -0.6794095682990244, -0.4333953941292472, -0.1488743389816312, 0.1488743389816312, 0.4333953941292472, 0.6794095682990244, 0.8650633666889845,
  0.9739065285171717,
];
const WEIGHTS = [
  0.0666713443086881, 0.1494513491505806, 0.219086362515982, 0.2692667193099963, 0.2955242247147529, 0.2955242247147529, 0.2692667193099963, 0.219086362515982, 0.1494513491505806, 0.0666713443086881,
];

export interface ClothoidSpec {
  length: number;
  /** Curvature at the start and end, 1/length unit, both ≥ 0 (0 for a tangent end). */
  k1: number;
  k2: number;
  /** +1 turning right (clockwise), −1 turning left. */
  turn: 1 | -1;
}

/** Bearing change from the spiral's start at distance t along it, radians (signed by the turn). */
export function clothoidTurn(s: ClothoidSpec, t: number): number {
  return s.turn * (s.k1 * t + ((s.k2 - s.k1) * t * t) / (2 * s.length));
}

/**
 * Offset (Δx east, Δy north) from the spiral's start to the point at distance t along it, for a
 * spiral that starts at bearing `bearing0` (radians). Composite Gauss–Legendre quadrature of
 * x = ∫ sin β, y = ∫ cos β; pieces short enough that the bearing changes by at most 0.05 rad in each,
 * which keeps the error far below 1e-9 of the length.
 */
export function clothoidDelta(s: ClothoidSpec, bearing0: number, t: number): { dx: number; dy: number } {
  if (t <= 0) return { dx: 0, dy: 0 };
  const kMax = Math.max(s.k1, s.k2);
  const pieces = Math.min(4096, Math.max(4, Math.ceil((t * kMax) / 0.05)));
  const h = t / pieces;
  let dx = 0;
  let dy = 0;
  for (let p = 0; p < pieces; p++) {
    const mid = (p + 0.5) * h;
    for (let i = 0; i < NODES.length; i++) {
      const u = mid + (NODES[i] * h) / 2;
      const b = bearing0 + clothoidTurn(s, u);
      dx += (WEIGHTS[i] * h * Math.sin(b)) / 2;
      dy += (WEIGHTS[i] * h * Math.cos(b)) / 2;
    }
  }
  return { dx, dy };
}
