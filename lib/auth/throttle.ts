/**
 * Sign-in throttle, kept in the database so every app server sharing it counts the same failures.
 * Per client address: more than {@link MAX_CLIENT_FAILURES} failures in the window and that address
 * must wait. Per account: after {@link FREE_FAILURES} failures the account is slowed, not shut out —
 * one attempt per delay that doubles with each further failure up to {@link MAX_ACCOUNT_DELAY_MS},
 * so nobody can lock the owner out, and guessing stays slow. A password reset clears the account.
 */
import { Op } from 'sequelize';
import { SignInFailure } from '@/models';
import { db } from '@/lib/db/connection';

export const WINDOW_MS = 15 * 60 * 1000;
/** Failures per client address within the window before that address must wait. */
export const MAX_CLIENT_FAILURES = 20;
/** Failures per account within the window before attempts are spaced out. */
export const FREE_FAILURES = 5;
/** First delay between attempts once an account is slowed, and the most it grows to. */
export const FIRST_ACCOUNT_DELAY_MS = 2000;
export const MAX_ACCOUNT_DELAY_MS = 60_000;

export function normaliseAccount(email: string): string {
  return email.trim().toLowerCase().slice(0, 254);
}

/** The client key stored beside a failure (an address, cut to the column's length). */
export function normaliseClient(client: string | null | undefined): string {
  return (client || 'unknown').trim().slice(0, 100) || 'unknown';
}

/** Seconds to wait before the next attempt, with the reason; null when an attempt may go ahead. */
export type ThrottleVerdict = { waitMs: number; scope: 'client' | 'account' } | null;

/** Whether a sign-in for `email` from `client` must wait, and how long. */
export async function signInVerdict(email: string, client: string | null | undefined, now = Date.now()): Promise<ThrottleVerdict> {
  await db();
  const since = new Date(now - WINDOW_MS);
  const fromClient = await SignInFailure.findAll({
    where: { client: normaliseClient(client), createdAt: { [Op.gte]: since } },
    order: [['createdAt', 'ASC']],
    attributes: ['createdAt'],
    limit: MAX_CLIENT_FAILURES,
  });
  if (fromClient.length >= MAX_CLIENT_FAILURES) {
    // The address may try again when its oldest counted failure leaves the window.
    return { waitMs: Math.max(1000, fromClient[0].createdAt.getTime() + WINDOW_MS - now), scope: 'client' };
  }
  const forAccount = await SignInFailure.count({ where: { account: normaliseAccount(email), createdAt: { [Op.gte]: since } } });
  if (forAccount < FREE_FAILURES) return null;
  const last = await SignInFailure.findOne({ where: { account: normaliseAccount(email) }, order: [['createdAt', 'DESC']], attributes: ['createdAt'] });
  const delay = accountDelayMs(forAccount);
  const wait = (last ? last.createdAt.getTime() : 0) + delay - now;
  return wait > 0 ? { waitMs: wait, scope: 'account' } : null;
}

/** Delay between attempts on an account with `failures` recent failures (0 below the free allowance). */
export function accountDelayMs(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(MAX_ACCOUNT_DELAY_MS, FIRST_ACCOUNT_DELAY_MS * 2 ** (failures - FREE_FAILURES));
}

export async function recordFailure(email: string, client?: string | null): Promise<void> {
  await db();
  await SignInFailure.create({ account: normaliseAccount(email), client: normaliseClient(client) });
}

/** Forgets an account's failures (after a password reset or a successful sign-in). */
export async function clearFailures(email: string): Promise<void> {
  await db();
  await SignInFailure.destroy({ where: { account: normaliseAccount(email) } });
}

/** Drops failures older than the window (called now and then so the table stays small). */
export async function pruneFailures(now = Date.now()): Promise<void> {
  await db();
  await SignInFailure.destroy({ where: { createdAt: { [Op.lt]: new Date(now - WINDOW_MS) } } });
}
