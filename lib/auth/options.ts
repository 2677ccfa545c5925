import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { User } from '@/models';
import { db } from '@/lib/db/connection';
import { audit } from '@/lib/services/audit';
import { verifyPassword } from './password';
import { isLocked, recordFailure } from './throttle';
import { authSecret } from './secret';
import { isRole } from './roles';

process.env.NEXTAUTH_URL ??= `http://localhost:${process.env.PORT ?? 3000}`;

/**
 * Checks an e-mail and password. Returns the user for the session, or null for any failure: the
 * caller never learns whether the address or the password was wrong.
 */
export async function authorizeCredentials(email: string, password: string) {
  if (!email || !password) return null;
  if (await isLocked(email)) return null;
  await db();
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  const good = user ? await verifyPassword(password, user.passwordHash) : false;
  if (!user || !good || !isRole(user.role)) {
    await recordFailure(email);
    return null;
  }
  await audit(user.id, 'signin', 'user', user.id);
  return { id: String(user.id), email: user.email, name: user.name, role: user.role };
}

export function authOptions(): NextAuthOptions {
  return {
    secret: authSecret(),
    session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
    pages: { signIn: '/signin', error: '/signin' },
    providers: [
      CredentialsProvider({
        name: 'Email and password',
        credentials: { email: { label: 'Email', type: 'email' }, password: { label: 'Password', type: 'password' } },
        authorize: async (credentials) => authorizeCredentials(String(credentials?.email ?? ''), String(credentials?.password ?? '')),
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.uid = Number(user.id);
          token.role = (user as { role?: string }).role;
        }
        return token;
      },
      session({ session, token }) {
        if (session.user) {
          Object.assign(session.user, { id: token.uid, role: token.role });
        }
        return session;
      },
    },
  };
}
