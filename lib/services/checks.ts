import { z } from 'zod';
import { ValidationError } from '@/lib/errors';
import type { SessionUser } from '@/lib/auth/session';
import { db } from '@/lib/db/connection';
import { bracketVerdict } from '@/lib/field/verdict';
import type { OffsetPoint, OffsetTable } from '@/lib/geometry';
import { Attachment, FieldCheck, User } from '@/models';
import { attachmentUrls } from './attachment-urls';
import { audit } from './audit';
import { refreshStatus } from './bridge-status';
import { offsetsForBridge, offsetsForRevision } from './offsets';
import { fieldSettingsOf } from './tolerances';
import { requireBridge } from './require-bridge';

const measurement = (what: string) =>
  z
    .number({ error: `${what} must be a number in the bridge's units (decimal feet or metres).` })
    .refine(Number.isFinite, `${what} must be a finite number.`)
    .refine((v) => Math.abs(v) <= 1000, `${what} is far outside anything a bracket could measure.`)
    .nullable()
    .optional();

/** Body of POST /api/bridges/:id/checks. Lengths in the bridge's units. */
export const createCheckSchema = z
  .object({
    span: z.number({ error: 'Span must be a span number (1, 2, …).' }).int('Span must be a whole number.').positive('Span numbers start at 1.'),
    girder: z.string({ error: 'Girder must be a girder name such as G1.' }).trim().min(1, 'Name the girder.').max(60, 'That girder name is too long.'),
    point: z.number({ error: 'Point must be a girder point number (0, 1, 2, …).' }).int('Point must be a whole number.').min(0, 'Girder points start at 0.'),
    measured_edge_width: measurement('The measured edge width').refine((v) => v == null || v > 0, 'The edge width is a distance; it must be greater than zero.'),
    measured_drop_from_girder_top: measurement('The level-bar reading'),
    note: z.string({ error: 'The note must be text.' }).trim().max(500, 'Keep the note under 500 characters.').optional().default(''),
    client_key: z
      .string({ error: 'client_key must be text.' })
      .regex(/^[A-Za-z0-9_-]{8,64}$/, 'client_key must be 8 to 64 letters, digits, - or _.')
      .optional(),
    /** The geometry revision whose targets the measurement was taken against (a phone that was offline). */
    revision: z.number({ error: 'revision must be a revision number (1, 2, …).' }).int('revision must be a whole number.').positive('Revisions start at 1.').optional(),
  })
  .refine((v) => v.measured_edge_width != null || v.measured_drop_from_girder_top != null, {
    message: 'Enter the measured edge width, the level-bar reading, or both.',
    path: ['measured_edge_width'],
  });

export type CheckInput = z.infer<typeof createCheckSchema>;

export type CheckPhoto = { id: number; name: string; content_type: string; url: string; thumbnail_url: string | null };

/** A check as the API returns it: measured, computed, deviation (measured − computed) and verdict. */
export type CheckJson = {
  id: number;
  revision: number;
  span: number;
  girder: string;
  side: string;
  point: number;
  station: number;
  measured_edge_width: number | null;
  computed_edge_width: number | null;
  width_deviation: number | null;
  width_tolerance: number;
  width_pass: boolean | null;
  measured_drop_from_girder_top: number | null;
  computed_drop_from_girder_top: number | null;
  reading_deviation: number | null;
  reading_tolerance: number;
  reading_pass: boolean | null;
  pass: boolean;
  note: string;
  supersedes_id: number | null;
  superseded_by: number | null;
  by: string | null;
  created_at: string;
  /** The key the phone gave the measurement when it was sent from its offline store; null otherwise. */
  client_key: string | null;
  photos: CheckPhoto[];
};

/** Exterior girder rows of the table (the brackets), by span, girder and point. */
export function bracketRows(table: OffsetTable): OffsetPoint[] {
  return table.points.filter((p) => p.side !== 'interior');
}

/**
 * The table row for span/girder/point, or a 400 that says which part is wrong and what would be
 * right. Interior girders carry no overhang and are refused.
 */
export function findBracket(table: OffsetTable, span: number, girder: string, point: number): OffsetPoint {
  const spans = [...new Set(table.points.map((p) => p.span))].sort((a, b) => a - b);
  if (!spans.includes(span)) {
    throw new ValidationError(`This bridge has no span ${span}.`, { span: [`Choose a span from ${spans[0]} to ${spans[spans.length - 1]}.`] });
  }
  const inSpan = table.points.filter((p) => p.span === span);
  const exterior = [...new Set(inSpan.filter((p) => p.side !== 'interior').map((p) => p.girder))];
  const girders = [...new Set(inSpan.map((p) => p.girder))];
  if (!girders.includes(girder)) {
    throw new ValidationError(`This bridge has no girder "${girder}".`, { girder: [`Choose an exterior girder: ${exterior.join(' or ')}.`] });
  }
  if (!exterior.includes(girder)) {
    throw new ValidationError(`${girder} is an interior girder; overhang checks are made at the exterior girders (${exterior.join(' and ')}).`, {
      girder: [`${girder} carries no overhang. Choose ${exterior.join(' or ')}.`],
    });
  }
  const rows = inSpan.filter((p) => p.girder === girder);
  const row = rows.find((p) => p.point === point);
  if (!row) {
    const last = Math.max(...rows.map((p) => p.point));
    throw new ValidationError(`Span ${span} has girder points 0 to ${last}; there is no point ${point}.`, { point: [`Choose a point from 0 to ${last}.`] });
  }
  return row;
}

function toJson(c: FieldCheck, by: string | null, supersededBy: number | null, photos: CheckPhoto[]): CheckJson {
  return {
    id: c.id,
    revision: c.revision,
    span: c.span,
    girder: c.girder,
    side: c.side,
    point: c.point,
    station: c.station,
    measured_edge_width: c.measuredEdgeWidth,
    computed_edge_width: c.computedEdgeWidth,
    width_deviation: c.widthDeviation,
    width_tolerance: c.widthTolerance,
    width_pass: c.widthPass,
    measured_drop_from_girder_top: c.measuredReading,
    computed_drop_from_girder_top: c.computedReading,
    reading_deviation: c.readingDeviation,
    reading_tolerance: c.readingTolerance,
    reading_pass: c.readingPass,
    pass: c.pass,
    note: c.note,
    supersedes_id: c.supersedesId,
    superseded_by: supersededBy,
    by,
    created_at: c.createdAt.toISOString(),
    client_key: c.clientKey ?? null,
    photos,
  };
}

export function photoJson(a: Attachment): CheckPhoto {
  return { id: a.id, name: a.originalName, content_type: a.contentType, ...attachmentUrls(a.id, a.contentType) };
}

/**
 * Records a check at one bracket against the offset table of the bridge's latest revision. The new
 * check supersedes the previous latest one at the same bracket; both stay in the history.
 */
export async function recordCheck(user: SessionUser, bridgeId: string, input: CheckInput): Promise<CheckJson & { replayed: boolean }> {
  const { bridge, table: latest } = await offsetsForBridge(bridgeId);
  const replay = await findReplay(bridge.id, input.client_key);
  if (replay) return replay;
  // A phone that kept the bridge offline sends the revision it showed; the check is judged against
  // that revision's targets and stays marked with it (the history shows it as an older revision).
  const revision = input.revision ?? bridge.currentRevision;
  const table = revision === bridge.currentRevision ? latest : await offsetsForRevision(bridge, revision);
  const row = findBracket(table, input.span, input.girder, input.point);
  const settings = fieldSettingsOf(bridge);
  const width = input.measured_edge_width ?? null;
  const reading = input.measured_drop_from_girder_top ?? null;
  if (reading !== null && row.drop_from_girder_top === null) {
    throw new ValidationError(
      `The top of girder was not surveyed at span ${row.span}, ${row.girder}, point ${row.point}, so there is no level-bar reading to check there. Record the edge width, or ask the engineer to add the survey.`,
      { measured_drop_from_girder_top: ['No top-of-girder survey at this point; a level-bar reading cannot be checked here.'] },
    );
  }
  const verdict = bracketVerdict(
    { measuredWidth: width, computedWidth: row.edge_width, measuredReading: reading, computedReading: row.drop_from_girder_top },
    { width: settings.width_tolerance, reading: settings.reading_tolerance },
  );
  const pass = verdict.pass;

  const sequelize = await db();
  let created: FieldCheck;
  try {
    created = await sequelize.transaction(async (transaction) => {
      const previous = await FieldCheck.findOne({
        where: { bridgeId: bridge.id, span: row.span, girder: row.girder, point: row.point },
        order: [['id', 'DESC']],
        transaction,
      });
      const check = await FieldCheck.create(
        {
          bridgeId: bridge.id,
          revision,
          span: row.span,
          girder: row.girder,
          point: row.point,
          side: row.side,
          station: row.station,
          measuredEdgeWidth: width,
          computedEdgeWidth: row.edge_width,
          widthDeviation: verdict.widthDeviation,
          widthTolerance: settings.width_tolerance,
          widthPass: verdict.widthPass,
          measuredReading: reading,
          computedReading: row.drop_from_girder_top,
          readingDeviation: verdict.readingDeviation,
          readingTolerance: settings.reading_tolerance,
          readingPass: verdict.readingPass,
          pass,
          note: input.note ?? '',
          supersedesId: previous ? previous.id : null,
          userId: user.id,
          clientKey: input.client_key ?? null,
        },
        { transaction },
      );
      await audit(
        user.id,
        'check.create',
        'bridge',
        bridge.id,
        { check: check.id, span: row.span, girder: row.girder, point: row.point, revision, pass, supersedes: previous ? previous.id : null },
        transaction,
      );
      return check;
    });
  } catch (err) {
    // Two sends of one measurement raced past the first look-up: the unique key let one through.
    const raced = (err as Error).name === 'SequelizeUniqueConstraintError' ? await findReplay(bridge.id, input.client_key) : null;
    if (raced) return raced;
    throw err;
  }
  await refreshStatus(bridge.id, { fieldWork: true });
  return { ...toJson(created, user.name, null, []), replayed: false };
}

/** The check already recorded under this client key, for a resend whose first answer was lost. */
async function findReplay(bridgeId: number, clientKey: string | undefined): Promise<(CheckJson & { replayed: boolean }) | null> {
  if (!clientKey) return null;
  const existing = await FieldCheck.findOne({ where: { bridgeId, clientKey } });
  if (!existing) return null;
  const by = existing.userId ? await User.findByPk(existing.userId) : null;
  return { ...toJson(existing, by ? by.name : null, null, []), replayed: true };
}

/** Every check of a bridge, newest first, with who made it, what superseded it and its photos. */
export async function listChecks(bridgeId: number): Promise<CheckJson[]> {
  await db();
  const rows = await FieldCheck.findAll({
    where: { bridgeId },
    include: [
      { model: User, as: 'user', attributes: ['name'] },
      { model: Attachment, as: 'photos' },
    ],
    order: [['id', 'DESC']],
  });
  const supersededBy = new Map<number, number>();
  for (const c of rows) if (c.supersedesId !== null) supersededBy.set(c.supersedesId, c.id);
  return rows.map((c) => {
    const extra = c as FieldCheck & { user?: User | null; photos?: Attachment[] };
    const photos = (extra.photos ?? []).sort((a, b) => a.id - b.id).map(photoJson);
    return toJson(c, extra.user ? extra.user.name : null, supersededBy.get(c.id) ?? null, photos);
  });
}

/** GET /api/bridges/:id/checks: the bridge must exist (404 otherwise). */
export async function listChecksForBridge(bridgeId: string): Promise<CheckJson[]> {
  const bridge = await requireBridge(bridgeId);
  return listChecks(bridge.id);
}
