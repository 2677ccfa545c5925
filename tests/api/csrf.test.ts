/**
 * Cross-site request forgery (issue 11, defect 1): every state-changing route refuses a request that
 * does not come from the app's own origin (403), and JSON routes refuse any other body type (415).
 * The attack reproduced: a page on another port of the same host posts a text/plain form whose body
 * is JSON to POST /api/admin/users in a signed-in admin's browser.
 */
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import * as users from '@/app/api/admin/users/route';
import * as bridge from '@/app/api/bridges/[id]/route';
import * as attachments from '@/app/api/bridges/[id]/attachments/route';
import * as nextauth from '@/app/api/auth/[...nextauth]/route';
import { Attachment, Bridge, User } from '@/models';
import { APP_ORIGIN, call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge, multipartRequest, PNG_1X1 } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
const newAdmin = () => ({ email: `csrf-${Math.random().toString(36).slice(2, 8)}@test.invalid`, name: 'Planted admin', role: 'admin', password: 'planted-password-1' });

beforeAll(async () => {
  people = await makeUsers();
});

afterEach(() => {
  delete process.env.TRUST_PROXY;
});

describe('cross-site requests are refused', () => {
  it('a text/plain JSON form from another port of the same host creates no admin (403)', async () => {
    const before = await User.count();
    const res = await call(users.POST, {
      method: 'POST',
      cookie: people.admin.cookie,
      rawBody: JSON.stringify(newAdmin()),
      headers: { origin: 'http://localhost:3100', 'content-type': 'text/plain', 'sec-fetch-site': 'same-site' },
    });
    expect(res.status).toBe(403);
    expect(res.json.error).toMatch(/must come from this app/);
    expect(await User.count()).toBe(before);
  });

  it('the same body from the app itself but as text/plain is refused 415, and as JSON it works', async () => {
    const before = await User.count();
    const plain = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, rawBody: JSON.stringify(newAdmin()), headers: { 'content-type': 'text/plain' } });
    expect(plain.status).toBe(415);
    expect(plain.json.error).toMatch(/application\/json/);
    expect(await User.count()).toBe(before);
    const json = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: newAdmin() });
    expect(json.status).toBe(201);
  });

  it('without Origin: a cross-site Sec-Fetch-Site, a foreign Referer or nothing at all is refused', async () => {
    const before = await User.count();
    const cases: Record<string, string | null>[] = [
      { origin: null, 'sec-fetch-site': 'cross-site' },
      { origin: null, 'sec-fetch-site': 'same-site' },
      { origin: null, referer: 'http://localhost:3100/attack.html' },
      { origin: null },
      { origin: 'null' },
    ];
    for (const headers of cases) {
      const res = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: newAdmin(), headers });
      expect(res.status, JSON.stringify(headers)).toBe(403);
    }
    expect(await User.count()).toBe(before);
    // A same-origin Referer or Sec-Fetch-Site without Origin is accepted (older browsers).
    const referer = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: newAdmin(), headers: { origin: null, referer: `${APP_ORIGIN}/admin/users` } });
    expect(referer.status).toBe(201);
    const fetchSite = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: newAdmin(), headers: { origin: null, 'sec-fetch-site': 'same-origin' } });
    expect(fetchSite.status).toBe(201);
  });

  it('a DELETE and a multipart upload from another origin change nothing', async () => {
    const id = await demoBridge(people.engineer);
    const del = await call(bridge.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id }, headers: { origin: 'http://evil.example:3100' } });
    expect(del.status).toBe(403);
    expect(await Bridge.findByPk(Number(id))).not.toBeNull();
    const req = await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: PNG_1X1, name: 'p.png', type: 'image/png' });
    req.headers.set('origin', 'http://sub.localhost:3000');
    const up = await callRaw(attachments.POST, req, { id });
    expect(up.status).toBe(403);
    expect(await Attachment.count({ where: { bridgeId: Number(id) } })).toBe(0);
  });

  it("next-auth's own POSTs (sign-in, sign-out) from another origin are refused before next-auth runs", async () => {
    const res = await call(nextauth.POST, {
      method: 'POST',
      path: '/api/auth/signout',
      rawBody: 'csrfToken=x',
      headers: { origin: 'http://localhost:3100', 'content-type': 'application/x-www-form-urlencoded' },
      params: { nextauth: ['signout'] } as never,
    });
    expect(res.status).toBe(403);
  });

  it('behind a trusted proxy (TRUST_PROXY=1) the origin comes from X-Forwarded-Proto/Host; without it those headers are ignored', async () => {
    const forwarded = { origin: 'https://deck.example.test', 'x-forwarded-proto': 'https', 'x-forwarded-host': 'deck.example.test' };
    const untrusted = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: newAdmin(), headers: forwarded });
    expect(untrusted.status).toBe(403);
    process.env.TRUST_PROXY = '1';
    // Served over https: the session cookie is the __Secure- one.
    const cookie = people.admin.cookie.replace('next-auth.session-token', '__Secure-next-auth.session-token');
    const trusted = await call(users.POST, { method: 'POST', cookie, body: newAdmin(), headers: forwarded });
    expect(trusted.status).toBe(201);
  });
});
