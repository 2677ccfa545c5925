import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { User } from '@/models';
import { db } from '@/lib/db/connection';
import { servedOverHttps } from '@/lib/api/origin';
import { audit } from '@/lib/services/audit';
import { hashPassword, verifyPassword } from './password';
import { clearFailures, recordFailure, signInVerdict } from './throttle';
import { authSecret } from './secret';
import { isRole } from './roles';
import { endSessions, forgetSessionUser } from './accounts';
import { claimsOf, SESSION_MAX_MS } from './session';
import { clientAddress } from './client-address';
import { localPathOf } from './safe-callback';

process.env.NEXTAUTH_URL ??= `http://localhost:${process.env.PORT ?? 3000}`;

/** A hash of a password nobody has, compared against when the address is unknown so both cases take as long. */
let dummyHash: Promise<string> | null = null;

/**
 * Checks an e-mail and password. Returns the user for the session, or null for any failure: the
 * caller never learns whether the address or the password was wrong, and an unknown address costs
 * the same password hash as a known one. Disabled and removed accounts never sign in.
 */
export async function authorizeCredentials(email: string, password: string, client?: string | null) {
  if (!email || !password) return null;
  if (await signInVerdict(email, client)) return null;
  await db();
  const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
  dummyHash ??= hashPassword('no account has this password: chordline');
  const good = await verifyPassword(password, user ? user.passwordHash : await dummyHash);
  if (!user || !good || !isRole(user.role) || user.disabledAt || user.removedAt) {
    await recordFailure(email, client);
    return null;
  }
  await clearFailures(email);
  user.lastSeenAt = new Date();
  await user.save();
  forgetSessionUser(user.id);
  await audit(user.id, 'signin', 'user', user.id);
  return { id: String(user.id), email: user.email, name: user.name, role: user.role, sv: user.sessionVersion };
}

type HeaderSource = { get(name: string): string | null };

/**
 * next-auth's options for one request. Cookies are Secure (and __Secure- named) when the app is
 * served over https, directly or behind the trusted proxy; the 12-hour limit and the idle timeout are
 * enforced by the session checks (lib/auth/session.ts), the token carrying its session version.
 */
export function authOptions(headers?: HeaderSource): NextAuthOptions {
  const h: HeaderSource = headers ?? { get: () => null };
  return {
    secret: authSecret(),
    useSecureCookies: servedOverHttps(h),
    session: { strategy: 'jwt', maxAge: SESSION_MAX_MS / 1000 },
    pages: { signIn: '/signin', error: '/signin' },
    providers: [
      CredentialsProvider({
        name: 'Email and password',
        credentials: { email: { label: 'Email', type: 'email' }, password: { label: 'Password', type: 'password' } },
        authorize: async (credentials, req) => authorizeCredentials(String(credentials?.email ?? ''), String(credentials?.password ?? ''), clientAddress(req?.headers ?? {})),
      }),
    ],
    callbacks: {
      jwt({ token, user }) {
        if (user) {
          token.uid = Number(user.id);
          token.role = (user as { role?: string }).role;
          token.sv = (user as { sv?: number }).sv ?? 0;
          token.auth = Date.now();
        }
        return token;
      },
      session({ session, token }) {
        if (session.user) Object.assign(session.user, { id: token.uid, role: token.role });
        return session;
      },
      // After sign-in or sign-out: only a path on this site, whatever the callbackUrl said.
      redirect({ url, baseUrl }) {
        const base = new URL(baseUrl);
        return `${base.origin}${localPathOf(url, base.origin) ?? '/bridges'}`;
      },
    },
    events: {
      // Signing out ends every session of the account, not only this cookie.
      async signOut({ token }) {
        const claims = claimsOf(token as Record<string, unknown> | null);
        if (!claims) return;
        const user = await User.findByPk(claims.uid);
        if (user && user.sessionVersion === claims.sv) {
          await endSessions(user.id);
          await audit(user.id, 'signout', 'user', user.id);
        }
      },
    },
  };
}
