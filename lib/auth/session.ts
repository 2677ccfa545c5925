import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { servedOverHttps } from '@/lib/api/origin';
import { isRole, type Role } from './roles';
import { authSecret } from './secret';
import { loadAccount, touchLastSeen, type Account } from './accounts';

export type SessionUser = { id: number; email: string; name: string; role: Role };

/** Longest a session lives after signing in, whatever happens (12 hours). */
export const SESSION_MAX_MS = 12 * 60 * 60 * 1000;

/** A session unused this long ends (SESSION_IDLE_MINUTES, 120 by default). */
export function idleTimeoutMs(): number {
  const minutes = Number(process.env.SESSION_IDLE_MINUTES);
  return (Number.isFinite(minutes) && minutes > 0 ? minutes : 120) * 60 * 1000;
}

/** What a session token carries that the server checks on every request. */
export type SessionClaims = { uid: number; sv: number; auth: number };

/** The claims of a decoded token, or null when any is missing (tokens issued before versions). */
export function claimsOf(token: Record<string, unknown> | null | undefined): SessionClaims | null {
  const uid = Number(token?.uid);
  const sv = token?.sv;
  const auth = token?.auth;
  if (!Number.isInteger(uid) || typeof sv !== 'number' || typeof auth !== 'number') return null;
  return { uid, sv, auth };
}

/**
 * The user behind verified claims, or null when the session has ended: the account is gone, disabled
 * or removed; its session version moved on (sign-out, password, role change); the session is older
 * than 12 hours; or neither it nor the account was used within the idle timeout.
 */
export async function userForClaims(claims: SessionClaims | null, now = Date.now()): Promise<SessionUser | null> {
  if (!claims) return null;
  if (now - claims.auth > SESSION_MAX_MS || claims.auth > now + 60_000) return null;
  const account = await loadAccount(claims.uid);
  if (!account || account.disabled || account.removed || account.sessionVersion !== claims.sv || !isRole(account.role)) return null;
  const lastActive = Math.max(account.lastSeenAt ?? 0, claims.auth);
  if (now - lastActive > idleTimeoutMs()) return null;
  touchLastSeen(account, now);
  return publicOf(account);
}

function publicOf(a: Account): SessionUser {
  return { id: a.id, email: a.email, name: a.name, role: a.role as Role };
}

/** The session cookie next-auth reads for this request: the __Secure- one only when served over https. */
export function sessionCookieName(headers: { get(name: string): string | null }): string {
  return servedOverHttps(headers) ? '__Secure-next-auth.session-token' : 'next-auth.session-token';
}

/**
 * The signed-in user behind a request, read from the session cookie and then from the database, so a
 * changed role, a sign-out elsewhere or a removed account takes effect at once. Null when not signed in.
 */
export async function sessionUserFromRequest(req: NextRequest): Promise<SessionUser | null> {
  const secureCookie = servedOverHttps(req.headers);
  const cookieName = sessionCookieName(req.headers);
  // The cache is keyed on exactly the cookie getToken verifies, never on another cookie beside it.
  const raw = req.cookies.get(cookieName)?.value;
  const seen = raw ? verifiedTokens.get(raw) : undefined;
  if (seen && seen.expiresAt > Date.now()) return userForClaims(seen.claims);
  const token = await getToken({ req, secret: authSecret(), secureCookie, cookieName });
  const claims = claimsOf(token);
  if (!claims) return null;
  if (raw && typeof token?.exp === 'number') {
    if (verifiedTokens.size > 1000) verifiedTokens.clear();
    verifiedTokens.set(raw, { claims, expiresAt: token.exp * 1000 });
  }
  return userForClaims(claims);
}

/**
 * Session cookies already decrypted and verified, by their exact text, until they expire. Decrypting
 * the token costs more than the rest of a small request; the text itself is the proof, so an exact
 * match needs no second decryption (the account checks above still run every time).
 */
const verifiedTokens = new Map<string, { claims: SessionClaims; expiresAt: number }>();

export { forgetSessionUser, endSessions } from './accounts';
