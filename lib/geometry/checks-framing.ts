/**
 * Checks of a description's bents, girders, curves against offsets, work limits, surveyed tops and
 * deflection tables (data contract, "Refused as impossible for a bridge deck"). Each pushes issues
 * naming the field path; range messages say whether their limits are included.
 */
import { edgeSpecOffsets } from './deck-edges';
import { girderSpanKey } from './deflections';
import type { GeometryIssue } from './errors';
import { formatLength, formatStation } from './format';
import { DEFAULT_CHORD_SPACES, DEFAULT_POINTS_PER_SPAN, SIZE_LIMITS, type BridgeDescription } from './schema';
import { ON_ALIGNMENT } from './tolerance';

/** Most girder points one description may ask for (girders × spans × (points per span + 1)). */
export const MAX_GIRDER_POINTS = 250_000;
/** Most chord-offset points one description may ask for (2 edges × spans × (chord spaces + 1)). */
export const MAX_CHORD_POINTS = 250_000;

/** Bent order, bents on the alignment, skews strictly between −90 and 90 degrees. */
export function checkBents(bridge: BridgeDescription, alignmentEnd: number, issues: GeometryIssue[]): void {
  const u = bridge.units;
  const sta = (v: number) => formatStation(v, u);
  const al = bridge.alignment;
  const bents = bridge.bents;
  if (bents.length < 2) issues.push({ path: 'bents', message: 'A bridge needs at least two bents' });
  bents.forEach((b, i) => {
    if (i > 0 && !(b.station > bents[i - 1].station)) {
      issues.push({ path: `bents.${i}.station`, message: `${b.name} at ${sta(b.station)} must be up-station of ${bents[i - 1].name} at ${sta(bents[i - 1].station)}` });
    }
    // A bent at an end station typed or summed in another program may differ from this sum by
    // rounding noise; anything further out is off the alignment.
    const outside = Math.max(al.start_station - b.station, b.station - alignmentEnd);
    if (outside > ON_ALIGNMENT) {
      const by = outside >= 0.005 ? formatLength(outside, u) : `${outside.toPrecision(2)} ${u}`;
      issues.push({
        path: `bents.${i}.station`,
        message: `${b.name} at ${sta(b.station)} is off the alignment, which runs from ${sta(al.start_station)} to ${sta(alignmentEnd)} (${by} ${b.station < al.start_station ? 'before its start' : 'beyond its end'})`,
      });
    }
    if (!(Math.abs(b.skew_deg) < 90)) {
      issues.push({ path: `bents.${i}.skew_deg`, message: `${b.name}: the skew must be strictly between -90 and 90 degrees (found ${b.skew_deg})` });
    }
  });
}

/** Girder names unique and one offset per bent; returns the set of names. */
export function checkGirders(bridge: BridgeDescription, issues: GeometryIssue[]): Set<string> {
  if (bridge.girders.length === 0) issues.push({ path: 'girders', message: 'A bridge needs at least one girder' });
  const names = new Set<string>();
  bridge.girders.forEach((g, i) => {
    if (names.has(g.name)) issues.push({ path: `girders.${i}.name`, girder: g.name, message: `Girder name ${g.name} is used twice` });
    names.add(g.name);
    if (g.offsets.length !== bridge.bents.length) {
      issues.push({ path: `girders.${i}.offsets`, girder: g.name, message: `Girder ${g.name} has ${g.offsets.length} offsets but the bridge has ${bridge.bents.length} bents (one offset per bent)` });
    }
  });
  return names;
}

/**
 * Offsets on the inside of a curve must stay short of its centre, or the offset lines fold over: an
 * arc's radius, or a spiral's smallest radius, against every edge offset (every listed offset of a
 * flared edge) and girder offset.
 */
export function checkCurveOffsets(bridge: BridgeDescription, issues: GeometryIssue[]): void {
  const len = (v: number) => formatLength(v, bridge.units);
  const d = bridge.deck;
  bridge.alignment.elements.forEach((el, i) => {
    if (el.type === 'line') return;
    const radii = el.type === 'arc' ? [el.radius] : [el.radius_start, el.radius_end].filter((r): r is number => r !== null);
    if (radii.length === 0 || !radii.every((r) => r > 0)) return;
    const radius = Math.min(...radii);
    const inside = (o: number) => (el.direction === 'right' ? o >= radius : o <= -radius);
    const what = `the ${el.type === 'arc' ? 'radius' : 'smallest radius'} ${len(radius)} of alignment element ${i + 1} (${el.type === 'arc' ? 'curve' : 'spiral'} to the ${el.direction})`;
    for (const side of ['left', 'right'] as const) {
      const o = edgeSpecOffsets(side === 'left' ? d.left_edge_offset : d.right_edge_offset).find(inside);
      if (o !== undefined) issues.push({ path: `deck.${side}_edge_offset`, message: `The ${side} edge offset ${len(Math.abs(o))} is on the inside of the curve and not smaller than ${what}` });
    }
    bridge.girders.forEach((g, gi) => {
      g.offsets.forEach((o, b) => {
        if (inside(o))
          issues.push({
            path: `girders.${gi}.offsets.${b}`,
            girder: g.name,
            message: `Girder ${g.name}: the offset ${len(Math.abs(o))} at bent ${b + 1} is on the inside of the curve and not smaller than ${what}`,
          });
      });
    });
  });
}

/** Points per span and chord spaces (1 to 200, both included) and the total work one description asks for. */
export function checkCounts(bridge: BridgeDescription, issues: GeometryIssue[]): void {
  const n = bridge.points_per_span ?? DEFAULT_POINTS_PER_SPAN;
  const maxN = SIZE_LIMITS.pointsPerSpan;
  if (!Number.isInteger(n) || n < 1 || n > maxN) issues.push({ path: 'points_per_span', message: `points_per_span: must be a whole number from 1 to ${maxN}, both included (found ${n})` });
  const m = bridge.chord_spaces;
  const maxM = SIZE_LIMITS.chordSpaces;
  if (m !== undefined && (!Number.isInteger(m) || m < 1 || m > maxM))
    issues.push({ path: 'chord_spaces', message: `chord_spaces: must be a whole number from 1 to ${maxM}, both included (found ${m})` });
  // Bound the work one description can ask for, so hostile input cannot tie up the server.
  const spans = Math.max(0, bridge.bents.length - 1);
  const girderPoints = bridge.girders.length * spans * (Number.isInteger(n) ? n + 1 : 0);
  if (girderPoints > MAX_GIRDER_POINTS) {
    issues.push({
      path: 'points_per_span',
      message: `This description asks for ${girderPoints} girder points (girders × spans × points); the limit is ${MAX_GIRDER_POINTS}. Use fewer points per span.`,
    });
  }
  const chordPoints = 2 * spans * ((m ?? DEFAULT_CHORD_SPACES) + 1);
  if (chordPoints > MAX_CHORD_POINTS) {
    issues.push({ path: 'chord_spaces', message: `This description asks for ${chordPoints} chord offsets (2 edges × spans × divisions); the limit is ${MAX_CHORD_POINTS}. Use fewer chord spaces.` });
  }
}

/** Surveyed tops of girder must point at a real girder point. */
export function checkSurveys(bridge: BridgeDescription, names: Set<string>, issues: GeometryIssue[]): void {
  const spanCount = bridge.bents.length - 1;
  const n = bridge.points_per_span ?? DEFAULT_POINTS_PER_SPAN;
  (bridge.top_of_girder ?? []).forEach((t, i) => {
    if (!names.has(t.girder)) issues.push({ path: `top_of_girder.${i}.girder`, girder: t.girder, message: `Top of girder ${i + 1}: there is no girder named ${t.girder}` });
    if (!Number.isInteger(t.span) || t.span < 1 || t.span > spanCount) {
      issues.push({ path: `top_of_girder.${i}.span`, span: t.span, message: `Top of girder ${i + 1}: span ${t.span} does not exist (spans 1 to ${spanCount})` });
    }
    if (!Number.isInteger(t.point) || t.point < 0 || t.point > n) {
      issues.push({ path: `top_of_girder.${i}.point`, point: t.point, message: `Top of girder ${i + 1}: point ${t.point} does not exist (points 0 to ${n})` });
    }
  });
}

/** Deflection entries: a known girder and span, 2 to 201 values (both included), one entry per girder and span. */
export function checkDeflections(bridge: BridgeDescription, names: Set<string>, issues: GeometryIssue[]): void {
  const spanCount = bridge.bents.length - 1;
  const seen = new Map<string, number>();
  (bridge.deflections ?? []).forEach((e, i) => {
    const path = `deflections.${i}`;
    if (!names.has(e.girder)) issues.push({ path: `${path}.girder`, girder: e.girder, message: `${path}.girder: there is no girder named ${e.girder}` });
    if (!Number.isInteger(e.span) || e.span < 1 || e.span > spanCount) {
      issues.push({ path: `${path}.span`, span: e.span, message: `${path}.span: span ${e.span} does not exist (spans 1 to ${spanCount}, both included)` });
    }
    const count = e.values.length;
    if (count < 2 || count > SIZE_LIMITS.deflectionValues) {
      issues.push({ path: `${path}.values`, message: `${path}.values: a deflection table needs from 2 to ${SIZE_LIMITS.deflectionValues} values, both included (found ${count})` });
    }
    const key = girderSpanKey(e.girder, e.span);
    const first = seen.get(key);
    if (first !== undefined) {
      issues.push({ path, girder: e.girder, span: e.span, message: `${path}: a second deflection table for girder ${e.girder}, span ${e.span} (the first is deflections.${first})` });
    } else seen.set(key, i);
  });
}
