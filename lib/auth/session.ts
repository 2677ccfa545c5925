import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { User } from '@/models';
import { db } from '@/lib/db/connection';
import { isRole, type Role } from './roles';
import { authSecret } from './secret';

export type SessionUser = { id: number; email: string; name: string; role: Role };

/**
 * The signed-in user behind a request, read from the session cookie and then from the database, so a
 * changed role or a removed account takes effect at once. Null when not signed in.
 */
export async function sessionUserFromRequest(req: NextRequest): Promise<SessionUser | null> {
  const raw = SESSION_COOKIES.map((name) => req.cookies.get(name)?.value).find(Boolean);
  const seen = raw ? verifiedTokens.get(raw) : undefined;
  if (seen && seen.expiresAt > Date.now()) return loadSessionUser(seen.uid);
  const token = await getToken({ req, secret: authSecret() });
  const id = Number(token?.uid);
  if (!token || !Number.isInteger(id)) return null;
  if (raw && typeof token.exp === 'number') {
    if (verifiedTokens.size > 1000) verifiedTokens.clear();
    verifiedTokens.set(raw, { uid: id, expiresAt: token.exp * 1000 });
  }
  return loadSessionUser(id);
}

const SESSION_COOKIES = ['__Secure-next-auth.session-token', 'next-auth.session-token'];

/**
 * Session cookies already decrypted and verified, by their exact text, until they expire. Decrypting
 * the token costs more than the rest of a small request; the text itself is the proof, so an exact
 * match needs no second check.
 */
const verifiedTokens = new Map<string, { uid: number; expiresAt: number }>();

/**
 * Accounts read in the last few seconds. Every request needs its user, and a database round trip
 * through the ORM costs more than the rest of a small request; a change made through this process
 * (role, password, removal) drops the entry at once, and another process sees it within the TTL.
 */
const recent = new Map<number, { user: SessionUser | null; until: number }>();
const SESSION_USER_TTL_MS = 5000;

/** Forgets the cached account so the next request reads it afresh (call after changing a user). */
export function forgetSessionUser(id: number): void {
  recent.delete(id);
}

/** Loads the user as the session sees it; null when the account no longer exists. */
export async function loadSessionUser(id: number): Promise<SessionUser | null> {
  const now = Date.now();
  const hit = recent.get(id);
  if (hit && hit.until > now) return hit.user;
  await db();
  const row = await User.findByPk(id);
  const user = row && isRole(row.role) ? { id: row.id, email: row.email, name: row.name, role: row.role } : null;
  if (recent.size > 1000) recent.clear();
  recent.set(id, { user, until: now + SESSION_USER_TTL_MS });
  return user;
}
