/**
 * Server-side session helpers for pages and layouts (never imported by client components). The
 * session is checked exactly as the API checks it (session version, disabled or removed account, idle
 * timeout, 12-hour limit), so a page never shows what the API would refuse.
 */
import 'server-only';
import { cookies, headers } from 'next/headers';
import { NextRequest } from 'next/server';
import { redirect } from 'next/navigation';
import { sessionUserFromRequest, type SessionUser } from '@/lib/auth/session';

/** The signed-in user, or null when there is no live session. */
export async function currentUser(): Promise<SessionUser | null> {
  const [h, c] = await Promise.all([headers(), cookies()]);
  const forwarded = new Headers(h);
  forwarded.set('cookie', c.toString());
  return sessionUserFromRequest(new NextRequest('http://localhost/', { headers: forwarded }));
}

/**
 * The signed-in user; when there is none, sends the browser to the sign-in page, which brings it
 * back to `returnTo` (this page's own path) afterwards, so a bookmarked or e-mailed link survives.
 */
export async function requireUser(returnTo?: string): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect(returnTo ? `/signin?callbackUrl=${encodeURIComponent(returnTo)}` : '/signin');
  return user;
}
