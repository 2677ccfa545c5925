/**
 * Inviting people by e-mail (issue 14, item 8): an administrator invites a person, who gets a one-time
 * link (24 h) to choose their own password. Only the SHA-256 of the token is stored; the link works
 * once; re-sending ends the old link; withdrawing deletes the unused account. Mail goes to the local
 * outbox here (no SMTP_URL); the browser test sends it through a real SMTP server.
 */
import crypto from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import * as users from '@/app/api/admin/users/route';
import * as invite from '@/app/api/admin/users/invite/route';
import * as inviteOne from '@/app/api/admin/users/[id]/invite/route';
import * as resetLink from '@/app/api/admin/users/[id]/reset-link/route';
import * as links from '@/app/api/password-links/route';
import { authorizeCredentials } from '@/lib/auth/options';
import { INVITE_TTL_MS } from '@/lib/auth/one-time-token';
import { OneTimeToken, OutboxMessage, User } from '@/models';
import { call, makeUsers, sessionCookieFor, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
let fresh = 0;

beforeAll(async () => {
  delete process.env.SMTP_URL;
  people = await makeUsers();
});

const newPerson = () => ({ name: 'Ines Invited', email: `Invitee-${++fresh}@Test.Invalid`, role: 'inspector' });

/** The last outbox message to the address, and the link in it. */
async function lastMailTo(email: string): Promise<{ subject: string; text: string; link: string; token: string; purpose: string }> {
  const rows = await OutboxMessage.findAll({ order: [['id', 'DESC']] });
  const row = rows.find((r) => (JSON.parse(r.recipients) as string[]).includes(email));
  if (!row) throw new Error(`no mail to ${email}`);
  const m = /(https?:\/\/\S+)\/(invite|reset)\/([A-Za-z0-9_-]+)/.exec(row.textBody);
  if (!m) throw new Error(`no link in: ${row.textBody}`);
  return { subject: row.subject, text: row.textBody, link: m[0], token: m[3], purpose: m[2] };
}

const sendInvite = (body: unknown, cookie = people.admin.cookie) => call(invite.POST, { method: 'POST', cookie, body });
const choose = (purpose: string, token: string, password: string, client = '192.0.2.200') =>
  call(links.POST, { method: 'POST', body: { purpose, token, password }, headers: { 'x-forwarded-for': client } });

describe('inviting a person by e-mail', () => {
  it('makes a pending account with no usable password and mails a one-time link built from NEXTAUTH_URL', async () => {
    const p = newPerson();
    const res = await sendInvite(p);
    expect(res.status, res.text).toBe(201);
    expect(res.json.via).toBe('outbox');
    const email = p.email.toLowerCase();
    expect(res.json.user).toMatchObject({ email, role: 'inspector', invitePending: true });
    expect(res.text).not.toMatch(/password_?hash|\$2[aby]\$/i);
    const mail = await lastMailTo(email);
    expect(mail.subject).toMatch(/invited/i);
    expect(mail.link.startsWith(`${process.env.NEXTAUTH_URL}/invite/`)).toBe(true);
    // 32 random bytes in base64url.
    expect(mail.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    // No password typed by anyone signs the pending account in.
    for (const guess of ['', 'correct-horse-battery', mail.token]) expect(await authorizeCredentials(email, guess, '192.0.2.201')).toBeNull();
    // The admin list shows the invite as pending, with when its link stops working (24 h from now).
    const list = await call(users.GET, { cookie: people.admin.cookie });
    const row = list.json.find((u: { email: string }) => u.email === email);
    expect(row.invitePending).toBe(true);
    const left = new Date(row.inviteExpiresAt).getTime() - Date.now();
    expect(left).toBeGreaterThan(INVITE_TTL_MS - 60_000);
    expect(left).toBeLessThanOrEqual(INVITE_TTL_MS);
  });

  it('stores only the SHA-256 of the token: the token itself is nowhere in the tokens table', async () => {
    const p = newPerson();
    await sendInvite(p);
    const mail = await lastMailTo(p.email.toLowerCase());
    const user = await User.findOne({ where: { email: p.email.toLowerCase() } });
    const rows = await OneTimeToken.findAll({ where: { userId: user!.id }, raw: true });
    expect(rows).toHaveLength(1);
    // node:crypto's SHA-256 (FIPS 180-4), independent of the app's helper.
    expect(rows[0].tokenHash).toBe(crypto.createHash('sha256').update(mail.token).digest('hex'));
    expect(JSON.stringify(rows)).not.toContain(mail.token);
    expect(rows[0].purpose).toBe('invite');
  });

  it('the link sets the chosen password once: the person signs in with it, and a second use is refused', async () => {
    const p = newPerson();
    await sendInvite(p);
    const email = p.email.toLowerCase();
    const { token } = await lastMailTo(email);
    // A password that breaks the rules is refused without using the link up.
    const short = await choose('invite', token, 'short');
    expect(short.status).toBe(400);
    expect(short.json.fields.password).toBeDefined();
    // The invite link is not a reset link.
    expect((await choose('reset', token, 'my-own-chosen-words')).status).toBe(400);
    const first = await choose('invite', token, 'my-own-chosen-words');
    expect(first.status, first.text).toBe(200);
    expect(first.json).toEqual({ email });
    expect(await authorizeCredentials(email, 'my-own-chosen-words', '192.0.2.202')).toMatchObject({ email, role: 'inspector' });
    const second = await choose('invite', token, 'someone-elses-words');
    expect(second.status).toBe(400);
    expect(second.json.error).toMatch(/used or has expired/);
    expect(await authorizeCredentials(email, 'someone-elses-words', '192.0.2.202')).toBeNull();
    const list = await call(users.GET, { cookie: people.admin.cookie });
    expect(list.json.find((u: { email: string }) => u.email === email).invitePending).toBe(false);
  });

  it('two requests racing with the same link: exactly one wins', async () => {
    const p = newPerson();
    await sendInvite(p);
    const { token } = await lastMailTo(p.email.toLowerCase());
    const answers = await Promise.all([choose('invite', token, 'racing-password-one'), choose('invite', token, 'racing-password-two')]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 400]);
  });

  it('an expired link does not work', async () => {
    const p = newPerson();
    await sendInvite(p);
    const email = p.email.toLowerCase();
    const { token } = await lastMailTo(email);
    const user = await User.findOne({ where: { email } });
    // As if 24 hours and a minute had passed.
    await OneTimeToken.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { userId: user!.id } });
    const res = await choose('invite', token, 'too-late-password');
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/used or has expired/);
    const list = await call(users.GET, { cookie: people.admin.cookie });
    const row = list.json.find((u: { email: string }) => u.email === email);
    expect(row.invitePending).toBe(true);
    expect(new Date(row.inviteExpiresAt).getTime()).toBeLessThan(Date.now());
  });

  it('re-sending makes a new link and ends the old one', async () => {
    const p = newPerson();
    const made = await sendInvite(p);
    const email = p.email.toLowerCase();
    const old = await lastMailTo(email);
    const again = await call(inviteOne.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: String(made.json.user.id) } });
    expect(again.status, again.text).toBe(200);
    const fresh = await lastMailTo(email);
    expect(fresh.token).not.toBe(old.token);
    expect((await choose('invite', old.token, 'old-link-password')).status).toBe(400);
    expect((await choose('invite', fresh.token, 'new-link-password')).status).toBe(200);
    expect(await authorizeCredentials(email, 'new-link-password', '192.0.2.203')).toMatchObject({ email });
    // Accepted: nothing left to re-send or withdraw.
    expect((await call(inviteOne.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: String(made.json.user.id) } })).status).toBe(400);
    expect((await call(inviteOne.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id: String(made.json.user.id) } })).status).toBe(400);
  });

  it('withdrawing deletes the unused account and its link; the address can be invited again', async () => {
    const p = newPerson();
    const made = await sendInvite(p);
    const email = p.email.toLowerCase();
    const { token } = await lastMailTo(email);
    const res = await call(inviteOne.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id: String(made.json.user.id) } });
    expect(res.status, res.text).toBe(200);
    expect(await User.findByPk(made.json.user.id)).toBeNull();
    expect(await OneTimeToken.count({ where: { userId: made.json.user.id } })).toBe(0);
    expect((await choose('invite', token, 'withdrawn-password')).status).toBe(400);
    expect((await sendInvite(p)).status).toBe(201);
  });

  it('refuses bad input with field errors and sends nothing; an address in use is refused', async () => {
    const before = await OutboxMessage.count();
    for (const body of [
      {},
      { name: 'A', email: 'not-an-address', role: 'crew' },
      { name: '', email: 'x@test.invalid', role: 'crew' },
      { name: 'A', email: 'y@test.invalid', role: 'boss' },
      { name: 'A'.repeat(500), email: 'z@test.invalid', role: 'crew' },
    ]) {
      const res = await sendInvite(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.json.fields ?? {}).length).toBeGreaterThan(0);
    }
    const taken = await sendInvite({ name: 'Twin', email: people.crew.email, role: 'crew' });
    expect(taken.status).toBe(400);
    expect(taken.json.fields.email).toBeDefined();
    expect(await OutboxMessage.count()).toBe(before);
  });

  it('only administrators invite, re-send, withdraw or send reset links; writes need the app origin', async () => {
    for (const who of ['crew', 'inspector', 'engineer'] as const) {
      expect((await sendInvite(newPerson(), people[who].cookie)).status).toBe(403);
      expect((await call(inviteOne.POST, { method: 'POST', cookie: people[who].cookie, params: { id: String(people.crew.id) } })).status).toBe(403);
      expect((await call(inviteOne.DELETE, { method: 'DELETE', cookie: people[who].cookie, params: { id: String(people.crew.id) } })).status).toBe(403);
      expect((await call(resetLink.POST, { method: 'POST', cookie: people[who].cookie, params: { id: String(people.crew.id) } })).status).toBe(403);
    }
    expect((await call(invite.POST, { method: 'POST', body: newPerson() })).status).toBe(401);
    const foreign = await call(invite.POST, { method: 'POST', cookie: people.admin.cookie, body: newPerson(), headers: { origin: 'http://evil.example' } });
    expect(foreign.status).toBe(403);
  });
});

describe('an administrator sends a reset link instead of typing a password', () => {
  it('mails a 1-hour link; using it sets the password and ends the sessions the person had', async () => {
    const target = people.engineer;
    const cookie = await sessionCookieFor(target.id);
    const sent = await call(resetLink.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: String(target.id) } });
    expect(sent.status, sent.text).toBe(202);
    const mail = await lastMailTo(target.email);
    expect(mail.purpose).toBe('reset');
    const left = new Date(sent.json.expires_at).getTime() - Date.now();
    expect(left).toBeGreaterThan(59 * 60_000);
    expect(left).toBeLessThanOrEqual(60 * 60_000);
    // The old session still works until the password is changed.
    expect((await call(users.GET, { cookie })).status).toBe(403);
    expect((await choose('reset', mail.token, 'reset-by-link-words')).status).toBe(200);
    expect((await call(users.GET, { cookie })).status).toBe(401);
    expect(await authorizeCredentials(target.email, 'reset-by-link-words', '192.0.2.204')).toMatchObject({ email: target.email });
    expect(await authorizeCredentials(target.email, 'correct-horse-battery', '192.0.2.204')).toBeNull();
  });

  it('a pending invite gets "re-send invite" instead; an unknown id is a 404', async () => {
    const made = await sendInvite(newPerson());
    expect((await call(resetLink.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: String(made.json.user.id) } })).status).toBe(400);
    expect((await call(resetLink.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: '999999' } })).status).toBe(404);
    expect((await call(resetLink.POST, { method: 'POST', cookie: people.admin.cookie, params: { id: 'abc' } })).status).toBe(404);
  });
});
