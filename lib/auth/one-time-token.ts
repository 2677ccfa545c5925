/**
 * One-time links sent by e-mail (an invite to choose a first password, a password reset). The token
 * is 32 random bytes (base64url, 43 characters) and only its SHA-256 is stored, so a copy of the
 * database opens no account. A link works once: using it is a conditional update (`used_at IS NULL
 * AND expires_at > now`) that exactly one request can win, on SQLite and PostgreSQL alike.
 */
import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { OneTimeToken, type TokenPurpose } from '@/models';

/** How long an invite link works: 24 hours. */
export const INVITE_TTL_MS = 24 * 60 * 60 * 1000;
/** How long a password-reset link works: 1 hour (common practice for reset links). */
export const RESET_TTL_MS = 60 * 60 * 1000;

export const TOKEN_TTL_MS: Record<TokenPurpose, number> = { invite: INVITE_TTL_MS, reset: RESET_TTL_MS };

/** The shape of a token as this module makes it: 43 base64url characters. */
export const TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;

/** SHA-256 of the token, lower-case hex: the only form in which a token is stored. */
export function hashToken(token: string): string {
  return crypto.createHash('sha256').update(token, 'utf8').digest('hex');
}

/**
 * Makes a new link for the user and ends every earlier unused link of the same purpose (a re-sent
 * invite or a second reset request leaves only the newest working). Returns the token itself, which
 * goes into the e-mail and nowhere else.
 */
export async function issueToken(userId: number, purpose: TokenPurpose, transaction: Transaction, now = Date.now()): Promise<{ token: string; expiresAt: Date }> {
  await revokeTokens(userId, purpose, transaction, now);
  const token = crypto.randomBytes(32).toString('base64url');
  const expiresAt = new Date(now + TOKEN_TTL_MS[purpose]);
  await OneTimeToken.create({ purpose, userId, tokenHash: hashToken(token), expiresAt }, { transaction });
  return { token, expiresAt };
}

/** Marks every unused link of the user (of one purpose, or all) as used, so none of them works any more. */
export async function revokeTokens(userId: number, purpose: TokenPurpose | null, transaction?: Transaction, now = Date.now()): Promise<void> {
  await OneTimeToken.update({ usedAt: new Date(now) }, { where: { userId, usedAt: null, ...(purpose ? { purpose } : {}) }, transaction });
}

/** The unused, unexpired link for this token and purpose, or null (malformed, unknown, used or expired). */
export async function findLiveToken(purpose: TokenPurpose, token: string, now = Date.now(), transaction?: Transaction): Promise<OneTimeToken | null> {
  if (!TOKEN_PATTERN.test(token)) return null;
  return OneTimeToken.findOne({ where: { tokenHash: hashToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: new Date(now) } }, transaction });
}

/**
 * Uses the link: marks it used if, and only if, it is still unused and unexpired. Returns the user id
 * when this call won, null otherwise (a second use, a race lost to another request, an expired link).
 */
export async function consumeToken(purpose: TokenPurpose, token: string, transaction: Transaction, now = Date.now()): Promise<number | null> {
  const row = await findLiveToken(purpose, token, now, transaction);
  if (!row) return null;
  const [changed] = await OneTimeToken.update({ usedAt: new Date(now) }, { where: { id: row.id, usedAt: null, expiresAt: { [Op.gt]: new Date(now) } }, transaction });
  return changed === 1 ? row.userId : null;
}
