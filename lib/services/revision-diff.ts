/**
 * What changed between two geometry revisions of a bridge: the description field by field, and the
 * edge width (girder point → deck edge, bridge units) of every exterior girder point, per span and
 * side. Pure: the caller loads the two descriptions.
 */
import { computeOffsetTable, GeometryError, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import { LENGTH_TOLERANCE, type Units } from '@/lib/units';

export type Scalar = string | number | boolean | null;

/** One field whose value differs; `before` or `after` is undefined when the field is new or gone. */
export interface FieldChange {
  /** Dotted path in the description, e.g. "girders.0.offsets.2". */
  path: string;
  before: Scalar | undefined;
  after: Scalar | undefined;
}

/** One exterior girder point whose edge width changed (or that exists in only one revision). */
export interface EdgeWidthChange {
  span: number;
  side: 'left' | 'right';
  girder: string;
  point: number;
  /** Edge widths in bridge units; null when the point does not exist in that revision. */
  before: number | null;
  after: number | null;
  /** after − before (bridge units); null when either is missing. Positive: the overhang got wider. */
  difference: number | null;
}

/** Per span and side: the range of edge widths before and after and the largest change at a point. */
export interface SpanWidthChange {
  span: number;
  side: 'left' | 'right';
  before: { min: number; max: number } | null;
  after: { min: number; max: number } | null;
  /** Largest |after − before| over the span's points of that side (bridge units); null when not comparable. */
  largest_change: number | null;
}

export interface RevisionDiff {
  units: Units;
  fields: FieldChange[];
  edge_widths: EdgeWidthChange[];
  spans: SpanWidthChange[];
  /** Why a revision's table could not be computed (then no edge widths are compared). */
  before_problem: string | null;
  after_problem: string | null;
}

/** Edge widths that differ by less than this (bridge units) count as unchanged: far below any display rounding. */
export const EDGE_WIDTH_TOLERANCE = LENGTH_TOLERANCE;

function flatten(value: unknown, path: string, out: Map<string, Scalar>): void {
  if (Array.isArray(value)) {
    if (value.length === 0) out.set(path, '(none)');
    value.forEach((v, i) => flatten(v, path ? `${path}.${i}` : String(i), out));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) flatten(v, path ? `${path}.${k}` : k, out);
  } else if (value === null || typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean') {
    out.set(path, value);
  }
}

/** Orders paths the way the description reads: sections in contract order, then indices numerically. */
const SECTION_ORDER = ['name', 'units', 'alignment', 'profile', 'cross_slopes', 'deck', 'bents', 'girders', 'points_per_span', 'chord_spaces', 'top_of_girder'];
function comparePaths(a: string, b: string): number {
  const pa = a.split('.');
  const pb = b.split('.');
  const rank = (s: string) => {
    const i = SECTION_ORDER.indexOf(s);
    return i < 0 ? SECTION_ORDER.length : i;
  };
  if (pa[0] !== pb[0]) return rank(pa[0]) - rank(pb[0]) || pa[0].localeCompare(pb[0]);
  for (let i = 1; i < Math.min(pa.length, pb.length); i++) {
    if (pa[i] === pb[i]) continue;
    const na = Number(pa[i]);
    const nb = Number(pb[i]);
    if (Number.isInteger(na) && Number.isInteger(nb)) return na - nb;
    const ka = FIELD_KEYS.indexOf(pa[i]);
    const kb = FIELD_KEYS.indexOf(pb[i]);
    if (ka >= 0 && kb >= 0) return ka - kb;
    return pa[i].localeCompare(pb[i]);
  }
  return pa.length - pb.length;
}

/** Fields in the order the contract lists them (for a readable list of changes). */
const FIELD_KEYS = [
  'start_station',
  'start_x',
  'start_y',
  'start_bearing_deg',
  'type',
  'length',
  'radius',
  'direction',
  'name',
  'station',
  'elevation',
  'curve_length',
  'left',
  'right',
  'skew_deg',
  'layout',
  'offsets',
  'left_edge_offset',
  'right_edge_offset',
  'slab_thickness',
  'edge_thickness',
  'left_barrier_width',
  'right_barrier_width',
  'form_settlement',
  'girder',
  'span',
  'point',
];

/** Field-by-field differences of two descriptions (arrays compared by position). */
export function diffFields(before: unknown, after: unknown): FieldChange[] {
  const a = new Map<string, Scalar>();
  const b = new Map<string, Scalar>();
  flatten(before, '', a);
  flatten(after, '', b);
  const paths = new Set([...a.keys(), ...b.keys()]);
  const changes: FieldChange[] = [];
  for (const path of paths) {
    const x = a.get(path);
    const y = b.get(path);
    if (x === y || (typeof x === 'number' && typeof y === 'number' && Object.is(x, y))) continue;
    changes.push({ path, before: a.has(path) ? x : undefined, after: b.has(path) ? y : undefined });
  }
  return changes.sort((p, q) => comparePaths(p.path, q.path));
}

function tableOf(description: BridgeDescription): { table: OffsetTable | null; problem: string | null } {
  try {
    return { table: computeOffsetTable(description), problem: null };
  } catch (err) {
    if (err instanceof GeometryError) return { table: null, problem: err.message };
    return { table: null, problem: 'The offset table of this revision could not be computed.' };
  }
}

type Row = { span: number; side: 'left' | 'right'; girder: string; point: number; width: number };

function exteriorRows(table: OffsetTable): Map<string, Row> {
  const rows = new Map<string, Row>();
  for (const p of table.points) {
    if (p.side === 'interior' || p.edge_width === null) continue;
    rows.set(`${p.span}|${p.side}|${p.girder}|${p.point}`, { span: p.span, side: p.side, girder: p.girder, point: p.point, width: p.edge_width });
  }
  return rows;
}

function ranges(rows: Map<string, Row>): Map<string, { min: number; max: number }> {
  const out = new Map<string, { min: number; max: number }>();
  for (const r of rows.values()) {
    const key = `${r.span}|${r.side}`;
    const cur = out.get(key);
    if (!cur) out.set(key, { min: r.width, max: r.width });
    else {
      cur.min = Math.min(cur.min, r.width);
      cur.max = Math.max(cur.max, r.width);
    }
  }
  return out;
}

/**
 * Compares two revisions' descriptions: the fields that changed, every exterior girder point whose
 * edge width changed by more than {@link EDGE_WIDTH_TOLERANCE} (with before, after and after − before
 * in bridge units), and the edge-width range of each span and side before and after.
 */
export function diffRevisions(before: BridgeDescription, after: BridgeDescription): RevisionDiff {
  const fields = diffFields(before, after);
  const a = tableOf(before);
  const b = tableOf(after);
  const edge_widths: EdgeWidthChange[] = [];
  const spans: SpanWidthChange[] = [];
  if (a.table && b.table) {
    const ra = exteriorRows(a.table);
    const rb = exteriorRows(b.table);
    const largest = new Map<string, number>();
    for (const key of new Set([...ra.keys(), ...rb.keys()])) {
      const x = ra.get(key);
      const y = rb.get(key);
      const r = (y ?? x) as Row;
      const difference = x && y ? y.width - x.width : null;
      const spanKey = `${r.span}|${r.side}`;
      if (difference !== null) largest.set(spanKey, Math.max(largest.get(spanKey) ?? 0, Math.abs(difference)));
      if (difference !== null && Math.abs(difference) <= EDGE_WIDTH_TOLERANCE) continue;
      edge_widths.push({ span: r.span, side: r.side, girder: r.girder, point: r.point, before: x ? x.width : null, after: y ? y.width : null, difference });
    }
    const sideRank = (s: string) => (s === 'left' ? 0 : 1);
    edge_widths.sort((p, q) => p.span - q.span || sideRank(p.side) - sideRank(q.side) || p.girder.localeCompare(q.girder) || p.point - q.point);
    const ga = ranges(ra);
    const gb = ranges(rb);
    for (const key of new Set([...ga.keys(), ...gb.keys()])) {
      const [span, side] = key.split('|');
      spans.push({
        span: Number(span),
        side: side as 'left' | 'right',
        before: ga.get(key) ?? null,
        after: gb.get(key) ?? null,
        largest_change: ga.has(key) && gb.has(key) ? (largest.get(key) ?? 0) : null,
      });
    }
    spans.sort((p, q) => p.span - q.span || sideRank(p.side) - sideRank(q.side));
  }
  return { units: after.units, fields, edge_widths, spans, before_problem: a.problem, after_problem: b.problem };
}
