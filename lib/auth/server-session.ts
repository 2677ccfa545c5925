/**
 * Server-side session helpers for pages and layouts (never imported by client components). The
 * user is read back from the database so a changed role or a removed account shows at once.
 */
import 'server-only';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { authOptions } from '@/lib/auth/options';
import { loadSessionUser, type SessionUser } from '@/lib/auth/session';

/** The signed-in user, or null when there is no session or its account is gone. */
export async function currentUser(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions());
  const id = Number((session?.user as { id?: unknown } | undefined)?.id);
  if (!session || !Number.isInteger(id)) return null;
  return loadSessionUser(id);
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
