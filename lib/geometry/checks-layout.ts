/**
 * Checks of a description's alignment, profile, cross slopes and deck edges that need no layout of
 * the deck (data contract, "Refused as impossible for a bridge deck"). Each pushes issues naming the
 * field path; messages say whether range limits are included.
 */
import { edgeSpecOffsetAt, type EdgeOffsetSpec } from './deck-edges';
import type { GeometryIssue } from './errors';
import { formatLength, formatStation } from './format';
import type { BridgeDescription } from './schema';
import { CURVATURE_JOIN_RELATIVE, definitelyLess } from './tolerance';

/** Steepest cross slope a deck may have either way (15 %; beyond the 12 % maximum superelevation of common highway practice, from memory). */
export const MAX_CROSS_SLOPE = 0.15;

type Element = BridgeDescription['alignment']['elements'][number];

/** Signed curvature (positive right) at the start or end of an element; null for a line. */
function endCurvature(el: Element, end: 'start' | 'end'): number | null {
  const sign = el.type === 'line' ? 0 : el.direction === 'right' ? 1 : -1;
  if (el.type === 'arc') return sign / el.radius;
  if (el.type === 'spiral') {
    const r = end === 'start' ? el.radius_start : el.radius_end;
    return r === null ? 0 : sign / r;
  }
  return null;
}

/** Element lengths, radii and spirals; returns the alignment's end station. */
export function checkAlignment(bridge: BridgeDescription, issues: GeometryIssue[]): number {
  const al = bridge.alignment;
  const len = (v: number) => formatLength(v, bridge.units);
  let alignmentLength = 0;
  al.elements.forEach((el, i) => {
    const path = `alignment.elements.${i}`;
    if (!(el.length > 0)) issues.push({ path: `${path}.length`, message: `Alignment element ${i + 1}: the length must be greater than zero (found ${len(el.length)})` });
    else alignmentLength += el.length;
    if (el.type === 'arc' && !(el.radius > 0)) issues.push({ path: `${path}.radius`, message: `Alignment element ${i + 1}: the arc radius must be greater than zero (found ${len(el.radius)})` });
    if (el.type !== 'spiral') return;
    const { radius_start: r1, radius_end: r2 } = el;
    if (r1 === null && r2 === null) {
      issues.push({ path: `${path}.radius_end`, message: `${path}.radius_end: a spiral with both radii infinite (null) is a tangent; use a line element` });
    } else if (r1 !== null && r2 !== null && r1 === r2) {
      issues.push({ path: `${path}.radius_end`, message: `${path}.radius_end: a spiral with equal radii (${len(r1)}) is a circular arc; use an arc element` });
    }
    for (const [key, r] of [
      ['radius_start', r1],
      ['radius_end', r2],
    ] as const) {
      if (r !== null && !(r > 0)) issues.push({ path: `${path}.${key}`, message: `${path}.${key}: a spiral radius must be greater than zero or null (infinite) (found ${r})` });
    }
  });
  return al.start_station + alignmentLength;
}

/**
 * Warnings (not refusals): a spiral whose end curvature differs by more than 0.1 % from that of the
 * arc it joins (signed, positive turning right).
 */
export function spiralJoinWarnings(bridge: BridgeDescription): GeometryIssue[] {
  const out: GeometryIssue[] = [];
  const els = bridge.alignment.elements;
  const compare = (spiralIndex: number, arcIndex: number, end: 'start' | 'end') => {
    const arc = els[arcIndex];
    if (!arc || arc.type !== 'arc') return;
    const ks = endCurvature(els[spiralIndex], end) ?? 0;
    const ka = endCurvature(arc, end === 'start' ? 'end' : 'start') ?? 0;
    if (Math.abs(ks - ka) > CURVATURE_JOIN_RELATIVE * Math.abs(ka)) {
      const pct = ka === 0 ? '' : ` (${((Math.abs(ks - ka) / Math.abs(ka)) * 100).toPrecision(3)} %)`;
      out.push({
        path: `alignment.elements.${spiralIndex}.${end === 'start' ? 'radius_start' : 'radius_end'}`,
        message: `Alignment element ${spiralIndex + 1} (spiral): its ${end} curvature ${ks.toPrecision(6)} differs from that of the arc it joins (element ${arcIndex + 1}, ${ka.toPrecision(6)})${pct}; the alignment kinks there`,
      });
    }
  };
  els.forEach((el, i) => {
    if (el.type !== 'spiral') return;
    compare(i, i - 1, 'start');
    compare(i, i + 1, 'end');
  });
  return out;
}

/** PVI order, curve lengths and overlapping vertical curves. */
export function checkProfile(bridge: BridgeDescription, issues: GeometryIssue[]): void {
  const sta = (v: number) => formatStation(v, bridge.units);
  const pvis = bridge.profile.pvis;
  for (let i = 1; i < pvis.length; i++) {
    if (!(pvis[i].station > pvis[i - 1].station)) {
      issues.push({ path: `profile.pvis.${i}.station`, message: `PVI ${i + 1} at ${sta(pvis[i].station)} must be up-station of PVI ${i} at ${sta(pvis[i - 1].station)}` });
    }
  }
  pvis.forEach((p, i) => {
    const L = p.curve_length ?? 0;
    if (L < 0) issues.push({ path: `profile.pvis.${i}.curve_length`, message: `PVI ${i + 1}: the vertical curve length must not be negative` });
    if (L > 0 && (i === 0 || i === pvis.length - 1)) {
      issues.push({ path: `profile.pvis.${i}.curve_length`, message: `PVI ${i + 1}: the ${i === 0 ? 'first' : 'last'} PVI cannot carry a vertical curve (it has a grade on one side only)` });
    }
  });
  for (let i = 1; i < pvis.length; i++) {
    const prevEnd = pvis[i - 1].station + (pvis[i - 1].curve_length ?? 0) / 2;
    const start = pvis[i].station - (pvis[i].curve_length ?? 0) / 2;
    if (!definitelyLess(start, prevEnd)) continue;
    const prevCurve = (pvis[i - 1].curve_length ?? 0) > 0;
    const nextCurve = (pvis[i].curve_length ?? 0) > 0;
    const a = `PVI ${i} (${sta(pvis[i - 1].station)})`;
    const b = `PVI ${i + 1} (${sta(pvis[i].station)})`;
    issues.push(
      prevCurve && nextCurve
        ? { path: `profile.pvis.${i}.curve_length`, message: `The vertical curves at ${a} and ${b} overlap: the first ends at ${sta(prevEnd)}, the second begins at ${sta(start)}` }
        : prevCurve
          ? { path: `profile.pvis.${i - 1}.curve_length`, message: `The vertical curve at ${a} ends at ${sta(prevEnd)}, beyond the next point of intersection, ${b}: shorten the curve` }
          : { path: `profile.pvis.${i}.curve_length`, message: `The vertical curve at ${b} begins at ${sta(start)}, before the previous point of intersection, ${a}: shorten the curve` },
    );
  }
}

/** A likely meant value for a cross slope typed ten or a hundred times too large. */
function meantSlope(v: number): number {
  const tenth = v / 10;
  return Math.abs(tenth) <= MAX_CROSS_SLOPE ? tenth : v / 100;
}

/** Cross-slope order and steepness (at most 15 % either way, 15 % included). */
export function checkCrossSlopes(bridge: BridgeDescription, issues: GeometryIssue[]): void {
  const sta = (v: number) => formatStation(v, bridge.units);
  const cs = bridge.cross_slopes;
  cs.forEach((c, i) => {
    if (i > 0 && !(c.station > cs[i - 1].station)) {
      issues.push({ path: `cross_slopes.${i}.station`, message: `Cross slope ${i + 1} at ${sta(c.station)} must be up-station of cross slope ${i} at ${sta(cs[i - 1].station)}` });
    }
    for (const side of ['left', 'right'] as const) {
      const v = c[side];
      if (Math.abs(v) > MAX_CROSS_SLOPE) {
        const path = `cross_slopes.${i}.${side}`;
        issues.push({ path, message: `${path}: ${v} is steeper than 15 %; did you mean ${Number(meantSlope(v).toPrecision(12))}? (cross slopes are rise/run, 0.02 = 2 %)` });
      }
    }
  });
}

/** Stations where a deck edge's offset may change slope: its listed stations (none for a constant edge). */
function edgeStations(spec: EdgeOffsetSpec): number[] {
  return typeof spec === 'number' ? [] : spec.map((r) => r.station);
}

/**
 * Deck edges at every station (edges are piecewise linear in station, so their listed stations and
 * the constant stretches beyond decide): list order, edges touching or crossing, barriers reaching
 * over the alignment, gutter lines crossing.
 */
export function checkDeckEdges(bridge: BridgeDescription, issues: GeometryIssue[]): void {
  const d = bridge.deck;
  const len = (v: number) => formatLength(v, bridge.units);
  const sta = (v: number) => formatStation(v, bridge.units);
  for (const side of ['left', 'right'] as const) {
    const spec = side === 'left' ? d.left_edge_offset : d.right_edge_offset;
    if (typeof spec === 'number') continue;
    spec.forEach((r, i) => {
      if (i > 0 && !(r.station > spec[i - 1].station)) {
        issues.push({
          path: `deck.${side}_edge_offset.${i}.station`,
          message: `deck.${side}_edge_offset.${i}.station: ${sta(r.station)} must be up-station of the row before (${sta(spec[i - 1].station)})`,
        });
      }
    });
  }
  const stations = [...new Set([...edgeStations(d.left_edge_offset), ...edgeStations(d.right_edge_offset)])].sort((a, b) => a - b);
  if (stations.length === 0) stations.push(0);
  const left = stations.map((s) => edgeSpecOffsetAt(d.left_edge_offset, s));
  const right = stations.map((s) => edgeSpecOffsetAt(d.right_edge_offset, s));
  const crossing = stations.findIndex((_, i) => !(left[i] < right[i]));
  if (crossing >= 0) {
    const at = stations.length > 1 || typeof d.left_edge_offset !== 'number' || typeof d.right_edge_offset !== 'number' ? ` at ${sta(stations[crossing])}` : '';
    issues.push({
      path: 'deck.left_edge_offset',
      message: `The left edge offset (${len(left[crossing])}) must be left of (less than) the right edge offset (${len(right[crossing])})${at}: the deck edges touch or cross`,
    });
    return;
  }
  if (stations.some((_, i) => !(left[i] + d.left_barrier_width < right[i] - d.right_barrier_width))) {
    issues.push({ path: 'deck.left_barrier_width', message: 'The barriers are wider than the deck: the gutter lines cross' });
  }
  checkBarrierOverAlignment(bridge, stations, left, right, issues);
}

/** A barrier reaching over the alignment at any station: −w_L < left(s) < 0 or 0 < right(s) < w_R (a gutter exactly on it is accepted). */
function checkBarrierOverAlignment(bridge: BridgeDescription, stations: number[], left: number[], right: number[], issues: GeometryIssue[]): void {
  const d = bridge.deck;
  const len = (v: number) => formatLength(v, bridge.units);
  const runs = (vals: number[]) => (vals.length === 1 ? [[vals[0], vals[0]]] : vals.slice(1).map((v, i) => [Math.min(v, vals[i]), Math.max(v, vals[i])]));
  const lw = d.left_barrier_width;
  const rw = d.right_barrier_width;
  if (lw > 0 && runs(left).some(([lo, hi]) => lo < 0 && hi > -lw)) {
    issues.push({
      path: 'deck.left_barrier_width',
      message: `deck.left_barrier_width: the left barrier (${len(lw)} wide) reaches over the alignment, the left edge being only ${len(Math.abs(Math.max(...left.filter((v) => v < 0), -lw)))} to its left`,
    });
  }
  if (rw > 0 && runs(right).some(([lo, hi]) => lo < rw && hi > 0)) {
    issues.push({
      path: 'deck.right_barrier_width',
      message: `deck.right_barrier_width: the right barrier (${len(rw)} wide) reaches over the alignment, the right edge being only ${len(Math.min(...right.filter((v) => v > 0), rw))} to its right`,
    });
  }
}
