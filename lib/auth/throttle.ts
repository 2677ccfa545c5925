import { Op } from 'sequelize';
import { AuditEvent } from '@/models';
import { db } from '@/lib/db/connection';

/** Failed sign-ins allowed per account within the window before it is locked for the rest of it. */
export const MAX_FAILURES = 10;
export const WINDOW_MS = 15 * 60 * 1000;

function normalise(email: string): string {
  return email.trim().toLowerCase();
}

/** Failures recorded for this e-mail address within the window. */
export async function recentFailures(email: string): Promise<number> {
  await db();
  return AuditEvent.count({
    where: {
      action: 'signin.failed',
      entityId: normalise(email),
      createdAt: { [Op.gte]: new Date(Date.now() - WINDOW_MS) },
    },
  });
}

export async function isLocked(email: string): Promise<boolean> {
  return (await recentFailures(email)) >= MAX_FAILURES;
}

export async function recordFailure(email: string): Promise<void> {
  await db();
  await AuditEvent.create({ userId: null, action: 'signin.failed', entityType: 'account', entityId: normalise(email), detail: null });
}
