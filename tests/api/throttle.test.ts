/**
 * Sign-in throttle (issue 11, defect 6): per client address, per-account slowdown instead of a
 * lockout anyone could trigger, a password reset clears it, and an unknown address costs the same
 * password hash as a known one. The counts live in the database, so every app server sees them.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { NextRequest } from 'next/server';
import { authorizeCredentials } from '@/lib/auth/options';
import { throttleResponse } from '@/lib/auth/throttle-response';
import { FREE_FAILURES, MAX_CLIENT_FAILURES, MAX_ACCOUNT_DELAY_MS, signInVerdict } from '@/lib/auth/throttle';
import { passwordChecks } from '@/lib/auth/password';
import * as user from '@/app/api/admin/users/[id]/route';
import { SignInFailure } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
});

function signInRequest(email: string, password: string, client: string) {
  return new NextRequest('http://localhost:3000/api/auth/callback/credentials', {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', origin: 'http://localhost:3000', 'x-forwarded-for': client },
    body: new URLSearchParams({ email, password, csrfToken: 'x' }).toString(),
  });
}

/** Moves every failure of the account back in time, as if the caller had waited that long. */
async function wait(email: string, ms: number) {
  for (const f of await SignInFailure.findAll({ where: { account: email } })) {
    await SignInFailure.update({ createdAt: new Date(f.createdAt.getTime() - ms) }, { where: { id: f.id } });
  }
}

describe('sign-in throttle', () => {
  it(`one client trying ${MAX_CLIENT_FAILURES + 5} different addresses is stopped after ${MAX_CLIENT_FAILURES}; other clients are not`, async () => {
    const client = '192.0.2.10';
    for (let i = 0; i < MAX_CLIENT_FAILURES; i++) {
      expect(await throttleResponse(signInRequest(`spray-${i}@test.invalid`, 'guess', client)), `attempt ${i}`).toBeNull();
      expect(await authorizeCredentials(`spray-${i}@test.invalid`, 'guess', client)).toBeNull();
    }
    for (let i = MAX_CLIENT_FAILURES; i < MAX_CLIENT_FAILURES + 5; i++) {
      const res = await throttleResponse(signInRequest(`spray-${i}@test.invalid`, 'guess', client));
      expect(res?.status).toBe(429);
      expect((await res!.json()).error).toMatch(/from this device or network/);
      // The check inside authorize holds even if the route's check were skipped.
      expect(await authorizeCredentials(people.crew.email, 'correct-horse-battery', client)).toBeNull();
    }
    expect(await throttleResponse(signInRequest(people.crew.email, 'correct-horse-battery', '192.0.2.11'))).toBeNull();
    expect(await authorizeCredentials(people.crew.email, 'correct-horse-battery', '192.0.2.11')).not.toBeNull();
  });

  it('many failures on an account slow it down but never shut the owner out: after the delay the right password works', async () => {
    const email = people.admin.email;
    for (let i = 0; i < FREE_FAILURES + 10; i++) {
      await wait(email, MAX_ACCOUNT_DELAY_MS);
      expect(await authorizeCredentials(email, `wrong-${i}`, `198.51.100.${i}`)).toBeNull();
    }
    const slowed = await throttleResponse(signInRequest(email, 'correct-horse-battery', '203.0.113.5'));
    expect(slowed?.status).toBe(429);
    expect(Number(slowed!.headers.get('retry-after'))).toBeLessThanOrEqual(MAX_ACCOUNT_DELAY_MS / 1000);
    await wait(email, MAX_ACCOUNT_DELAY_MS);
    expect(await throttleResponse(signInRequest(email, 'correct-horse-battery', '203.0.113.5'))).toBeNull();
    expect(await authorizeCredentials(email, 'correct-horse-battery', '203.0.113.5')).toMatchObject({ email });
  });

  it('a password reset clears the slowdown at once', async () => {
    const email = people.engineer.email;
    for (let i = 0; i < FREE_FAILURES + 3; i++) await authorizeCredentials(email, `wrong-${i}`, `198.51.100.${50 + i}`);
    expect((await throttleResponse(signInRequest(email, 'x', '203.0.113.9')))?.status).toBe(429);
    const reset = await call(user.PATCH, { method: 'PATCH', cookie: people.admin.cookie, params: { id: String(people.engineer.id) }, body: { password: 'brand-new-password-3' } });
    expect(reset.status).toBe(200);
    expect(await throttleResponse(signInRequest(email, 'brand-new-password-3', '203.0.113.9'))).toBeNull();
    expect(await authorizeCredentials(email, 'brand-new-password-3', '203.0.113.9')).toMatchObject({ email });
  });

  it('an unknown address costs one password hash comparison, as a known one does', async () => {
    const before = passwordChecks.count;
    expect(await authorizeCredentials('nobody-here@test.invalid', 'some-password', '198.51.100.200')).toBeNull();
    expect(passwordChecks.count - before).toBe(1);
    const known = passwordChecks.count;
    expect(await authorizeCredentials(people.inspector.email, 'some-password', '198.51.100.201')).toBeNull();
    expect(passwordChecks.count - known).toBe(1);
  });

  it('counts failures recorded by another app server sharing the database', async () => {
    const email = 'shared-db@test.invalid';
    // Rows written straight into the table, as a second server would.
    for (let i = 0; i < FREE_FAILURES; i++) await SignInFailure.create({ account: email, client: `other-server-${i}` });
    expect(await signInVerdict(email, '198.51.100.250')).toMatchObject({ scope: 'account' });
  });
});
