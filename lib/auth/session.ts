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
  const token = await getToken({ req, secret: authSecret() });
  const id = Number(token?.uid);
  if (!token || !Number.isInteger(id)) return null;
  return loadSessionUser(id);
}

/** Loads the user as the session sees it; null when the account no longer exists. */
export async function loadSessionUser(id: number): Promise<SessionUser | null> {
  await db();
  const user = await User.findByPk(id);
  if (!user || !isRole(user.role)) return null;
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
