/**
 * Horizontal alignment: tangents, circular arcs and clothoid spirals laid end to end.
 *
 * Plan coordinates: x = easting, y = northing. Bearings are azimuths in radians inside the engine,
 * clockwise from north (north 0, east π/2); degrees only at the edges (input). Offsets are normal to
 * the alignment, positive to the RIGHT looking up-station.
 */
import { edgeSpecOffsetAt, edgeSpecSlopeAt, isConstantEdge, type EdgeOffsetSpec } from './deck-edges';
import { layOutSpiral, spiralBox, spiralCurvature, spiralFoot, spiralPoint, type SpiralShape } from './spiral';
import { PARALLEL_SLOPE, residualAccepted, stepConverged } from './tolerance';

/** A straight tangent of `length` (length units of the bridge). */
export interface LineElementInput {
  type: 'line';
  length: number;
}

/** A circular arc of `length` along the curve and `radius`, turning `direction`. */
export interface ArcElementInput {
  type: 'arc';
  length: number;
  radius: number;
  direction: 'left' | 'right';
}

/**
 * A clothoid of `length` whose curvature changes linearly from 1/radius_start to 1/radius_end;
 * null for a radius means infinite (curvature 0).
 */
export interface SpiralElementInput {
  type: 'spiral';
  length: number;
  radius_start: number | null;
  radius_end: number | null;
  direction: 'left' | 'right';
}

export type AlignmentElementInput = LineElementInput | ArcElementInput | SpiralElementInput;

/** What the alignment needs from the bridge description. */
export interface AlignmentInput {
  start_station: number;
  start_x: number;
  start_y: number;
  start_bearing_deg: number;
  elements: readonly AlignmentElementInput[];
}

/** A plan point (x = easting, y = northing), length units of the bridge. */
export interface PlanPoint {
  x: number;
  y: number;
}

/** A point on (or off) the alignment with the bearing of the alignment at its station. */
export interface AlignmentPoint extends PlanPoint {
  /** Azimuth of the alignment tangent, radians clockwise from north. */
  bearing: number;
}

/** Result of the inverse: where a plan point lies relative to the alignment. */
export interface StationOffset {
  /** Station of the foot of the perpendicular (length units). */
  station: number;
  /** Signed offset: positive right of the alignment looking up-station, negative left. */
  offset: number;
  /** Azimuth of the alignment at that station, radians clockwise from north. */
  bearing: number;
  /** Signed curvature of the alignment there (1/length; positive turning right, 0 on tangents). */
  curvature: number;
}

/** Unit vector (x east, y north) of an azimuth given in radians clockwise from north; any angle. */
export function directionOf(bearing: number): PlanPoint {
  return { x: Math.sin(bearing), y: Math.cos(bearing) };
}

/** Unit vector (x east, y north) to the RIGHT of travel along an azimuth in radians clockwise from north. */
export function rightNormalOf(bearing: number): PlanPoint {
  return { x: Math.cos(bearing), y: -Math.sin(bearing) };
}

const TWO_PI = 2 * Math.PI;

interface Element {
  kind: 'line' | 'arc' | 'spiral';
  startStation: number;
  length: number;
  x0: number;
  y0: number;
  bearing0: number;
  // Arc only: +1 turning right (bearing grows), −1 turning left.
  turn: number;
  radius: number;
  cx: number;
  cy: number;
  // Spiral only: its layout (curvatures, quadrature nodes).
  spiral: SpiralShape | null;
  // Bounding box used by the nearest-element search.
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

interface BoxNode {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
  left: BoxNode | null;
  right: BoxNode | null;
  element: number; // −1 for inner nodes
}

function elementPoint(e: Element, d: number): AlignmentPoint {
  if (e.spiral) return spiralPoint(e.spiral, d);
  if (e.kind === 'line') {
    return { x: e.x0 + d * Math.sin(e.bearing0), y: e.y0 + d * Math.cos(e.bearing0), bearing: e.bearing0 };
  }
  const bearing = e.bearing0 + (e.turn * d) / e.radius;
  // The centre lies on the turning side, so the alignment is the centre minus R along that normal.
  return {
    x: e.cx - e.turn * e.radius * Math.cos(bearing),
    y: e.cy + e.turn * e.radius * Math.sin(bearing),
    bearing,
  };
}

/**
 * Distance along an arc from its start to the foot of the perpendicular from (x, y), unwrapped so
 * that points before the start come out negative and points past the end beyond the length.
 */
function arcParameter(e: Element, x: number, y: number): number {
  // Radial direction from centre to the point, expressed as the bearing whose right normal points
  // from the alignment toward the centre for a right turn.
  const ux = x - e.cx;
  const uy = y - e.cy;
  // For a right turn the alignment point is C − R·rn(θ), so rn(θ) = −u/|u|: cos θ = −ux, sin θ = uy.
  const theta = e.turn > 0 ? Math.atan2(uy, -ux) : Math.atan2(-uy, ux);
  let phi = e.turn * (theta - e.bearing0);
  phi = ((phi % TWO_PI) + TWO_PI) % TWO_PI;
  const sweep = e.length / e.radius;
  // Angles past the end are nearer to the start when they lie in the back half of the missing part.
  if (phi > sweep + (TWO_PI - sweep) / 2) phi -= TWO_PI;
  return phi * e.radius;
}

/** Signed curvature (positive turning right) of an element at distance d from its start. */
function elementCurvature(e: Element, d: number): number {
  if (e.spiral) return e.turn * spiralCurvature(e.spiral, d);
  return e.kind === 'arc' ? e.turn / e.radius : 0;
}

// The last spiral foot found by the element search, reused when that spiral turns out nearest (the
// search and the answer ask the same question of the same element).
const lastFoot = { element: null as Element | null, x: NaN, y: NaN, t: 0, offset: 0, bearing: 0 };

function footOnSpiral(e: Element, x: number, y: number): { t: number; offset: number; bearing: number } {
  if (lastFoot.element === e && lastFoot.x === x && lastFoot.y === y) return lastFoot;
  const f = spiralFoot(e.spiral as SpiralShape, x, y);
  lastFoot.element = e;
  lastFoot.x = x;
  lastFoot.y = y;
  lastFoot.t = f.t;
  lastFoot.offset = f.offset;
  lastFoot.bearing = f.bearing;
  return f;
}

function elementStationOffset(e: Element, x: number, y: number): StationOffset {
  if (e.spiral) {
    const f = footOnSpiral(e, x, y);
    return { station: e.startStation + f.t, offset: f.offset, bearing: f.bearing, curvature: elementCurvature(e, f.t) };
  }
  if (e.kind === 'line') {
    const dx = x - e.x0;
    const dy = y - e.y0;
    const s = Math.sin(e.bearing0);
    const c = Math.cos(e.bearing0);
    return { station: e.startStation + dx * s + dy * c, offset: dx * c - dy * s, bearing: e.bearing0, curvature: 0 };
  }
  const d = arcParameter(e, x, y);
  const dist = Math.sqrt((x - e.cx) * (x - e.cx) + (y - e.cy) * (y - e.cy));
  // Right turn: centre on the right, so going right brings the point nearer the centre.
  const offset = e.turn > 0 ? e.radius - dist : dist - e.radius;
  return { station: e.startStation + d, offset, bearing: e.bearing0 + (e.turn * d) / e.radius, curvature: e.turn / e.radius };
}

function distanceToElement(e: Element, x: number, y: number): number {
  if (e.spiral) {
    const f = footOnSpiral(e, x, y);
    if (f.t >= 0 && f.t <= e.length) return Math.abs(f.offset);
    const b = elementPoint(e, e.length);
    return Math.sqrt(Math.min((x - e.x0) ** 2 + (y - e.y0) ** 2, (x - b.x) ** 2 + (y - b.y) ** 2));
  }
  if (e.kind === 'line') {
    const s = Math.sin(e.bearing0);
    const c = Math.cos(e.bearing0);
    const dx = x - e.x0;
    const dy = y - e.y0;
    const t = Math.min(Math.max(dx * s + dy * c, 0), e.length);
    const ex = dx - t * s;
    const ey = dy - t * c;
    return Math.sqrt(ex * ex + ey * ey);
  }
  const d = arcParameter(e, x, y);
  const rx = x - e.cx;
  const ry = y - e.cy;
  if (d >= 0 && d <= e.length) return Math.abs(Math.sqrt(rx * rx + ry * ry) - e.radius);
  const a = elementPoint(e, 0);
  const b = elementPoint(e, e.length);
  return Math.sqrt(Math.min((x - a.x) ** 2 + (y - a.y) ** 2, (x - b.x) ** 2 + (y - b.y) ** 2));
}

/** Squared distance from a point to a box (0 inside); squared to keep square roots out of the search. */
function boxDistanceSq(n: { minX: number; minY: number; maxX: number; maxY: number }, x: number, y: number): number {
  const dx = x < n.minX ? n.minX - x : x > n.maxX ? x - n.maxX : 0;
  const dy = y < n.minY ? n.minY - y : y > n.maxY ? y - n.maxY : 0;
  return dx * dx + dy * dy;
}

function buildTree(elements: Element[], lo: number, hi: number): BoxNode {
  if (hi - lo === 1) {
    const e = elements[lo];
    return { minX: e.minX, minY: e.minY, maxX: e.maxX, maxY: e.maxY, left: null, right: null, element: lo };
  }
  // Elements are consecutive along the road, so contiguous runs are already spatially compact.
  const mid = (lo + hi) >> 1;
  const left = buildTree(elements, lo, mid);
  const right = buildTree(elements, mid, hi);
  return {
    minX: Math.min(left.minX, right.minX),
    minY: Math.min(left.minY, right.minY),
    maxX: Math.max(left.maxX, right.maxX),
    maxY: Math.max(left.maxY, right.maxY),
    left,
    right,
    element: -1,
  };
}

/** Curvature (1/length) of a spiral end radius; null (infinite) is 0. */
function curvatureOf(radius: number | null): number {
  return radius === null ? 0 : 1 / radius;
}

/** Lay out one element of positive length from its start point, bearing and station. */
function layOutElement(el: AlignmentElementInput, station: number, x: number, y: number, bearing: number): Element {
  const turn = el.type === 'line' ? 0 : el.direction === 'right' ? 1 : -1;
  const radius = el.type === 'arc' ? el.radius : Infinity;
  const rn = rightNormalOf(bearing);
  const e: Element = {
    kind: el.type,
    startStation: station,
    length: el.length,
    x0: x,
    y0: y,
    bearing0: bearing,
    turn,
    radius,
    cx: el.type === 'arc' ? x + turn * radius * rn.x : 0,
    cy: el.type === 'arc' ? y + turn * radius * rn.y : 0,
    spiral: el.type === 'spiral' ? layOutSpiral(x, y, bearing, el.length, curvatureOf(el.radius_start), curvatureOf(el.radius_end), turn) : null,
    minX: 0,
    minY: 0,
    maxX: 0,
    maxY: 0,
  };
  if (e.spiral) {
    Object.assign(e, spiralBox(e.spiral));
    return e;
  }
  const endPoint = elementPoint(e, el.length);
  const xs = [x, endPoint.x];
  const ys = [y, endPoint.y];
  if (e.kind === 'arc') {
    const sweep = el.length / radius;
    if (sweep >= Math.PI) {
      xs.push(e.cx - radius, e.cx + radius);
      ys.push(e.cy - radius, e.cy + radius);
    } else {
      // An arc under a half turn lies inside the triangle of its ends and tangent intersection.
      const t = radius * Math.tan(sweep / 2);
      xs.push(x + t * Math.sin(bearing));
      ys.push(y + t * Math.cos(bearing));
    }
  }
  e.minX = Math.min(...xs);
  e.maxX = Math.max(...xs);
  e.minY = Math.min(...ys);
  e.maxY = Math.max(...ys);
  return e;
}

/**
 * A laid-out horizontal alignment. Build it once per bridge with {@link createAlignment}; every
 * query is O(log n) in the number of elements.
 */
export class Alignment {
  /** Station at the start of the first element (length units). */
  readonly startStation: number;
  /** Station at the end of the last element (length units). */
  readonly endStation: number;
  private readonly elements: Element[];
  private readonly tree: BoxNode | null;
  private readonly start: AlignmentPoint;
  private readonly end: AlignmentPoint;
  // Search scratch: a reusable stack (depth ≤ 2·log2 n + 2) and the last element found, as a hint.
  private readonly stack: BoxNode[] = [];
  private lastElement = -1;

  constructor(input: AlignmentInput) {
    this.startStation = input.start_station;
    this.elements = [];
    let x = input.start_x;
    let y = input.start_y;
    let bearing = (input.start_bearing_deg * Math.PI) / 180;
    let station = input.start_station;
    for (const el of input.elements) {
      // Zero-length elements carry no geometry; skipping them keeps the search free of degenerate boxes.
      if (!(el.length > 0)) continue;
      const e = layOutElement(el, station, x, y, bearing);
      this.elements.push(e);
      const endPoint = elementPoint(e, el.length);
      x = endPoint.x;
      y = endPoint.y;
      bearing = endPoint.bearing;
      station += el.length;
    }
    this.endStation = station;
    this.start = { x: input.start_x, y: input.start_y, bearing: (input.start_bearing_deg * Math.PI) / 180 };
    this.end = { x, y, bearing };
    this.tree = this.elements.length > 0 ? buildTree(this.elements, 0, this.elements.length) : null;
  }

  /** Number of elements of positive length. */
  get elementCount(): number {
    return this.elements.length;
  }

  /** Length of the alignment (length units). */
  get length(): number {
    return this.endStation - this.startStation;
  }

  private elementIndexAt(station: number): number {
    let lo = 0;
    let hi = this.elements.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (this.elements[mid].startStation <= station) lo = mid;
      else hi = mid - 1;
    }
    return lo;
  }

  /**
   * Point and bearing at a station and offset.
   * @param station length units; beyond either end the end tangent is extended.
   * @param offset length units, positive right looking up-station (default 0).
   * @returns plan point and the alignment's azimuth at the station (radians, clockwise from north).
   */
  pointAt(station: number, offset = 0): AlignmentPoint {
    let p: AlignmentPoint;
    if (this.elements.length === 0) {
      const d = station - this.startStation;
      p = { x: this.start.x + d * Math.sin(this.start.bearing), y: this.start.y + d * Math.cos(this.start.bearing), bearing: this.start.bearing };
    } else if (station < this.startStation) {
      const d = station - this.startStation;
      p = { x: this.start.x + d * Math.sin(this.start.bearing), y: this.start.y + d * Math.cos(this.start.bearing), bearing: this.start.bearing };
    } else if (station > this.endStation) {
      const d = station - this.endStation;
      p = { x: this.end.x + d * Math.sin(this.end.bearing), y: this.end.y + d * Math.cos(this.end.bearing), bearing: this.end.bearing };
    } else {
      const e = this.elements[this.elementIndexAt(station)];
      p = elementPoint(e, station - e.startStation);
    }
    if (offset === 0) return p;
    return { x: p.x + offset * Math.cos(p.bearing), y: p.y - offset * Math.sin(p.bearing), bearing: p.bearing };
  }

  /**
   * Inverse: station and offset of a plan point, from the nearest point of the alignment with its
   * end tangents extended without limit. Works on both sides of curves and across element joins;
   * a bounding-box tree keeps each call O(log n) in the number of elements.
   * @param x easting, @param y northing (length units).
   * @returns station (length units), offset (positive right) and the alignment's azimuth there.
   * Valid while the point lies nearer to the alignment than the radius of any curve it is inside of.
   * @throws SolveError when x or y is not a finite number.
   */
  stationOffset(x: number, y: number): StationOffset {
    let best: StationOffset | null = null;
    let bestDist = Infinity;
    // The extended end tangents are candidates only for points beyond the ends; they also bound
    // the element search.
    const sb = Math.sin(this.start.bearing);
    const cb = Math.cos(this.start.bearing);
    let dx = x - this.start.x;
    let dy = y - this.start.y;
    let along = dx * sb + dy * cb;
    if (along <= 0 || this.tree === null) {
      const off = dx * cb - dy * sb;
      best = { station: this.startStation + along, offset: off, bearing: this.start.bearing, curvature: 0 };
      bestDist = Math.abs(off);
      if (this.tree === null) return best;
    }
    const se = Math.sin(this.end.bearing);
    const ce = Math.cos(this.end.bearing);
    dx = x - this.end.x;
    dy = y - this.end.y;
    along = dx * se + dy * ce;
    if (along >= 0) {
      const off = dx * ce - dy * se;
      if (Math.abs(off) < bestDist) {
        best = { station: this.endStation + along, offset: off, bearing: this.end.bearing, curvature: 0 };
        bestDist = Math.abs(off);
      }
    }
    let bestElement = -1;
    // Successive queries are usually near each other: the last element found gives a tight bound first.
    const hint = this.lastElement;
    if (hint >= 0) {
      const d = distanceToElement(this.elements[hint], x, y);
      if (d < bestDist) {
        bestDist = d;
        bestElement = hint;
      }
    }
    // Nearest-element search: visit nearer boxes first and prune boxes farther than the best so far.
    const stack = this.stack;
    let top = 0;
    stack[top++] = this.tree;
    while (top > 0) {
      const node = stack[--top];
      if (boxDistanceSq(node, x, y) >= bestDist * bestDist) continue;
      if (node.element >= 0) {
        if (node.element === hint) continue;
        const d = distanceToElement(this.elements[node.element], x, y);
        if (d < bestDist) {
          bestDist = d;
          bestElement = node.element;
        }
        continue;
      }
      const l = node.left as BoxNode;
      const r = node.right as BoxNode;
      if (boxDistanceSq(l, x, y) < boxDistanceSq(r, x, y)) {
        stack[top++] = r;
        stack[top++] = l;
      } else {
        stack[top++] = l;
        stack[top++] = r;
      }
    }
    if (bestElement >= 0) this.lastElement = bestElement;
    if (bestElement >= 0) return elementStationOffset(this.elements[bestElement], x, y);
    if (best === null) throw new SolveError(`the point (${x}, ${y}) cannot be placed against the alignment`);
    return best;
  }

  /**
   * Signed curvature of the alignment at a station (1/length; positive turning right, 0 on tangents
   * and beyond either end). At a join the element that starts there counts.
   */
  curvatureAt(station: number): number {
    if (this.elements.length === 0 || station < this.startStation || station > this.endStation) return 0;
    const e = this.elements[this.elementIndexAt(station)];
    return elementCurvature(e, station - e.startStation);
  }
}

/**
 * Lay out an alignment from its description.
 * @param input start station (length units), start point (x easting, y northing), start bearing in
 * degrees clockwise from north, and elements (lengths > 0; zero-length elements are ignored).
 */
export function createAlignment(input: AlignmentInput): Alignment {
  return new Alignment(input);
}

/**
 * Azimuth (radians, clockwise from north) of a skewed line through the alignment at a station.
 * The line is the alignment's right normal turned toward up-station by `skewDeg` (degrees; positive
 * when its right end lies further up-station). Valid for |skewDeg| < 90.
 */
export function skewedLineBearing(alignmentBearing: number, skewDeg: number): number {
  return alignmentBearing + Math.PI / 2 - (skewDeg * Math.PI) / 180;
}

/** Thrown when a numerical solve on the alignment does not converge. */
export class SolveError extends Error {}

/**
 * Distance t along the ray origin + t·direction (direction a unit vector) at which the offset from the
 * alignment equals the target: a constant offset, or a flared edge (offset varying with station), in
 * which case the point's offset must equal the edge offset at the point's own station. Newton's method
 * on offset − target, whose gradient is the right normal at the foot of the perpendicular less, for a
 * flare, the edge's rate times the station's gradient (the tangent over 1 − κ·offset); bisection
 * takes over when Newton stalls on a kink of a flare. t may come out negative when the target lies behind.
 * @param target signed offset (length units, positive right) or a flared edge's station/offset list.
 * @throws SolveError when the ray runs parallel to the offset lines or does not converge.
 */
export function distanceAlongRayToOffset(alignment: Alignment, origin: PlanPoint, direction: PlanPoint, target: EdgeOffsetSpec, firstGuess = 0): number {
  const flat = typeof target === 'number' ? target : isConstantEdge(target) ? target[0].offset : null;
  // Coordinates carry rounding in proportion to their size (state-plane eastings run to millions), so
  // the step that counts as converged grows with them; Newton's last step is then far below 1e-6.
  const scale = Math.max(1, Math.abs(origin.x), Math.abs(origin.y));
  let t = firstGuess;
  let bestT = t;
  let bestF = Infinity;
  let lo = NaN;
  let hi = NaN;
  for (let iter = 0; iter < 60; iter++) {
    const q = alignment.stationOffset(origin.x + t * direction.x, origin.y + t * direction.y);
    const f = q.offset - (flat ?? edgeSpecOffsetAt(target, q.station));
    if (Math.abs(f) < Math.abs(bestF)) {
      bestT = t;
      bestF = f;
    }
    let slope = direction.x * Math.cos(q.bearing) - direction.y * Math.sin(q.bearing);
    if (flat === null) {
      if (f < 0) lo = t;
      else hi = t;
      const along = direction.x * Math.sin(q.bearing) + direction.y * Math.cos(q.bearing);
      slope -= (edgeSpecSlopeAt(target, q.station) * along) / (1 - q.curvature * q.offset);
    }
    if (Math.abs(slope) < PARALLEL_SLOPE) throw new SolveError('the line runs parallel to the alignment');
    const step = f / slope;
    t -= step;
    if (stepConverged(step, Math.max(scale, Math.abs(t)))) return t;
  }
  if (flat === null && Number.isFinite(lo) && Number.isFinite(hi)) {
    const residual = (u: number) => {
      const q = alignment.stationOffset(origin.x + u * direction.x, origin.y + u * direction.y);
      return q.offset - edgeSpecOffsetAt(target, q.station);
    };
    return bisect(residual, lo, hi, scale);
  }
  // Stalled at the floor of rounding noise: accept the best point when it is on the line to 1e-9 of scale.
  if (residualAccepted(bestF, scale)) return bestT;
  throw new SolveError('the solve for the offset did not converge');
}

/** Bisection between a negative and a positive residual, to the solver's step tolerance. */
function bisect(residual: (t: number) => number, lo: number, hi: number, scale: number): number {
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (residual(mid) < 0) lo = mid;
    else hi = mid;
    if (stepConverged(hi - lo, Math.max(scale, Math.abs(mid)))) break;
  }
  return (lo + hi) / 2;
}

/**
 * Point of a skewed line (a bent line) at a given offset from the alignment.
 * @param station station where the line crosses the alignment (length units).
 * @param skewDeg degrees from the alignment's right normal, positive when the right end is further
 * up-station; |skewDeg| < 90.
 * @param offset target offset (length units, positive right), or a flared edge's station/offset list
 * (the point whose offset equals the edge's offset at its own station). On a curve the line is
 * straight in plan while the offset is measured normal to the curve, so the point is solved numerically.
 * @returns the plan point with the station and offset found by the inverse at that point.
 */
export function pointOnSkewedLine(alignment: Alignment, station: number, skewDeg: number, offset: EdgeOffsetSpec): PlanPoint & { station: number; offset: number } {
  const base = alignment.pointAt(station);
  const lineBearing = skewedLineBearing(base.bearing, skewDeg);
  const dir = directionOf(lineBearing);
  const guess = edgeSpecOffsetAt(offset, station) / Math.cos((skewDeg * Math.PI) / 180);
  const t = distanceAlongRayToOffset(alignment, base, dir, offset, guess);
  const x = base.x + t * dir.x;
  const y = base.y + t * dir.y;
  const so = alignment.stationOffset(x, y);
  return { x, y, station: so.station, offset: so.offset };
}
