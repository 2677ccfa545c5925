/**
 * Limits on the signed-out account routes, kept in the database (`auth_requests`) so every app server
 * sharing it counts the same. Password-reset requests: at most {@link RESET_REQUESTS_PER_CLIENT} per
 * client address in {@link REQUEST_WINDOW_MS} (then 429), and at most {@link RESET_MAILS_PER_ACCOUNT}
 * mails to one address an hour (further requests get the same neutral answer and send nothing, so
 * nobody can flood a mailbox, and the answer still says nothing about the address). Link uses: at
 * most {@link LINK_FAILURES_PER_CLIENT} failed tries (used, expired or unknown links) per client
 * address in the window, then 429.
 */
import { Op } from 'sequelize';
import { AuthRequest } from '@/models';
import { db } from '@/lib/db/connection';
import { HttpError } from '@/lib/api/errors';
import { normaliseAccount, normaliseClient } from './throttle';

export type RequestKind = 'reset-request' | 'reset-mail' | 'link-failure';

export const REQUEST_WINDOW_MS = 15 * 60 * 1000;
export const RESET_REQUESTS_PER_CLIENT = 5;
export const RESET_MAILS_PER_ACCOUNT = 3;
export const RESET_MAIL_WINDOW_MS = 60 * 60 * 1000;
export const LINK_FAILURES_PER_CLIENT = 10;

const LIMITS: Record<'reset-request' | 'link-failure', number> = { 'reset-request': RESET_REQUESTS_PER_CLIENT, 'link-failure': LINK_FAILURES_PER_CLIENT };

/** Records one request of the kind from the client for the account ('' when none). */
export async function recordAuthRequest(kind: RequestKind, client: string | null | undefined, account = ''): Promise<void> {
  await db();
  await AuthRequest.create({ kind, client: normaliseClient(client), account: normaliseAccount(account) });
}

/** How many requests of the kind were made for the account since `sinceMs` ago. */
export async function countForAccount(kind: RequestKind, account: string, sinceMs: number, now = Date.now()): Promise<number> {
  await db();
  return AuthRequest.count({ where: { kind, account: normaliseAccount(account), createdAt: { [Op.gte]: new Date(now - sinceMs) } } });
}

/** Milliseconds the client must wait before another request of the kind, or 0 when it may go ahead. */
export async function clientWaitMs(kind: 'reset-request' | 'link-failure', client: string | null | undefined, now = Date.now()): Promise<number> {
  await db();
  const limit = LIMITS[kind];
  const rows = await AuthRequest.findAll({
    where: { kind, client: normaliseClient(client), createdAt: { [Op.gte]: new Date(now - REQUEST_WINDOW_MS) } },
    order: [['createdAt', 'ASC']],
    attributes: ['createdAt'],
    limit,
  });
  return rows.length >= limit ? Math.max(1000, rows[0].createdAt.getTime() + REQUEST_WINDOW_MS - now) : 0;
}

/** Throws a 429 when the client has used up its allowance of the kind (the message says how long to wait). */
export async function refuseWhenLimited(kind: 'reset-request' | 'link-failure', client: string | null | undefined): Promise<void> {
  const waitMs = await clientWaitMs(kind, client);
  if (!waitMs) return;
  const minutes = Math.ceil(waitMs / 60000);
  const what = kind === 'reset-request' ? 'password reset requests' : 'tries with links that did not work';
  throw new HttpError(429, `Too many ${what} from this device or network. Wait ${minutes} ${minutes === 1 ? 'minute' : 'minutes'} and try again.`);
}

/** Drops counted requests older than the longest window (called now and then so the table stays small). */
export async function pruneAuthRequests(now = Date.now()): Promise<void> {
  await db();
  await AuthRequest.destroy({ where: { createdAt: { [Op.lt]: new Date(now - Math.max(REQUEST_WINDOW_MS, RESET_MAIL_WINDOW_MS)) } } });
}
