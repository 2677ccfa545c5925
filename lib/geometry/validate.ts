/**
 * Geometric checks of a bridge description, beyond what the schema can see, with messages that
 * name the span, girder, point or field so a person can fix the input.
 */
import type { GeometryIssue } from './errors';
import { GeometryError } from './errors';
import { checkAlignment, checkCrossSlopes, checkDeckEdges, checkProfile, spiralJoinWarnings } from './checks-layout';
import { checkBents, checkCounts, checkCurveOffsets, checkDeflections, checkGirders, checkSurveys } from './checks-framing';
import { bridgeDescriptionSchema, SIZE_LIMITS, type BridgeDescription } from './schema';
import { ON_ALIGNMENT } from './tolerance';

export { MAX_CHORD_POINTS, MAX_GIRDER_POINTS } from './checks-framing';
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
 * offsets, deck edges at every station, cross slopes, deflection tables. Returns an empty list when
 * the description is fit to compute.
 */
export function checkDescription(bridge: BridgeDescription): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  findUnusableNumbers(bridge, '', issues);
  if (issues.length > 0) return issues;
  const tooLarge = sizeProblems(bridge);
  if (tooLarge.length > 0) return tooLarge;
  const alignmentEnd = checkAlignment(bridge, issues);
  checkProfile(bridge, issues);
  checkCrossSlopes(bridge, issues);
  checkDeckEdges(bridge, issues);
  const d = bridge.deck;
  if (!(d.slab_thickness > 0)) issues.push({ path: 'deck.slab_thickness', message: 'The slab thickness must be greater than zero' });
  if (!(d.edge_thickness > 0)) issues.push({ path: 'deck.edge_thickness', message: 'The edge thickness must be greater than zero' });
  if (d.left_barrier_width < 0) issues.push({ path: 'deck.left_barrier_width', message: 'The left barrier width must not be negative' });
  if (d.right_barrier_width < 0) issues.push({ path: 'deck.right_barrier_width', message: 'The right barrier width must not be negative' });
  const form = d.form_settlement;
  if (form !== undefined && form < 0) issues.push({ path: 'deck.form_settlement', message: 'The form settlement allowance must not be negative' });
  checkBents(bridge, alignmentEnd, issues);
  const names = checkGirders(bridge, issues);
  checkCurveOffsets(bridge, issues);
  checkCounts(bridge, issues);
  checkSurveys(bridge, names, issues);
  checkDeflections(bridge, names, issues);
  return issues;
}

/**
 * Sizes no bridge reaches (data contract): more than 10,000 alignment elements, 200 bents, 40
 * girders, 50,000 surveyed girder tops, a deflection table of more than 201 values, points per span
 * or chord spaces above 200. Looks only at lengths and two numbers of untrusted JSON, so it runs
 * before any other work.
 */
export function sizeProblems(json: unknown): GeometryIssue[] {
  const out: GeometryIssue[] = [];
  if (!json || typeof json !== 'object') return out;
  const b = json as Record<string, unknown>;
  const count = (v: unknown) => (Array.isArray(v) ? v.length : 0);
  const over = (path: string, n: number, limit: number, what: string) => {
    if (n > limit) out.push({ path, message: `${path}: ${n} ${what}; at most ${limit} (included) are accepted` });
  };
  const al = b.alignment as Record<string, unknown> | undefined;
  over('alignment.elements', count(al?.elements), SIZE_LIMITS.elements, 'alignment elements');
  over('bents', count(b.bents), SIZE_LIMITS.bents, 'bents');
  over('girders', count(b.girders), SIZE_LIMITS.girders, 'girders');
  over('top_of_girder', count(b.top_of_girder), SIZE_LIMITS.topOfGirder, 'surveyed girder tops');
  if (Array.isArray(b.deflections)) {
    b.deflections.slice(0, SIZE_LIMITS.girders * SIZE_LIMITS.bents + 1).forEach((e, i) => {
      over(`deflections.${i}.values`, count((e as Record<string, unknown> | null)?.values), SIZE_LIMITS.deflectionValues, 'deflection values');
    });
    over('deflections', b.deflections.length, SIZE_LIMITS.girders * SIZE_LIMITS.bents, 'deflection tables');
  }
  for (const [key, limit] of [
    ['points_per_span', SIZE_LIMITS.pointsPerSpan],
    ['chord_spaces', SIZE_LIMITS.chordSpaces],
  ] as const) {
    const v = b[key];
    if (typeof v === 'number' && v > limit) out.push({ path: key, message: `${key}: ${v} is above ${limit}; from 1 to ${limit} (both included) are accepted` });
  }
  return out;
}

/**
 * How far (length units) a bent's station may lie outside the alignment's first and last stations and
 * still count as on it: rounding noise of a sum of element lengths, far below any printed precision.
 */
export const ON_ALIGNMENT_TOLERANCE = ON_ALIGNMENT;

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
  // Warnings do not refuse; they travel with the table only when there are some.
  const warnings = spiralJoinWarnings(bridge);
  if (warnings.length > 0) table.warnings = warnings.map(({ path, message }) => ({ path, message }));
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
  // Sizes no bridge reaches are refused before the schema walks the whole document.
  const tooLarge = sizeProblems(json);
  if (tooLarge.length > 0) {
    const fields: Record<string, string[]> = {};
    for (const t of tooLarge) (fields[t.path] ??= []).push(t.message);
    const more = tooLarge.length > 1 ? ` (and ${tooLarge.length - 1} more problems)` : '';
    return { ok: false, kind: 'schema', fields, message: `${tooLarge[0].message}${more}` };
  }
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
