import { Op } from 'sequelize';
import { z } from 'zod';
import { Bridge, GeometryRevision, User } from '@/models';
import { db } from '@/lib/db/connection';
import { ConflictError, DomainError, NotFoundError, ValidationError } from '@/lib/errors';
import { requireBridge } from './require-bridge';
import type { SessionUser } from '@/lib/auth/session';
import type { BridgeDescription } from '@/lib/geometry';
import { checkedDescription } from './description';
import { bridgeFiles, removeStoredFiles } from './attachment-files';
import { cleanName } from '@/lib/text/clean';
import { audit } from './audit';
import { bridgeRecordSchema, recordAttributes, recordOf, RECORD_KEYS, type BridgeRecord } from './bridge-record';
import { markActivity, refreshStatus } from './bridge-status';
import { listBridgePage, MAX_LIMIT, type BridgeRow } from './bridge-list';

export const bridgeNameSchema = z.string({ error: 'Give the bridge a name.' }).transform(cleanName).pipe(z.string().min(1, 'Give the bridge a name.').max(200, 'Keep the name under 200 characters.'));

export const createBridgeSchema = bridgeRecordSchema.extend({ name: bridgeNameSchema, description: z.unknown() });
/** PATCH body: a new name and/or any field of the bridge record; at least one. */
export const updateBridgeSchema = bridgeRecordSchema
  .extend({ name: bridgeNameSchema.optional() })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Send a new name or a field of the bridge record to change.', path: ['name'] });
export const createRevisionSchema = z.object({
  base_revision: z.number({ error: 'base_revision must be the revision number you edited.' }).int().positive(),
  description: z.unknown(),
  note: z.string().trim().max(500, 'Keep the note under 500 characters.').optional().default(''),
});

export type BridgeSummary = BridgeRecord & { id: number; name: string; units: string; revision: number; updatedAt: string };
export type BridgeDetail = BridgeSummary & { description: BridgeDescription };
export type RevisionSummary = { revision: number; author: string | null; note: string; createdAt: string };

function summary(b: Bridge): BridgeSummary {
  return { id: b.id, name: b.name, units: b.units, revision: b.currentRevision, updatedAt: b.updatedAt.toISOString(), ...recordOf(b) };
}

/** The stored description of one revision (the latest when `revision` is omitted). */
export async function getRevisionDescription(bridgeId: number, revision: number): Promise<BridgeDescription> {
  const row = await GeometryRevision.findOne({ where: { bridgeId, revision } });
  if (!row) throw new NotFoundError(`Revision ${revision} of this bridge does not exist.`);
  return JSON.parse(row.description) as BridgeDescription;
}

export async function getBridge(id: string | number): Promise<BridgeDetail> {
  const bridge = await requireBridge(id);
  return { ...summary(bridge), description: await getRevisionDescription(bridge.id, bridge.currentRevision) };
}

export async function createBridge(user: SessionUser, input: z.infer<typeof createBridgeSchema>) {
  const description = checkedDescription(input.description);
  const sequelize = await db();
  const bridge = await sequelize.transaction(async (transaction) => {
    const created = await Bridge.create({ name: input.name, units: description.units, currentRevision: 1, ...recordAttributes(input) }, { transaction });
    await GeometryRevision.create({ bridgeId: created.id, revision: 1, description: JSON.stringify(description), authorId: user.id, note: 'Created' }, { transaction });
    await audit(user.id, 'bridge.create', 'bridge', created.id, { name: created.name }, transaction);
    return created;
  });
  await refreshStatus(bridge.id);
  return { id: bridge.id, name: bridge.name, revision: 1 };
}

/** Renames a bridge (kept for callers that only rename). */
export async function renameBridge(user: SessionUser, id: string, name: string): Promise<BridgeSummary> {
  return updateBridge(user, id, { name });
}

/** The first page of bridges by name (at most 500): scripts and tests; the portfolio pages through listBridgePage. */
export async function listBridges(): Promise<BridgeRow[]> {
  return (await listBridgePage({ sort: 'name', limit: MAX_LIMIT })).rows;
}

/** Renames a bridge and/or changes its record; one audit event for each. */
export async function updateBridge(user: SessionUser, id: string, input: z.infer<typeof updateBridgeSchema>): Promise<BridgeSummary> {
  const bridge = await requireBridge(id);
  const sequelize = await db();
  await sequelize.transaction(async (transaction) => {
    const before = bridge.name;
    const record = recordAttributes(input);
    const changed = RECORD_KEYS.filter((k) => record[k] !== undefined && record[k] !== bridge[k]);
    if (input.name !== undefined) bridge.name = input.name;
    bridge.set(record);
    await bridge.save({ transaction });
    if (input.name !== undefined && input.name !== before) {
      await audit(user.id, 'bridge.rename', 'bridge', bridge.id, { from: before, to: input.name }, transaction);
    }
    if (changed.length > 0) await audit(user.id, 'bridge.record', 'bridge', bridge.id, { fields: changed }, transaction);
    await markActivity(bridge.id, transaction);
  });
  return summary(bridge);
}

export async function deleteBridge(user: SessionUser, id: string): Promise<void> {
  const bridge = await requireBridge(id);
  const files = await bridgeFiles(bridge.id);
  const sequelize = await db();
  await sequelize.transaction(async (transaction) => {
    await GeometryRevision.destroy({ where: { bridgeId: bridge.id }, transaction });
    await bridge.destroy({ transaction });
    await audit(user.id, 'bridge.delete', 'bridge', bridge.id, { name: bridge.name }, transaction);
  });
  // The photos, PDFs and thumbnails go with it (after the commit, so a failed delete keeps them).
  await removeStoredFiles(files);
}

export async function listRevisions(id: string): Promise<RevisionSummary[]> {
  const bridge = await requireBridge(id);
  const rows = await GeometryRevision.findAll({
    where: { bridgeId: bridge.id },
    include: [{ model: User, as: 'author', attributes: ['name', 'email'] }],
    order: [['revision', 'DESC']],
  });
  return rows.map((r) => {
    const author = (r as GeometryRevision & { author?: User | null }).author;
    return { revision: r.revision, author: author ? author.name : null, note: r.note, createdAt: r.createdAt.toISOString() };
  });
}

/**
 * Saves a new revision on top of `base_revision`. The bridge row is advanced with a conditional
 * update, so of several saves on the same base exactly one wins and the rest get 409.
 */
export async function createRevision(user: SessionUser, id: string, input: z.infer<typeof createRevisionSchema>) {
  const bridge = await requireBridge(id);
  const description = checkedDescription(input.description);
  if (description.units !== bridge.units) {
    throw new ValidationError(`This bridge is in ${bridge.units}; a revision cannot change its units.`, {
      'description.units': [`Must stay "${bridge.units}".`],
    });
  }
  const next = input.base_revision + 1;
  const sequelize = await db();
  const stale = () => new ConflictError(`Revision ${input.base_revision} is no longer the latest. Reload the bridge to see the newer revision, then make your change again.`);
  try {
    await sequelize.transaction(async (transaction) => {
      const [count] = await Bridge.update({ currentRevision: next }, { where: { id: bridge.id, currentRevision: { [Op.eq]: input.base_revision } }, transaction });
      if (count !== 1) throw stale();
      await GeometryRevision.create({ bridgeId: bridge.id, revision: next, description: JSON.stringify(description), authorId: user.id, note: input.note }, { transaction });
      await audit(user.id, 'revision.create', 'bridge', bridge.id, { revision: next }, transaction);
    });
  } catch (err) {
    if (err instanceof DomainError) throw err;
    if ((err as Error).name === 'SequelizeUniqueConstraintError') throw stale();
    throw err;
  }
  // New geometry: every bracket and span is counted again against the new revision.
  await refreshStatus(bridge.id);
  return { revision: next };
}

export type RevisionDetail = RevisionSummary & { bridge_id: number; description: BridgeDescription };

/** One stored revision of a bridge with its description; 404 when the bridge or the revision is missing. */
export async function getRevision(id: string, revision: string | number): Promise<RevisionDetail> {
  const bridge = await requireBridge(id);
  const n = Number(revision);
  if (!Number.isInteger(n) || n <= 0) throw new NotFoundError(`Revision ${String(revision).slice(0, 20)} of this bridge does not exist.`);
  const row = await GeometryRevision.findOne({
    where: { bridgeId: bridge.id, revision: n },
    include: [{ model: User, as: 'author', attributes: ['name'] }],
  });
  if (!row) throw new NotFoundError(`Revision ${n} of this bridge does not exist.`);
  const author = (row as GeometryRevision & { author?: User | null }).author;
  return {
    bridge_id: bridge.id,
    revision: row.revision,
    author: author ? author.name : null,
    note: row.note,
    createdAt: row.createdAt.toISOString(),
    description: JSON.parse(row.description) as BridgeDescription,
  };
}
