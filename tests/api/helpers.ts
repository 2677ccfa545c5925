import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { createUser } from '@/lib/services/users';
import type { Role } from '@/lib/auth/roles';
import { User } from '@/models';

export const ROLE_ORDER: Role[] = ['crew', 'inspector', 'engineer', 'admin'];
export type Who = 'anonymous' | Role;
export const EVERYONE: Who[] = ['anonymous', ...ROLE_ORDER];

export type TestUser = { id: number; email: string; role: Role; cookie: string };

/** Creates one user per role through the real service and signs a session cookie for each. */
export async function makeUsers(): Promise<Record<Role, TestUser>> {
  const out = {} as Record<Role, TestUser>;
  for (const role of ROLE_ORDER) {
    const email = `${role}-${Math.random().toString(36).slice(2, 8)}@test.invalid`;
    const user = await createUser(null, { email, name: `Test ${role}`, role, password: 'correct-horse-battery' });
    out[role] = { id: user.id, email, role, cookie: await sessionCookieFor(user.id) };
  }
  return out;
}

/** A session cookie for the user as next-auth would issue it at sign-in: current session version, signed in now. */
export async function sessionCookieFor(id: number, claims: { auth?: number } = {}): Promise<string> {
  const row = await User.findByPk(id);
  if (!row) throw new Error(`no user ${id}`);
  const token = await encode({
    token: { sub: String(id), uid: id, role: row.role, email: row.email, name: row.name, sv: row.sessionVersion, auth: claims.auth ?? Date.now() },
    secret: process.env.NEXTAUTH_SECRET as string,
  });
  return `next-auth.session-token=${token}`;
}

/** The app's own origin in the API tests (NEXTAUTH_URL in tests/api/setup.ts). */
export const APP_ORIGIN = 'http://localhost:3000';

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/**
 * Calls a route handler the way Next.js does, with an optional session cookie and JSON body. Requests
 * that change data carry the app's own Origin, as a browser's do; `headers` adds or overrides headers
 * (a null value leaves the header out).
 */
export async function call(
  handler: unknown,
  opts: {
    method?: string;
    path?: string;
    cookie?: string;
    body?: unknown;
    rawBody?: string;
    params?: Record<string, string>;
    headers?: Record<string, string | null>;
  } = {},
): Promise<{ status: number; json: any; text: string; headers: Headers }> {
  const headers: Record<string, string> = {};
  if (opts.cookie) headers.cookie = opts.cookie;
  if ((opts.method ?? 'GET') !== 'GET') headers.origin = APP_ORIGIN;
  let body: string | undefined = opts.rawBody;
  // A raw body is sent the way a JSON client sends it unless the test names another type.
  if (body !== undefined) headers['content-type'] = 'application/json';
  if (opts.body !== undefined) {
    body = JSON.stringify(opts.body);
    headers['content-type'] = 'application/json';
  }
  for (const [name, value] of Object.entries(opts.headers ?? {})) {
    if (value === null) delete headers[name];
    else headers[name] = value;
  }
  const req = new NextRequest(new URL(opts.path ?? '/api/test', 'http://localhost:3000'), {
    method: opts.method ?? 'GET',
    headers,
    body,
  });
  const res = await (handler as Handler)(req, { params: Promise.resolve(opts.params ?? {}) });
  const text = await res.text();
  let json: any = null;
  try {
    json = JSON.parse(text);
  } catch {
    json = null;
  }
  return { status: res.status, json, text, headers: res.headers };
}

export function cookieOf(users: Record<Role, TestUser>, who: Who): string | undefined {
  return who === 'anonymous' ? undefined : users[who].cookie;
}
