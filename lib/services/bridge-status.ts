import type { Transaction } from 'sequelize';
import { DomainError } from '@/lib/errors';
import { db } from '@/lib/db/connection';
import type { OffsetTable } from '@/lib/geometry';
import { Bridge, FieldCheck, SignOff } from '@/models';
import { bracketRows } from './checks';
import { missingForSpan } from './signoff';
import { offsetsForBridge } from './offsets';

/** The portfolio counters of one bridge, as kept on its row. */
export type StatusCounts = {
  bracketsTotal: number;
  bracketsPassing: number;
  openFailures: number;
  spansTotal: number;
  spansSignedOff: number;
  spansAwaitingSignoff: number;
};

type CheckLite = Parameters<typeof missingForSpan>[1][number];

/**
 * Counts a bridge's status from its offset table, its checks and its sign-offs, by the sign-off rule
 * (lib/services/signoff.ts): a bracket passes when nothing stands between it and its span's sign-off
 * (every measure it needs checked against the current revision and in tolerance); an open failure is a
 * bracket whose latest check of some measure is out of tolerance; a span waits for sign-off when all
 * its brackets pass and it has no sign-off at the current revision. Pure.
 */
export function statusCounts(table: OffsetTable, checks: CheckLite[], signoffs: { span: number; revision: number }[], currentRevision: number): StatusCounts {
  const brackets = bracketRows(table);
  const spans = [...new Set(table.points.map((p) => p.span))];
  const signed = new Set(signoffs.filter((s) => s.revision === currentRevision).map((s) => s.span));
  let bracketsPassing = 0;
  let openFailures = 0;
  let spansAwaitingSignoff = 0;
  for (const span of spans) {
    const missing = missingForSpan(table, checks, span, currentRevision);
    const blocked = new Set(missing.map((m) => `${m.girder}|${m.point}`));
    const failing = new Set(missing.filter((m) => m.reason.includes('out of tolerance')).map((m) => `${m.girder}|${m.point}`));
    bracketsPassing += brackets.filter((b) => b.span === span && !blocked.has(`${b.girder}|${b.point}`)).length;
    openFailures += failing.size;
    if (missing.length === 0 && !signed.has(span)) spansAwaitingSignoff += 1;
  }
  return {
    bracketsTotal: brackets.length,
    bracketsPassing,
    openFailures,
    spansTotal: spans.length,
    spansSignedOff: spans.filter((s) => signed.has(s)).length,
    spansAwaitingSignoff,
  };
}

/**
 * Recounts one bridge's status inside the caller's transaction (the checks and sign-offs read are the
 * ones that transaction sees) and writes the counters to the bridge row. `table` must be the offset
 * table of `bridge.currentRevision`. `fieldWork` also stamps the last field activity.
 */
export async function writeStatus(bridge: Bridge, table: OffsetTable, transaction: Transaction, options: { fieldWork?: boolean } = {}): Promise<StatusCounts> {
  const [checks, signoffs] = await Promise.all([
    FieldCheck.findAll({
      where: { bridgeId: bridge.id },
      attributes: ['id', 'span', 'girder', 'point', 'revision', 'measuredEdgeWidth', 'widthPass', 'measuredReading', 'readingPass'],
      transaction,
    }),
    SignOff.findAll({ where: { bridgeId: bridge.id }, attributes: ['span', 'revision'], transaction }),
  ]);
  const counts = statusCounts(table, checks, signoffs, bridge.currentRevision);
  const now = new Date();
  await Bridge.update({ ...counts, activityAt: now, ...(options.fieldWork ? { lastFieldAt: now } : {}) }, { where: { id: bridge.id }, transaction });
  return counts;
}

/**
 * Recounts a bridge's status from its committed checks, sign-offs and geometry and writes the counters
 * to its row; called after every write that can change them (a check, a sign-off, a new revision, a
 * survey import). The bridge row is locked first (PostgreSQL; SQLite's write lock is taken at BEGIN),
 * so of two recounts racing the later one always sees both writes. Never fails the request that
 * called it: a recount that cannot run is logged and the next write recounts again.
 */
export async function refreshStatus(bridgeId: number, options: { fieldWork?: boolean } = {}): Promise<void> {
  try {
    const found = await offsetsForBridge(String(bridgeId));
    const sequelize = await db();
    await sequelize.transaction(async (transaction) => {
      const fresh = await Bridge.findByPk(bridgeId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!fresh || fresh.currentRevision !== found.bridge.currentRevision) return;
      await writeStatus(fresh, found.table, transaction, options);
    });
  } catch (err) {
    // 404 (deleted meanwhile) and 422 (geometry that cannot be built) keep the last counters.
    if (err instanceof DomainError) return;
    console.error('[chordline] bridge status recount failed:', (err as Error).message);
  }
}

/** Stamps field activity (a photo) without recounting: photos do not change any verdict. */
export async function markFieldActivity(bridgeId: number, transaction?: Transaction): Promise<void> {
  const now = new Date();
  await Bridge.update({ lastFieldAt: now, activityAt: now }, { where: { id: bridgeId }, transaction });
}

/** Stamps an activity that is not field work (a rename, a record change) for the portfolio's order. */
export async function markActivity(bridgeId: number, transaction: Transaction): Promise<void> {
  await Bridge.update({ activityAt: new Date() }, { where: { id: bridgeId }, transaction });
}
