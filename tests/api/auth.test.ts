import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { authorizeCredentials } from '@/lib/auth/options';
import { throttleResponse } from '@/lib/auth/throttle-response';
import { FREE_FAILURES } from '@/lib/auth/throttle';
import * as users from '@/app/api/admin/users/route';
import * as user from '@/app/api/admin/users/[id]/route';
import { User } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
});

function signInRequest(email: string, password: string) {
  return new NextRequest('http://localhost:3000/api/auth/callback/credentials', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ email, password, csrfToken: 'x' }).toString(),
  });
}

describe('sign-in', () => {
  it('accepts the right password and returns the role without the hash', async () => {
    const result = await authorizeCredentials(people.inspector.email, 'correct-horse-battery');
    expect(result).toMatchObject({ email: people.inspector.email, role: 'inspector' });
    expect(JSON.stringify(result)).not.toMatch(/\$2[aby]\$/);
  });

  it('gives the same answer for a wrong password and an unknown address', async () => {
    expect(await authorizeCredentials(people.crew.email, 'wrong-password')).toBeNull();
    expect(await authorizeCredentials('nobody@test.invalid', 'wrong-password')).toBeNull();
  });

  it(`slows an account after ${FREE_FAILURES} failures (429 with Retry-After) instead of shutting the owner out for the window`, async () => {
    const email = people.engineer.email;
    expect(await throttleResponse(signInRequest(email, 'x'))).toBeNull();
    for (let i = 0; i < FREE_FAILURES; i++) await authorizeCredentials(email, `wrong-${i}`, `10.0.0.${i}`);
    const slowed = await throttleResponse(signInRequest(email, 'correct-horse-battery'));
    expect(slowed?.status).toBe(429);
    expect(Number(slowed!.headers.get('retry-after'))).toBeGreaterThan(0);
    expect((await slowed!.json()).error).toMatch(/slowed/i);
    // Other accounts are not affected.
    expect(await authorizeCredentials(people.admin.email, 'correct-horse-battery')).not.toBeNull();
  });
});

describe('user administration', () => {
  it('never sends a password hash', async () => {
    const list = await call(users.GET, { cookie: people.admin.cookie });
    expect(list.status).toBe(200);
    expect(list.text).not.toMatch(/passwordHash|password_hash|\$2[aby]\$/);
  });

  it('adds a user, changes a role and resets a password', async () => {
    const created = await call(users.POST, {
      method: 'POST',
      cookie: people.admin.cookie,
      body: { email: 'New.Hand@Test.Invalid', name: 'New Hand', role: 'crew', password: 'first-password-1' },
    });
    expect(created.status).toBe(201);
    expect(created.json.email).toBe('new.hand@test.invalid');
    const id = String(created.json.id);
    const promoted = await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id }, body: { role: 'inspector' } });
    expect(promoted.json.role).toBe('inspector');
    await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id }, body: { password: 'second-password-2' } });
    expect(await authorizeCredentials('new.hand@test.invalid', 'first-password-1')).toBeNull();
    expect(await authorizeCredentials('new.hand@test.invalid', 'second-password-2')).toMatchObject({ role: 'inspector' });
  });

  it('refuses bad input with field errors and writes nothing', async () => {
    const before = await User.count();
    const res = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: { email: 'not-an-address', name: '', role: 'boss', password: 'short' } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.fields).sort()).toEqual(['email', 'name', 'password', 'role']);
    expect(await User.count()).toBe(before);
  });

  it('takes a changed role into account at once: the old session ends', async () => {
    const demoted = await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id: String(people.inspector.id) }, body: { role: 'crew' } });
    expect(demoted.status).toBe(200);
    // The inspector's old cookie says "inspector"; the role change ended that session.
    const res = await call(users.GET, { cookie: people.inspector.cookie });
    expect(res.status).toBe(401);
  });
});
