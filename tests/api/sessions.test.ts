/**
 * Sessions end when they should (issue 11, defect 2): sign-out, a password change, a role change,
 * disabling and removing an account end every earlier session at once; sessions also end after the
 * idle timeout and 12 hours after sign-in. Removing an account loses nothing: its work keeps its author.
 * Sign-out runs through next-auth's own handler (its Node request/response form, the same core that
 * answers /api/auth/signout).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import NextAuth from 'next-auth';
import * as bridges from '@/app/api/bridges/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as users from '@/app/api/admin/users/route';
import * as user from '@/app/api/admin/users/[id]/route';
import { authOptions, authorizeCredentials } from '@/lib/auth/options';
import { idleTimeoutMs, SESSION_MAX_MS } from '@/lib/auth/session';
import { forgetSessionUser } from '@/lib/auth/accounts';
import { createUser } from '@/lib/services/users';
import { User } from '@/models';
import { demoBridges } from '@/lib/demo/bridges';
import { call, makeUsers, sessionCookieFor, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
});

async function person(role: Role = 'engineer') {
  const email = `s-${Math.random().toString(36).slice(2, 8)}@test.invalid`;
  const u = await createUser(null, { email, name: 'Session person', role, password: 'session-password-1' });
  return { id: u.id, email, cookie: await sessionCookieFor(u.id) };
}

const token = (cookie: string) => cookie.slice(cookie.indexOf('=') + 1);

type Answer = { status: number; headers: Record<string, string | string[]>; body: unknown };

/** Runs one next-auth action with Node-style request and response objects. */
async function nextAuth(method: string, action: string, cookies: Record<string, string>, body: Record<string, string> = {}): Promise<Answer> {
  const answer: Answer = { status: 200, headers: {}, body: null };
  const res = {
    status(code: number) {
      answer.status = code;
      return res;
    },
    setHeader(name: string, value: string | string[]) {
      const key = name.toLowerCase();
      const prev = answer.headers[key];
      answer.headers[key] = key === 'set-cookie' && prev ? ([] as string[]).concat(prev, value) : value;
      return res;
    },
    getHeader: (name: string) => answer.headers[name.toLowerCase()],
    end: () => undefined,
    send: (b: unknown) => void (answer.body = b),
    json: (b: unknown) => void (answer.body = b),
  };
  const req = { method, query: { nextauth: [action] }, cookies, body, headers: { host: 'localhost:3000', origin: 'http://localhost:3000' } };
  await (NextAuth as unknown as (req: unknown, res: unknown, options: unknown) => Promise<void>)(req, res, authOptions());
  return answer;
}

const setCookies = (a: Answer) => ([] as string[]).concat(a.headers['set-cookie'] ?? []);

/** Signs out through next-auth: fetch the CSRF token, then POST the sign-out with the session cookie. */
async function signOut(cookie: string) {
  const csrf = await nextAuth('GET', 'csrf', {});
  const csrfCookie = setCookies(csrf)
    .find((c) => c.startsWith('next-auth.csrf-token='))!
    .split(';')[0]
    .split('=')[1];
  return nextAuth(
    'POST',
    'signout',
    { 'next-auth.csrf-token': decodeURIComponent(csrfCookie), 'next-auth.session-token': token(cookie) },
    {
      csrfToken: (csrf.body as { csrfToken: string }).csrfToken,
    },
  );
}

describe('sessions end', () => {
  it('a session cookie saved before sign-out is refused after it', async () => {
    const p = await person();
    const saved = p.cookie;
    expect((await call(bridges.GET, { cookie: saved })).status).toBe(200);
    const out = await signOut(saved);
    expect(out.status).toBe(302);
    // next-auth clears the cookie in the browser; the saved copy must not work either.
    expect(setCookies(out).find((c) => c.startsWith('next-auth.session-token='))).toMatch(/^next-auth\.session-token=;/);
    expect((await call(bridges.GET, { cookie: saved })).status).toBe(401);
  });

  it('a password change by an administrator ends the old session; the new password signs in', async () => {
    const p = await person();
    expect((await call(bridges.GET, { cookie: p.cookie })).status).toBe(200);
    const res = await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id: String(p.id) }, body: { password: 'another-password-2' } });
    expect(res.status).toBe(200);
    expect((await call(bridges.GET, { cookie: p.cookie })).status).toBe(401);
    expect(await authorizeCredentials(p.email, 'another-password-2')).toMatchObject({ email: p.email });
    expect((await call(bridges.GET, { cookie: await sessionCookieFor(p.id) })).status).toBe(200);
  });

  it('disabling an account ends its sessions and refuses sign-in until enabled again', async () => {
    const p = await person();
    const off = await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id: String(p.id) }, body: { disabled: true } });
    expect(off.status).toBe(200);
    expect(off.json.disabled).toBe(true);
    expect((await call(bridges.GET, { cookie: p.cookie })).status).toBe(401);
    expect(await authorizeCredentials(p.email, 'session-password-1')).toBeNull();
    await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id: String(p.id) }, body: { disabled: false } });
    expect(await authorizeCredentials(p.email, 'session-password-1')).toMatchObject({ email: p.email });
  });

  it('an administrator cannot disable or remove their own account', async () => {
    const id = String(people.admin.id);
    expect((await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id }, body: { disabled: true } })).status).toBe(400);
    expect((await call(user.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id } })).status).toBe(400);
  });

  it('removing an account ends its sessions and refuses sign-in, but its revisions keep their author', async () => {
    const p = await person('engineer');
    const created = await call(bridges.POST, { method: 'POST', cookie: p.cookie, body: { name: 'Kept work', description: demoBridges[0] } });
    expect(created.status).toBe(201);
    const removed = await call(user.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id: String(p.id) } });
    expect(removed.status).toBe(200);
    expect((await call(bridges.GET, { cookie: p.cookie })).status).toBe(401);
    expect(await authorizeCredentials(p.email, 'session-password-1')).toBeNull();
    const list = await call(users.GET, { cookie: people.admin.cookie });
    expect(list.json.map((u: { id: number }) => u.id)).not.toContain(p.id);
    expect(await User.findByPk(p.id)).not.toBeNull();
    const history = await call(revisions.GET, { cookie: people.crew.cookie, params: { id: String(created.json.id) } });
    expect(history.json[0].author).toBe('Session person');
    // A second removal finds nothing.
    expect((await call(user.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id: String(p.id) } })).status).toBe(404);
  });

  it(`a session unused for longer than the idle timeout ends; one older than ${SESSION_MAX_MS / 3600000} h ends even when in use`, async () => {
    const p = await person();
    const longAgo = Date.now() - idleTimeoutMs() - 60_000;
    await User.update({ lastSeenAt: new Date(longAgo) }, { where: { id: p.id } });
    forgetSessionUser(p.id);
    const idle = await sessionCookieFor(p.id, { auth: longAgo });
    expect((await call(bridges.GET, { cookie: idle })).status).toBe(401);
    // In use a minute ago, but signed in 12 h and 1 min ago.
    await User.update({ lastSeenAt: new Date() }, { where: { id: p.id } });
    forgetSessionUser(p.id);
    const old = await sessionCookieFor(p.id, { auth: Date.now() - SESSION_MAX_MS - 60_000 });
    expect((await call(bridges.GET, { cookie: old })).status).toBe(401);
    expect((await call(bridges.GET, { cookie: await sessionCookieFor(p.id) })).status).toBe(200);
  });

  it('a token without a session version (issued before versions) is refused', async () => {
    const { encode } = await import('next-auth/jwt');
    const legacy = await encode({ token: { sub: String(people.crew.id), uid: people.crew.id, role: 'crew' }, secret: process.env.NEXTAUTH_SECRET as string });
    expect((await call(bridges.GET, { cookie: `next-auth.session-token=${legacy}` })).status).toBe(401);
  });

  it('a forged __Secure- cookie beside a real one is never trusted later on its own', async () => {
    const forged = '__Secure-next-auth.session-token=forged-value-not-a-token';
    const both = await call(bridges.GET, { cookie: `${forged}; ${people.admin.cookie}` });
    expect(both.status).toBe(200);
    const alone = await call(bridges.GET, { cookie: forged });
    expect(alone.status).toBe(401);
  });
});
