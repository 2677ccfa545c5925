/**
 * "Forgot password?" (issue 14, item 8): anyone can ask for a reset link; the answer never says whether
 * the address has an account; the link (1 hour, stored as a hash) works once and ends every session of
 * the account; requests and failed link uses are limited per client address (429), and mails to one
 * address per hour, in the database.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import * as reset from '@/app/api/password-reset/route';
import * as links from '@/app/api/password-links/route';
import * as bridges from '@/app/api/bridges/route';
import { authorizeCredentials } from '@/lib/auth/options';
import { LINK_FAILURES_PER_CLIENT, RESET_MAILS_PER_ACCOUNT, RESET_REQUESTS_PER_CLIENT } from '@/lib/auth/request-throttle';
import { RESET_REQUEST_ANSWER, settleAccountMail } from '@/lib/services/password-links';
import { FREE_FAILURES, signInVerdict } from '@/lib/auth/throttle';
import { AuthRequest, OneTimeToken, OutboxMessage, User } from '@/models';
import { call, makeUsers, sessionCookieFor, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
let clientNo = 0;
/** A fresh client address (TEST-NET-2) so each test starts with an empty per-client count. */
const newClient = () => `198.51.100.${++clientNo}`;

beforeAll(async () => {
  delete process.env.SMTP_URL;
  delete process.env.TRUST_PROXY;
  people = await makeUsers();
});

const ask = (email: unknown, client: string, headers: Record<string, string> = {}) => call(reset.POST, { method: 'POST', body: { email }, headers: { 'x-forwarded-for': client, ...headers } });
const choose = (token: string, password: string, client: string) => call(links.POST, { method: 'POST', body: { purpose: 'reset', token, password }, headers: { 'x-forwarded-for': client } });

async function mailsTo(email: string) {
  await settleAccountMail();
  return (await OutboxMessage.findAll({ order: [['id', 'ASC']] })).filter((r) => (JSON.parse(r.recipients) as string[]).includes(email));
}
const tokenIn = (text: string) => /\/reset\/([A-Za-z0-9_-]{43})/.exec(text)?.[1] ?? null;

describe('asking for a reset link', () => {
  it('answers the same words for an address with an account and one without; only the account gets mail', async () => {
    const client = newClient();
    const known = await ask(people.inspector.email.toUpperCase(), client);
    const unknown = await ask('nobody-here@test.invalid', client);
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.text).toBe(unknown.text);
    expect(known.json.message).toBe(RESET_REQUEST_ANSWER);
    expect([...known.headers.keys()].sort()).toEqual([...unknown.headers.keys()].sort());
    const mails = await mailsTo(people.inspector.email);
    expect(mails).toHaveLength(1);
    expect(mails[0].subject).toMatch(/new Chordline password/);
    expect(await mailsTo('nobody-here@test.invalid')).toHaveLength(0);
  });

  it('a disabled account gets the same answer and no mail', async () => {
    const email = `disabled-${Date.now()}@test.invalid`;
    const { createUser } = await import('@/lib/services/users');
    const u = await createUser(null, { email, name: 'Off', role: 'crew', password: 'disabled-password-1' });
    await User.update({ disabledAt: new Date() }, { where: { id: u.id } });
    const res = await ask(email, newClient());
    expect(res.json.message).toBe(RESET_REQUEST_ANSWER);
    expect(await mailsTo(email)).toHaveLength(0);
  });

  it('builds the link from NEXTAUTH_URL, never from the Host or X-Forwarded-Host headers', async () => {
    process.env.TRUST_PROXY = '1';
    try {
      const res = await ask(people.crew.email, newClient(), { host: 'evil.example', 'x-forwarded-host': 'evil.example', 'x-forwarded-proto': 'https', origin: 'https://evil.example' });
      // With TRUST_PROXY the forwarded origin is this request's own, so the request itself is accepted.
      expect(res.status, res.text).toBe(202);
    } finally {
      delete process.env.TRUST_PROXY;
    }
    const mails = await mailsTo(people.crew.email);
    const text = mails[mails.length - 1].textBody;
    expect(text).toContain(`${process.env.NEXTAUTH_URL}/reset/`);
    expect(text).not.toContain('evil.example');
  });

  it('refuses a bad address with 400 and records nothing; needs the app origin', async () => {
    const client = newClient();
    for (const email of ['not-an-address', '', 42, null, `${'a'.repeat(250)}@test.invalid`]) {
      const res = await ask(email, client);
      expect(res.status, String(email)).toBe(400);
      expect(res.json.fields.email).toBeDefined();
    }
    expect(await AuthRequest.count({ where: { client } })).toBe(0);
    const foreign = await call(reset.POST, { method: 'POST', body: { email: people.crew.email }, headers: { origin: 'http://evil.example' } });
    expect(foreign.status).toBe(403);
  });

  it(`one client may ask ${RESET_REQUESTS_PER_CLIENT} times in 15 minutes, then gets 429 whatever the address; others are not affected`, async () => {
    const client = newClient();
    for (let i = 0; i < RESET_REQUESTS_PER_CLIENT; i++) expect((await ask(`spray-${i}@test.invalid`, client)).status).toBe(202);
    const limited = await ask(people.admin.email, client);
    expect(limited.status).toBe(429);
    expect(limited.json.error).toMatch(/Wait \d+ minute/);
    expect((await ask('spray-x@test.invalid', client)).status).toBe(429);
    expect((await ask('spray-x@test.invalid', newClient())).status).toBe(202);
    // As if 15 minutes had passed.
    await AuthRequest.update({ createdAt: new Date(Date.now() - 16 * 60_000) }, { where: { client } });
    expect((await ask('spray-y@test.invalid', client)).status).toBe(202);
  });

  it(`one address gets at most ${RESET_MAILS_PER_ACCOUNT} mails an hour; further requests get the same answer and send nothing`, async () => {
    const email = people.admin.email;
    const before = (await mailsTo(email)).length;
    for (let i = 0; i < RESET_MAILS_PER_ACCOUNT + 2; i++) {
      const res = await ask(email, newClient());
      expect(res.status).toBe(202);
      expect(res.json.message).toBe(RESET_REQUEST_ANSWER);
      await settleAccountMail();
    }
    expect((await mailsTo(email)).length - before).toBe(RESET_MAILS_PER_ACCOUNT);
  });
});

describe('using a reset link', () => {
  it('works once, within the hour; only the newest link works; it ends every session and lifts the sign-in slowdown', async () => {
    const { createUser } = await import('@/lib/services/users');
    const email = `resetter-${Date.now()}@test.invalid`;
    const u = await createUser(null, { email, name: 'Rae Resetter', role: 'engineer', password: 'forgotten-password-1' });
    const cookie = await sessionCookieFor(u.id);
    expect((await call(bridges.GET, { cookie })).status).toBe(200);
    for (let i = 0; i < FREE_FAILURES + 2; i++) await authorizeCredentials(email, `wrong-${i}`, newClient());
    expect(await signInVerdict(email, newClient())).not.toBeNull();

    await ask(email, newClient());
    const firstToken = tokenIn((await mailsTo(email))[0].textBody)!;
    await ask(email, newClient());
    const mails = await mailsTo(email);
    const token = tokenIn(mails[mails.length - 1].textBody)!;
    expect(token).not.toBe(firstToken);
    const client = newClient();
    // Asking again ended the first link.
    expect((await choose(firstToken, 'chosen-after-reset', client)).status).toBe(400);
    const done = await choose(token, 'chosen-after-reset', client);
    expect(done.status, done.text).toBe(200);
    expect((await call(bridges.GET, { cookie })).status).toBe(401);
    expect(await signInVerdict(email, newClient())).toBeNull();
    expect(await authorizeCredentials(email, 'chosen-after-reset', newClient())).toMatchObject({ email });
    expect(await authorizeCredentials(email, 'forgotten-password-1', newClient())).toBeNull();
    const again = await choose(token, 'second-use-password', client);
    expect(again.status).toBe(400);
    expect(again.json.error).toBe('This link has been used or has expired. Ask for a new one.');
  });

  it('an expired link does not work, and says so in the same words', async () => {
    await ask(people.crew.email, newClient());
    const mails = await mailsTo(people.crew.email);
    const token = tokenIn(mails[mails.length - 1].textBody)!;
    await OneTimeToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: people.crew.id, usedAt: null } });
    const res = await choose(token, 'expired-link-password', newClient());
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/used or has expired/);
  });

  it(`${LINK_FAILURES_PER_CLIENT} links that do not work from one client, then 429 even for a good link; other clients go on`, async () => {
    const client = newClient();
    for (let i = 0; i < LINK_FAILURES_PER_CLIENT; i++) {
      const res = await choose(i % 2 ? 'x'.repeat(43) : `guess-${i}`, 'some-long-password', client);
      expect(res.status, `try ${i}`).toBe(400);
    }
    await ask(people.inspector.email, newClient());
    const mails = await mailsTo(people.inspector.email);
    const token = tokenIn(mails[mails.length - 1].textBody)!;
    const limited = await choose(token, 'limited-password-1', client);
    expect(limited.status).toBe(429);
    expect((await choose(token, 'limited-password-1', newClient())).status).toBe(200);
  });

  it('refuses bad input with field errors: purpose, token type and size, password rules', async () => {
    const bad = [
      {},
      { purpose: 'admin', token: 'x', password: 'long-enough-pass' },
      { purpose: 'reset', token: 5, password: 'long-enough-pass' },
      { purpose: 'reset', token: 'x'.repeat(201), password: 'long-enough-pass' },
      { purpose: 'reset', token: 'x', password: 'p'.repeat(201) },
    ];
    for (const body of bad) {
      const res = await call(links.POST, { method: 'POST', body, headers: { 'x-forwarded-for': newClient() } });
      expect(res.status, JSON.stringify(body).slice(0, 80)).toBe(400);
      expect(Object.keys(res.json.fields ?? {}).length).toBeGreaterThan(0);
    }
  });
});
