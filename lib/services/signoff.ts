import { z } from 'zod';
import { ConflictError, ValidationError } from '@/lib/errors';
import type { SessionUser } from '@/lib/auth/session';
import { db } from '@/lib/db/connection';
import type { OffsetTable } from '@/lib/geometry';
import { FieldCheck, SignOff, User } from '@/models';
import { audit } from './audit';
import { refreshStatus } from './bridge-status';
import { bracketRows } from './checks';
import { offsetsForBridge } from './offsets';

export const createSignOffSchema = z.object({
  span: z.number({ error: 'Span must be a span number (1, 2, …).' }).int('Span must be a whole number.').positive('Span numbers start at 1.'),
  note: z.string({ error: 'The note must be text.' }).trim().max(500, 'Keep the note under 500 characters.').optional().default(''),
});

/** One thing that stands between a span and its sign-off. */
export type MissingItem = {
  girder: string;
  point: number;
  station: number;
  measure: 'edge width' | 'level-bar reading';
  reason: string;
};

export type SignOffJson = { id: number; span: number; revision: number; by: string | null; note: string; created_at: string; out_of_date: boolean };

export type SpanStatus = {
  span: number;
  girders: string[];
  brackets: number;
  ready: boolean;
  missing: MissingItem[];
  /** The newest sign-off of the span (at any revision). */
  signoff: SignOffJson | null;
};

type CheckLite = Pick<FieldCheck, 'id' | 'span' | 'girder' | 'point' | 'revision' | 'measuredEdgeWidth' | 'widthPass' | 'measuredReading' | 'readingPass'>;

/**
 * What is missing before `span` can be signed off: at every girder point of both exterior girders the
 * latest edge-width check, and where the top of girder was surveyed the latest level-bar check, must
 * pass and must have been made against the current revision. Pure: table and checks in.
 */
export function missingForSpan(table: OffsetTable, checks: CheckLite[], span: number, currentRevision: number): MissingItem[] {
  const latest = new Map<string, { width?: CheckLite; reading?: CheckLite }>();
  for (const c of [...checks].sort((a, b) => a.id - b.id)) {
    const key = `${c.span}|${c.girder}|${c.point}`;
    const entry = latest.get(key) ?? {};
    if (c.measuredEdgeWidth !== null) entry.width = c;
    if (c.measuredReading !== null) entry.reading = c;
    latest.set(key, entry);
  }
  const out: MissingItem[] = [];
  const verdict = (c: CheckLite | undefined, passed: boolean | null | undefined): string | null => {
    if (!c) return 'not checked yet';
    if (c.revision !== currentRevision) return `checked against revision ${c.revision}; check again against revision ${currentRevision}`;
    if (!passed) return `latest check #${c.id} is out of tolerance`;
    return null;
  };
  for (const row of bracketRows(table).filter((p) => p.span === span)) {
    const entry = latest.get(`${row.span}|${row.girder}|${row.point}`) ?? {};
    const w = verdict(entry.width, entry.width?.widthPass);
    if (w) out.push({ girder: row.girder, point: row.point, station: row.station, measure: 'edge width', reason: w });
    if (row.drop_from_girder_top !== null) {
      const r = verdict(entry.reading, entry.reading?.readingPass);
      if (r) out.push({ girder: row.girder, point: row.point, station: row.station, measure: 'level-bar reading', reason: r });
    }
  }
  return out;
}

function signOffJson(s: SignOff, currentRevision: number): SignOffJson {
  const by = (s as SignOff & { user?: User | null }).user;
  return {
    id: s.id,
    span: s.span,
    revision: s.revision,
    by: by ? by.name : null,
    note: s.note,
    created_at: s.createdAt.toISOString(),
    out_of_date: s.revision !== currentRevision,
  };
}

/** Sign-off state of every span of a bridge, and every sign-off ever made (newest first). */
export async function signOffOverview(bridgeId: string): Promise<{ current_revision: number; spans: SpanStatus[]; history: SignOffJson[] }> {
  const { bridge, table } = await offsetsForBridge(bridgeId);
  const [checks, signoffs] = await Promise.all([
    FieldCheck.findAll({ where: { bridgeId: bridge.id } }),
    SignOff.findAll({ where: { bridgeId: bridge.id }, include: [{ model: User, as: 'user', attributes: ['name'] }], order: [['id', 'DESC']] }),
  ]);
  const history = signoffs.map((s) => signOffJson(s, bridge.currentRevision));
  const spanNumbers = [...new Set(table.points.map((p) => p.span))].sort((a, b) => a - b);
  const spans = spanNumbers.map((span) => {
    const rows = bracketRows(table).filter((p) => p.span === span);
    const missing = missingForSpan(table, checks, span, bridge.currentRevision);
    return {
      span,
      girders: [...new Set(rows.map((p) => p.girder))],
      brackets: rows.length,
      ready: missing.length === 0,
      missing,
      signoff: history.find((s) => s.span === span) ?? null,
    };
  });
  return { current_revision: bridge.currentRevision, spans, history };
}

/**
 * Marks a span's overhangs checked at the current revision. 400 for a span the bridge does not have;
 * 409 with every missing or failing bracket in `fields` when the checks are not complete, or when the
 * span is already signed off at this revision.
 */
export async function signOffSpan(user: SessionUser, bridgeId: string, input: z.infer<typeof createSignOffSchema>): Promise<SignOffJson> {
  const { bridge, table } = await offsetsForBridge(bridgeId);
  const spans = [...new Set(table.points.map((p) => p.span))].sort((a, b) => a - b);
  if (!spans.includes(input.span)) {
    throw new ValidationError(`This bridge has no span ${input.span}.`, { span: [`Choose a span from ${spans[0]} to ${spans[spans.length - 1]}.`] });
  }
  const sequelize = await db();
  const created = await sequelize.transaction(async (transaction) => {
    const checks = await FieldCheck.findAll({ where: { bridgeId: bridge.id, span: input.span }, transaction });
    const missing = missingForSpan(table, checks, input.span, bridge.currentRevision);
    if (missing.length > 0) {
      const fields: Record<string, string[]> = {};
      for (const m of missing) (fields[`${m.girder} point ${m.point}`] ??= []).push(`${m.measure}: ${m.reason}`);
      throw new ConflictError(
        `Span ${input.span} cannot be signed off yet: ${missing.length} ${missing.length === 1 ? 'check is' : 'checks are'} missing or out of tolerance (listed by girder point).`,
        fields,
      );
    }
    const existing = await SignOff.findOne({ where: { bridgeId: bridge.id, span: input.span, revision: bridge.currentRevision }, transaction });
    if (existing) throw new ConflictError(`Span ${input.span} is already signed off at revision ${bridge.currentRevision}.`);
    const s = await SignOff.create({ bridgeId: bridge.id, span: input.span, revision: bridge.currentRevision, userId: user.id, note: input.note ?? '' }, { transaction });
    await audit(user.id, 'signoff.create', 'bridge', bridge.id, { signoff: s.id, span: input.span, revision: bridge.currentRevision }, transaction);
    return s;
  });
  await refreshStatus(bridge.id, { fieldWork: true });
  return { ...signOffJson(created, bridge.currentRevision), by: user.name };
}
