import { NextRequest } from 'next/server';
import { encode } from 'next-auth/jwt';
import { createUser } from '@/lib/services/users';
import type { Role } from '@/lib/auth/roles';

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
    const token = await encode({
      token: { sub: String(user.id), uid: user.id, role, email, name: user.name },
      secret: process.env.NEXTAUTH_SECRET as string,
    });
    out[role] = { id: user.id, email, role, cookie: `next-auth.session-token=${token}` };
  }
  return out;
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** Calls a route handler the way Next.js does, with an optional session cookie and JSON body. */
export async function call(
  handler: unknown,
  opts: { method?: string; path?: string; cookie?: string; body?: unknown; rawBody?: string; params?: Record<string, string> } = {},
): Promise<{ status: number; json: any; text: string }> {
  const headers: Record<string, string> = {};
  if (opts.cookie) headers.cookie = opts.cookie;
  let body: string | undefined = opts.rawBody;
  if (opts.body !== undefined) {
    body = JSON.stringify(opts.body);
    headers['content-type'] = 'application/json';
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
  return { status: res.status, json, text };
}

export function cookieOf(users: Record<Role, TestUser>, who: Who): string | undefined {
  return who === 'anonymous' ? undefined : users[who].cookie;
}
