import { User } from '@/models';
import { db } from '@/lib/db/connection';

/** The account facts a session check needs. */
export type Account = {
  id: number;
  email: string;
  name: string;
  role: string;
  sessionVersion: number;
  disabled: boolean;
  removed: boolean;
  lastSeenAt: number | null;
};

/**
 * Accounts read in the last few seconds. Every request needs its account, and a database round trip
 * through the ORM costs more than the rest of a small request; a change made through this process
 * (sign-out, role, password, disabling, removal) drops the entry at once, and another app server sees
 * it within the TTL.
 */
const recent = new Map<number, { account: Account | null; until: number }>();
const ACCOUNT_TTL_MS = 5000;
/** Last-seen times are written at most this often per account (a write per request would cost too much). */
const TOUCH_EVERY_MS = 60_000;

/** Forgets the cached account so the next request reads it afresh (call after changing a user). */
export function forgetSessionUser(id: number): void {
  recent.delete(id);
}

/** The account as the session check sees it; null when there is no such row. */
export async function loadAccount(id: number): Promise<Account | null> {
  const now = Date.now();
  const hit = recent.get(id);
  if (hit && hit.until > now) return hit.account;
  await db();
  const row = await User.findByPk(id);
  const account = row
    ? {
        id: row.id,
        email: row.email,
        name: row.name,
        role: row.role,
        sessionVersion: row.sessionVersion,
        disabled: row.disabledAt != null,
        removed: row.removedAt != null,
        lastSeenAt: row.lastSeenAt ? row.lastSeenAt.getTime() : null,
      }
    : null;
  if (recent.size > 1000) recent.clear();
  recent.set(id, { account, until: now + ACCOUNT_TTL_MS });
  return account;
}

/** Records that the account was used (for the idle timeout), at most once a minute per account. */
export function touchLastSeen(account: Account, now = Date.now()): void {
  if (account.lastSeenAt !== null && now - account.lastSeenAt < TOUCH_EVERY_MS) return;
  account.lastSeenAt = now;
  void db()
    .then(() => User.update({ lastSeenAt: new Date(now) }, { where: { id: account.id } }))
    .catch((err) => console.error('[chordline] could not record last-seen time:', err instanceof Error ? err.message : err));
}

/**
 * Ends every session of the account issued so far (sign-out, password or role change, disabling,
 * removal): the version every token must carry moves on. Pass `transaction` inside one.
 */
export async function endSessions(id: number, options: { transaction?: import('sequelize').Transaction } = {}): Promise<void> {
  await db();
  await User.increment('sessionVersion', { by: 1, where: { id }, transaction: options.transaction });
  forgetSessionUser(id);
}
