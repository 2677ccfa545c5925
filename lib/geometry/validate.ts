/**
 * Geometric checks of a bridge description, beyond what the schema can see, with messages that
 * name the span, girder, point or field so a person can fix the input.
 */
import type { GeometryIssue } from './errors';
import { GeometryError } from './errors';
import { edgeOffsetAt } from './deck-edges';
import { formatLength, formatStation } from './format';
import { bridgeDescriptionSchema, DEFAULT_CHORD_SPACES, DEFAULT_POINTS_PER_SPAN, type BridgeDescription } from './schema';
import { buildOffsetTable } from './table';
import type { OffsetTable } from './types';

/**
 * Largest magnitude any number of a description may have (length units, degrees or ratios).
 * State-plane coordinates and stations stay well below it; far larger values can only be typing
 * errors, and sums of them would overflow to Infinity inside the solvers.
 */
export const MAX_MAGNITUDE = 1e9;

function findUnusableNumbers(value: unknown, path: string, out: GeometryIssue[]): void {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push({ path, message: `${path || 'A value'} must be a finite number (found ${value})` });
    else if (Math.abs(value) > MAX_MAGNITUDE) out.push({ path, message: `${path || 'A value'} is ${value}, beyond the ±1,000,000,000 any bridge dimension can have` });
    return;
  }
  if (Array.isArray(value)) {
    value.forEach((v, i) => findUnusableNumbers(v, path ? `${path}.${i}` : String(i), out));
    return;
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) findUnusableNumbers(v, path ? `${path}.${k}` : k, out);
  }
}

/**
 * Checks that need no layout of the deck: order of stations, counts, lengths, ranges, curves against
 * offsets. Returns an empty list when the description is fit to compute.
 */
export function checkDescription(bridge: BridgeDescription): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  findUnusableNumbers(bridge, '', issues);
  if (issues.length > 0) return issues;
  const u = bridge.units;
  const len = (v: number) => formatLength(v, u);
  const sta = (v: number) => formatStation(v, u);

  // Alignment
  const al = bridge.alignment;
  let alignmentLength = 0;
  al.elements.forEach((el, i) => {
    if (!(el.length > 0)) {
      issues.push({ path: `alignment.elements.${i}.length`, message: `Alignment element ${i + 1}: the length must be greater than zero (found ${len(el.length)})` });
    } else {
      alignmentLength += el.length;
    }
    if (el.type === 'arc' && !(el.radius > 0)) {
      issues.push({ path: `alignment.elements.${i}.radius`, message: `Alignment element ${i + 1}: the arc radius must be greater than zero (found ${len(el.radius)})` });
    }
  });
  const alignmentEnd = al.start_station + alignmentLength;

  // Profile
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
    if (start < prevEnd - 1e-9) {
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

  // Cross slopes
  const cs = bridge.cross_slopes;
  for (let i = 1; i < cs.length; i++) {
    if (!(cs[i].station > cs[i - 1].station)) {
      issues.push({ path: `cross_slopes.${i}.station`, message: `Cross slope ${i + 1} at ${sta(cs[i].station)} must be up-station of cross slope ${i} at ${sta(cs[i - 1].station)}` });
    }
  }

  // Deck
  const d = { ...bridge.deck, left_edge_offset: edgeOffsetAt(bridge.deck, 'left', 0), right_edge_offset: edgeOffsetAt(bridge.deck, 'right', 0) };
  if (!(d.left_edge_offset < d.right_edge_offset)) {
    issues.push({ path: 'deck.left_edge_offset', message: `The left edge offset (${len(d.left_edge_offset)}) must be left of (less than) the right edge offset (${len(d.right_edge_offset)})` });
  } else if (!(d.left_edge_offset + d.left_barrier_width < d.right_edge_offset - d.right_barrier_width)) {
    issues.push({ path: 'deck.left_barrier_width', message: 'The barriers are wider than the deck: the gutter lines cross' });
  }
  if (!(d.slab_thickness > 0)) issues.push({ path: 'deck.slab_thickness', message: 'The slab thickness must be greater than zero' });
  if (!(d.edge_thickness > 0)) issues.push({ path: 'deck.edge_thickness', message: 'The edge thickness must be greater than zero' });
  if (d.left_barrier_width < 0) issues.push({ path: 'deck.left_barrier_width', message: 'The left barrier width must not be negative' });
  if (d.right_barrier_width < 0) issues.push({ path: 'deck.right_barrier_width', message: 'The right barrier width must not be negative' });

  // Bents
  const bents = bridge.bents;
  if (bents.length < 2) issues.push({ path: 'bents', message: 'A bridge needs at least two bents' });
  bents.forEach((b, i) => {
    if (i > 0 && !(b.station > bents[i - 1].station)) {
      issues.push({ path: `bents.${i}.station`, message: `${b.name} at ${sta(b.station)} must be up-station of ${bents[i - 1].name} at ${sta(bents[i - 1].station)}` });
    }
    // A bent at an end station typed or summed in another program may differ from this sum by
    // rounding noise; anything further out is off the alignment.
    const outside = Math.max(al.start_station - b.station, b.station - alignmentEnd);
    if (outside > ON_ALIGNMENT_TOLERANCE) {
      const by = outside >= 0.005 ? len(outside) : `${outside.toPrecision(2)} ${u}`;
      issues.push({
        path: `bents.${i}.station`,
        message: `${b.name} at ${sta(b.station)} is off the alignment, which runs from ${sta(al.start_station)} to ${sta(alignmentEnd)} (${by} ${b.station < al.start_station ? 'before its start' : 'beyond its end'})`,
      });
    }
    if (!(Math.abs(b.skew_deg) < 90)) {
      issues.push({ path: `bents.${i}.skew_deg`, message: `${b.name}: the skew must be between -90 and 90 degrees` });
    }
  });

  // Girders
  if (bridge.girders.length === 0) issues.push({ path: 'girders', message: 'A bridge needs at least one girder' });
  const names = new Set<string>();
  bridge.girders.forEach((g, i) => {
    if (names.has(g.name)) issues.push({ path: `girders.${i}.name`, girder: g.name, message: `Girder name ${g.name} is used twice` });
    names.add(g.name);
    if (g.offsets.length !== bents.length) {
      issues.push({
        path: `girders.${i}.offsets`,
        girder: g.name,
        message: `Girder ${g.name} has ${g.offsets.length} offsets but the bridge has ${bents.length} bents (one offset per bent)`,
      });
    }
  });

  // Offsets on the inside of a curve must stay short of its centre, or the offset lines fold over.
  al.elements.forEach((el, i) => {
    if (el.type !== 'arc' || !(el.radius > 0)) return;
    const inside = (o: number) => (el.direction === 'right' ? o >= el.radius : o <= -el.radius);
    const what = `the radius ${len(el.radius)} of alignment element ${i + 1} (curve to the ${el.direction})`;
    if (inside(d.left_edge_offset)) issues.push({ path: 'deck.left_edge_offset', message: `The left edge offset ${len(Math.abs(d.left_edge_offset))} is on the inside of the curve and not smaller than ${what}` });
    if (inside(d.right_edge_offset)) issues.push({ path: 'deck.right_edge_offset', message: `The right edge offset ${len(Math.abs(d.right_edge_offset))} is on the inside of the curve and not smaller than ${what}` });
    bridge.girders.forEach((g, gi) => {
      g.offsets.forEach((o, b) => {
        if (inside(o)) {
          issues.push({ path: `girders.${gi}.offsets.${b}`, girder: g.name, message: `Girder ${g.name}: the offset ${len(Math.abs(o))} at bent ${b + 1} is on the inside of the curve and not smaller than ${what}` });
        }
      });
    });
  });

  // Counts
  const n = bridge.points_per_span ?? DEFAULT_POINTS_PER_SPAN;
  if (!Number.isInteger(n) || n < 1 || n > 10000) issues.push({ path: 'points_per_span', message: `Points per span must be a whole number from 1 to 10000 (found ${n})` });
  const m = bridge.chord_spaces;
  if (m !== undefined && (!Number.isInteger(m) || m < 1 || m > 10000)) issues.push({ path: 'chord_spaces', message: `Chord spaces must be a whole number from 1 to 10000 (found ${m})` });
  // Bound the work one description can ask for, so hostile input cannot tie up the server.
  const spans = Math.max(0, bents.length - 1);
  const girderPoints = bridge.girders.length * spans * (Number.isInteger(n) ? n + 1 : 0);
  if (girderPoints > MAX_GIRDER_POINTS) {
    issues.push({ path: 'points_per_span', message: `This description asks for ${girderPoints} girder points (girders × spans × points); the limit is ${MAX_GIRDER_POINTS}. Use fewer points per span.` });
  }
  const chordPoints = 2 * spans * ((m ?? DEFAULT_CHORD_SPACES) + 1);
  if (chordPoints > MAX_CHORD_POINTS) {
    issues.push({ path: 'chord_spaces', message: `This description asks for ${chordPoints} chord offsets (2 edges × spans × divisions); the limit is ${MAX_CHORD_POINTS}. Use fewer chord spaces.` });
  }
  const form = d.form_settlement;
  if (form !== undefined && form < 0) issues.push({ path: 'deck.form_settlement', message: 'The form settlement allowance must not be negative' });

  // Surveyed tops of girder must point at a real girder point.
  const spanCount = bents.length - 1;
  (bridge.top_of_girder ?? []).forEach((t, i) => {
    if (!names.has(t.girder)) {
      issues.push({ path: `top_of_girder.${i}.girder`, girder: t.girder, message: `Top of girder ${i + 1}: there is no girder named ${t.girder}` });
    }
    if (!Number.isInteger(t.span) || t.span < 1 || t.span > spanCount) {
      issues.push({ path: `top_of_girder.${i}.span`, span: t.span, message: `Top of girder ${i + 1}: span ${t.span} does not exist (spans 1 to ${spanCount})` });
    }
    if (!Number.isInteger(t.point) || t.point < 0 || t.point > n) {
      issues.push({ path: `top_of_girder.${i}.point`, point: t.point, message: `Top of girder ${i + 1}: point ${t.point} does not exist (points 0 to ${n})` });
    }
  });

  return issues;
}

/**
 * How far (length units) a bent's station may lie outside the alignment's first and last stations and
 * still count as on it: rounding noise of a sum of element lengths, far below any printed precision.
 */
export const ON_ALIGNMENT_TOLERANCE = 1e-6;

/** Most girder points one description may ask for (girders × spans × (points per span + 1)). */
export const MAX_GIRDER_POINTS = 250_000;
/** Most chord-offset points one description may ask for (2 edges × spans × (chord spaces + 1)). */
export const MAX_CHORD_POINTS = 250_000;

/** The description checked and, when fit, the table computed in the same pass. */
export function checkAndCompute(bridge: BridgeDescription): { issues: GeometryIssue[]; table: OffsetTable | null } {
  const issues = checkDescription(bridge);
  if (issues.length > 0) return { issues, table: null };
  // Lay the bridge out with the alignment starting at the origin, then move the plan coordinates back:
  // every other number is unchanged by a translation, and the solvers keep full precision even on
  // state-plane coordinates in the millions.
  const { start_x: x0, start_y: y0 } = bridge.alignment;
  const local = { ...bridge, alignment: { ...bridge.alignment, start_x: 0, start_y: 0 } };
  const table = buildOffsetTable(local, issues);
  if (issues.length > 0) return { issues, table: null };
  for (const p of table.points) {
    p.x += x0;
    p.y += y0;
    if (p.edge_x !== null) p.edge_x += x0;
    if (p.edge_y !== null) p.edge_y += y0;
  }
  return { issues, table };
}

/**
 * All geometric problems of a description (empty when it computes cleanly): order and range of
 * stations, counts, curve radii against offsets, overlapping vertical curves, non-finite numbers,
 * and girder points at or beyond the deck edge (edge width ≤ 0), found by laying out the deck.
 */
export function validateGeometry(bridge: BridgeDescription): GeometryIssue[] {
  return checkAndCompute(bridge).issues;
}

/** Outcome of {@link parseBridge}. `schema` maps to HTTP 400, `geometry` to 422. */
export type ParseBridgeResult =
  | { ok: true; bridge: BridgeDescription }
  | { ok: false; kind: 'schema'; fields: Record<string, string[]>; message: string }
  | { ok: false; kind: 'geometry'; issues: GeometryIssue[]; message: string };

/**
 * Parse untrusted JSON into a bridge description: the zod schema first (field errors keyed by dotted
 * path such as "bents.1.station", "_" for the document as a whole), then the geometric checks.
 */
export function parseBridge(json: unknown): ParseBridgeResult {
  const schema = parseBridgeSchema(json);
  if (!schema.ok) return schema;
  const issues = validateGeometry(schema.bridge);
  if (issues.length > 0) return { ok: false, kind: 'geometry', issues, message: new GeometryError(issues).message };
  return schema;
}

/**
 * The schema step of {@link parseBridge} alone, for callers that compute next anyway
 * ({@link computeOffsetTable} runs the geometric checks itself and throws GeometryError).
 */
export function parseBridgeSchema(json: unknown): Extract<ParseBridgeResult, { kind: 'schema' }> | { ok: true; bridge: BridgeDescription } {
  const parsed = bridgeDescriptionSchema.safeParse(json);
  if (!parsed.success) {
    const fields: Record<string, string[]> = {};
    for (const issue of parsed.error.issues) {
      const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
      (fields[key] ??= []).push(issue.message);
    }
    const first = parsed.error.issues[0];
    const where = first.path.length > 0 ? `${first.path.map(String).join('.')}: ` : '';
    const more = parsed.error.issues.length > 1 ? ` (and ${parsed.error.issues.length - 1} more problems)` : '';
    return { ok: false, kind: 'schema', fields, message: `${where}${first.message}${more}` };
  }
  return { ok: true, bridge: parsed.data };
}
