/**
 * Top-of-girder survey: preview (checks every row, writes nothing), commit (stores the rows in one
 * transaction, replacing earlier values of the same points while keeping them as history) and the
 * stored values that the offset table merges over the description's own `top_of_girder`.
 */
import { Op, type Transaction } from 'sequelize';
import { Bridge, GirderSurvey, SurveyImport, User } from '@/models';
import { db } from '@/lib/db/connection';
import { ConflictError, ValidationError } from '@/lib/errors';
import { requireBridge } from './require-bridge';
import type { SessionUser } from '@/lib/auth/session';
import { DEFAULT_POINTS_PER_SPAN, type BridgeDescription } from '@/lib/geometry';
import { delimiterName, parseSurveyCsv, type SurveyCsvReport, type SurveyFraming } from '@/lib/import/survey-csv';
import { getRevisionDescription } from './bridges';
import { audit } from './audit';
import { refreshStatus } from './bridge-status';
import { nearlyZero } from '@/lib/units';

export { MAX_SURVEY_CSV_CHARS, surveyUploadSchema } from './survey-types';
export type { SurveyUpload, SurveyPreviewRow, SurveyPreview, SurveyValue, SurveyImportSummary, SurveyListing } from './survey-types';
import type { SurveyUpload, SurveyPreviewRow, SurveyPreview, SurveyValue, SurveyListing } from './survey-types';

const keyOf = (girder: string, span: number, point: number) => `${girder}\u0000${span}\u0000${point}`;

/**
 * Where on the girder a surveyed point lies, independent of how the span is divided: girder, span and
 * the fraction k/n along the span. A value imported at 20th point 10 is the same place as tenth point 5.
 */
const placeOf = (girder: string, span: number, point: number, divisions: number) => `${girder}\u0000${span}\u0000${(point / divisions).toFixed(9)}`;

/** Point number of fraction k/n on a span divided into `divisions`, or null when it falls between points. */
function pointAt(point: number, pointsAtImport: number, divisions: number): number | null {
  const k = (point * divisions) / pointsAtImport;
  const r = Math.round(k);
  return nearlyZero(k - r) ? r : null;
}

/** A stored value with the points per span of the revision its import was checked against. */
type Placed = { row: GirderSurvey; divisions: number };

const divisionsCache = new Map<string, number>();

/** Points per span of a stored revision (revisions never change, so the answer is cached). */
async function divisionsOfRevision(bridgeId: number, revision: number): Promise<number> {
  const key = `${bridgeId}:${revision}`;
  let n = divisionsCache.get(key);
  if (n === undefined) {
    n = (await getRevisionDescription(bridgeId, revision)).points_per_span ?? DEFAULT_POINTS_PER_SPAN;
    if (divisionsCache.size > 500) divisionsCache.clear();
    divisionsCache.set(key, n);
  }
  return n;
}

/** Rows of a bridge (all, or only the current ones) with the division each was surveyed on, oldest first. */
async function placedRows(bridgeId: number, onlyCurrent: boolean, transaction?: Transaction): Promise<Placed[]> {
  const rows = await GirderSurvey.findAll({
    where: onlyCurrent ? { bridgeId, replacedAt: { [Op.is]: null } } : { bridgeId },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'ASC']],
    transaction,
  });
  const imports = await SurveyImport.findAll({ where: { bridgeId }, attributes: ['id', 'revision'], transaction });
  const revisionOf = new Map(imports.map((i) => [i.id, i.revision]));
  const out: Placed[] = [];
  for (const row of rows) {
    const revision = revisionOf.get(row.importId);
    out.push({ row, divisions: revision === undefined ? DEFAULT_POINTS_PER_SPAN : await divisionsOfRevision(bridgeId, revision) });
  }
  return out;
}

/** Girders, span count and points per span of a description: what survey rows are checked against. */
export function framingOf(description: BridgeDescription): SurveyFraming {
  return {
    girders: description.girders.map((g) => g.name),
    spanCount: description.bents.length - 1,
    pointsPerSpan: description.points_per_span ?? DEFAULT_POINTS_PER_SPAN,
  };
}

function fits(framing: SurveyFraming, v: { girder: string; span: number; point: number }): boolean {
  return framing.girders.includes(v.girder) && v.span >= 1 && v.span <= framing.spanCount && v.point >= 0 && v.point <= framing.pointsPerSpan;
}

async function check(bridge: Bridge, csv: string): Promise<{ report: SurveyCsvReport; preview: SurveyPreview; divisions: number }> {
  const description = await getRevisionDescription(bridge.id, bridge.currentRevision);
  const framing = framingOf(description);
  const divisions = framing.pointsPerSpan;
  const report = parseSurveyCsv(csv, framing);
  const stored = new Map((await placedRows(bridge.id, true)).map(({ row: r, divisions: n }) => [placeOf(r.girder, r.span, r.point, n), r.elevation]));
  const rows: SurveyPreviewRow[] = report.rows.map((r) => ({
    ...r,
    replaces: r.span !== null && r.point !== null ? (stored.get(placeOf(r.girder, r.span, r.point, divisions)) ?? null) : null,
  }));
  return {
    report,
    divisions,
    preview: {
      bridge_id: bridge.id,
      revision: bridge.currentRevision,
      units: bridge.units,
      header: report.header,
      delimiter: delimiterName(report.delimiter),
      decimal_comma: report.decimalComma,
      file_problems: report.fileProblems,
      rows,
      summary: { rows: rows.length, good: report.good, bad: report.bad, replacing: rows.filter((r) => r.problems.length === 0 && r.replaces !== null).length },
    },
  };
}

/** Checks a survey CSV against the bridge's latest revision and reports every row. Writes nothing. */
export async function previewSurvey(id: string, input: SurveyUpload): Promise<SurveyPreview> {
  const bridge = await requireBridge(id);
  return (await check(bridge, input.csv)).preview;
}

/** The report's problems as API field errors: one entry per bad line ("line.7"), plus "csv" for the file. */
function reportFields(preview: SurveyPreview): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  if (preview.file_problems.length) fields.csv = [...preview.file_problems];
  for (const r of preview.rows) if (r.problems.length) fields[`line.${r.line}`] = r.problems;
  return fields;
}

/**
 * Stores a survey CSV when every row is good (400 with one field error per bad line otherwise, and
 * nothing written). A point already surveyed gets the new value; the old row stays as history,
 * stamped with the time it was replaced. One transaction; one audit event.
 */
export async function commitSurvey(user: SessionUser, id: string, input: SurveyUpload): Promise<{ import_id: number; stored: number; replaced: number; revision: number; delimiter: string }> {
  const bridge = await requireBridge(id);
  if (input.revision !== undefined && input.revision !== bridge.currentRevision) {
    throw new ConflictError(`The rows were checked against revision ${input.revision}, but the bridge is now at revision ${bridge.currentRevision}. Check the file again.`);
  }
  const { report, preview, divisions } = await check(bridge, input.csv);
  if (preview.summary.bad > 0 || preview.file_problems.length > 0 || preview.rows.length === 0) {
    const count = preview.summary.bad;
    const message =
      count > 0
        ? `${count} of ${preview.summary.rows} rows have problems; nothing was stored. Correct them and import the file again.`
        : `${preview.file_problems[0] ?? 'The file holds no survey rows.'} Nothing was stored.`;
    throw new ValidationError(message, reportFields(preview));
  }
  const sequelize = await db();
  const stored = await sequelize.transaction(async (transaction) => {
    const now = new Date();
    const record = await SurveyImport.create(
      { bridgeId: bridge.id, userId: user.id, filename: input.filename, revision: bridge.currentRevision, rowCount: report.rows.length, replacedCount: 0 },
      { transaction },
    );
    // Replace the current value at the same place on the girder, even when it was surveyed on another division of the span.
    const incoming = new Set(report.rows.map((r) => placeOf(r.girder, r.span!, r.point!, divisions)));
    const superseded = (await placedRows(bridge.id, true, transaction)).filter(({ row: r, divisions: n }) => incoming.has(placeOf(r.girder, r.span, r.point, n)));
    if (superseded.length > 0) {
      await GirderSurvey.update({ replacedAt: now }, { where: { id: superseded.map((p) => p.row.id) }, transaction });
    }
    const replaced = new Set(superseded.map(({ row: r, divisions: n }) => placeOf(r.girder, r.span, r.point, n))).size;
    await GirderSurvey.bulkCreate(
      report.rows.map((r) => ({ bridgeId: bridge.id, importId: record.id, girder: r.girder, span: r.span!, point: r.point!, elevation: r.elevation!, userId: user.id })),
      { transaction },
    );
    record.replacedCount = replaced;
    await record.save({ transaction });
    await audit(
      user.id,
      'survey.import',
      'bridge',
      bridge.id,
      { import_id: record.id, filename: input.filename, revision: bridge.currentRevision, rows: report.rows.length, replaced, delimiter: preview.delimiter },
      transaction,
    );
    return { import_id: record.id, stored: report.rows.length, replaced, revision: bridge.currentRevision, delimiter: preview.delimiter };
  });
  // Surveyed points add level-bar readings to check, which changes what passes.
  await refreshStatus(bridge.id);
  return stored;
}

/** Stored values (current with their history) and the import log of a bridge, for the survey page and API. */
export async function listSurvey(id: string | number): Promise<SurveyListing> {
  const bridge = await requireBridge(id);
  const framing = framingOf(await getRevisionDescription(bridge.id, bridge.currentRevision));
  const [placed, imports] = await Promise.all([
    placedRows(bridge.id, false),
    SurveyImport.findAll({ where: { bridgeId: bridge.id }, include: [{ model: User, as: 'user', attributes: ['name'] }], order: [['id', 'DESC']] }),
  ]);
  const nameOf = (r: GirderSurvey | SurveyImport) => (r as unknown as { user?: User | null }).user?.name ?? null;
  const values = new Map<string, SurveyValue>();
  for (const { row: r, divisions } of placed.filter((p) => p.row.replacedAt === null)) {
    const now = pointAt(r.point, divisions, framing.pointsPerSpan);
    values.set(placeOf(r.girder, r.span, r.point, divisions), {
      girder: r.girder,
      span: r.span,
      point: r.point,
      points_per_span: divisions,
      point_on_current_revision: now !== null && fits(framing, { girder: r.girder, span: r.span, point: now }) ? now : null,
      elevation: r.elevation,
      imported_by: nameOf(r),
      imported_at: r.createdAt.toISOString(),
      history: [],
    });
  }
  for (const { row: r, divisions } of [...placed].reverse().filter((p) => p.row.replacedAt !== null)) {
    values.get(placeOf(r.girder, r.span, r.point, divisions))?.history.push({
      elevation: r.elevation,
      imported_by: nameOf(r),
      imported_at: r.createdAt.toISOString(),
      replaced_at: (r.replacedAt as Date).toISOString(),
    });
  }
  const girderOrder = new Map(framing.girders.map((g, i) => [g, i]));
  const sorted = [...values.values()].sort(
    (a, b) =>
      a.span - b.span || (girderOrder.get(a.girder) ?? 1e9) - (girderOrder.get(b.girder) ?? 1e9) || a.girder.localeCompare(b.girder) || a.point / a.points_per_span - b.point / b.points_per_span,
  );
  return {
    bridge_id: bridge.id,
    revision: bridge.currentRevision,
    units: bridge.units,
    points_per_span: framing.pointsPerSpan,
    values: sorted,
    imports: imports.map((i) => ({
      id: i.id,
      filename: i.filename,
      revision: i.revision,
      rows: i.rowCount,
      replaced: i.replacedCount,
      imported_by: nameOf(i),
      imported_at: i.createdAt.toISOString(),
    })),
  };
}

/** A stored value and the points per span it was surveyed on. */
export type SurveyEntry = { girder: string; span: number; point: number; pointsPerSpan: number; elevation: number };

/**
 * The current surveyed value of every point of a bridge, oldest first, and a stamp that changes
 * whenever an import is committed (for cache keys).
 */
export async function storedSurvey(bridgeId: number): Promise<{ stamp: string; entries: SurveyEntry[] }> {
  const placed = await placedRows(bridgeId, true);
  const latest = placed.reduce((m, p) => Math.max(m, p.row.importId), 0);
  return {
    stamp: `${latest}:${placed.length}`,
    entries: placed.map(({ row: r, divisions }) => ({ girder: r.girder, span: r.span, point: r.point, pointsPerSpan: divisions, elevation: r.elevation })),
  };
}

/**
 * The description with the stored survey merged over its own `top_of_girder` (the survey wins per
 * point). Each value goes to the girder point at the same fraction of the span (20th point 10 is tenth
 * point 5); values that fall between the description's points, or on girders or spans it no longer
 * has, are left out. A later entry wins over an earlier one at the same point.
 */
export function withSurvey(description: BridgeDescription, entries: SurveyEntry[]): BridgeDescription {
  const framing = framingOf(description);
  const byPoint = new Map<string, { girder: string; span: number; point: number; elevation: number }>();
  for (const e of entries) {
    const point = pointAt(e.point, e.pointsPerSpan, framing.pointsPerSpan);
    if (point === null || !fits(framing, { girder: e.girder, span: e.span, point })) continue;
    byPoint.set(keyOf(e.girder, e.span, point), { girder: e.girder, span: e.span, point, elevation: e.elevation });
  }
  if (byPoint.size === 0) return description;
  const own = (description.top_of_girder ?? []).filter((t) => !byPoint.has(keyOf(t.girder, t.span, t.point)));
  return { ...description, top_of_girder: [...own, ...byPoint.values()] };
}
