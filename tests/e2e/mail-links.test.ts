/**
 * People join and recover access by e-mail (issue 14, item 8), end to end: the served app sends its
 * mail to a real SMTP server (smtp-server, started in global-setup.ts); the test reads the link from
 * the received message, opens it in Chromium, chooses a password, signs in with it, and shows the link
 * does not work twice. The same for a password reset asked for from the sign-in page.
 * E2E_SCREENSHOTS=<folder> also saves each new screen at desktop and 390 px phone width.
 */
import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors } from './browser';

const baseUrl = inject('baseUrl');
const mailDir = inject('mailDir');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

/** Undoes quoted-printable (RFC 2045 §6.7): soft line breaks and =XX escapes. */
function decodeQuotedPrintable(text: string): string {
  return Buffer.from(
    text.replace(/=\r?\n/g, '').replace(/=([0-9A-F]{2})/gi, (_, h: string) => String.fromCharCode(parseInt(h, 16))),
    'latin1',
  ).toString('utf8');
}

/** The body of a received message, decoded by its Content-Transfer-Encoding. */
function bodyOf(raw: string): string {
  const split = raw.search(/\r?\n\r?\n/);
  const headers = raw.slice(0, split);
  const body = raw.slice(split).trim();
  if (/content-transfer-encoding:\s*quoted-printable/i.test(headers)) return decodeQuotedPrintable(body);
  if (/content-transfer-encoding:\s*base64/i.test(headers)) return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  return body;
}

/** Waits for the SMTP server to receive a message to `to` whose body holds a /<kind>/ link, newer than `after` messages. */
async function receivedLink(to: string, kind: 'invite' | 'reset', after: Set<string>): Promise<{ link: string; subject: string; text: string }> {
  let found: { link: string; subject: string; text: string } | null = null;
  await expect
    .poll(
      () => {
        for (const name of fs.readdirSync(mailDir).filter((n) => n.endsWith('.eml') && !after.has(n))) {
          const raw = fs.readFileSync(path.join(mailDir, name), 'utf8');
          if (!new RegExp(`^To:.*${to.replace(/[.]/g, '\\.')}`, 'mi').test(raw)) continue;
          const text = bodyOf(raw);
          const link = new RegExp(`\\S+/${kind}/[A-Za-z0-9_-]{43}`).exec(text)?.[0];
          if (link) found = { link, subject: /^Subject: (.*)$/m.exec(raw)?.[1] ?? '', text };
        }
        return found !== null;
      },
      { timeout: 60_000, interval: 250 },
    )
    .toBe(true);
  return found!;
}

const seen = () => new Set(fs.readdirSync(mailDir));

async function shoot(page: Page, name: string) {
  const dir = process.env.E2E_SCREENSHOTS;
  if (!dir) return;
  await page.screenshot({ path: `${dir}/${name}-desktop.png`, fullPage: true });
  const size = page.viewportSize();
  await page.setViewportSize({ width: 390, height: 844 });
  await page.screenshot({ path: `${dir}/${name}-phone.png`, fullPage: true });
  if (size) await page.setViewportSize(size);
}

/** Chooses a password on an opened link page; retyped until the hydrated form takes the values. */
async function choosePassword(page: Page, password: string) {
  const save = page.getByRole('button', { name: 'Save password' });
  for (let attempt = 0; attempt < 5; attempt++) {
    await page.getByLabel('New password').fill(password);
    await page.getByLabel('Type it again').fill(password);
    if (await save.isEnabled()) break;
    await page.waitForTimeout(300);
  }
  await save.click();
  await page
    .getByRole('status')
    .getByText(/Your password is saved/)
    .waitFor();
}

/** Opens the link in a fresh browser (no session) and expects the "used or expired" page. */
async function expectLinkRefused(link: string) {
  const context = await browser.newContext();
  const page = await context.newPage();
  await page.goto(link);
  await page.getByRole('alert').getByText('This link has been used or has expired.').waitFor();
  expect(await page.getByLabel('New password').count()).toBe(0);
  await context.close();
}

describe('joining and recovering access by e-mail, through a real SMTP server', () => {
  it('an invited person chooses a password from the e-mailed link and signs in with it; the link does not work twice', async () => {
    const email = `invited-${Date.now()}@example.com`;
    const admin = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await admin.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'admin@example.com');
    await page.goto(`${baseUrl}/admin/users`, { waitUntil: 'networkidle' });
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Invite by e-mail' }) });
    const before = seen();
    const send = form.getByRole('button', { name: 'Send invite' });
    await form.getByLabel('Name').fill('Ivy Invited');
    await form.getByLabel('E-mail').fill(email);
    await form.getByLabel('Role').selectOption('inspector');
    await send.click();
    await form.getByRole('status').getByText(`Invite sent to ${email}.`).waitFor();
    const row = page.getByRole('row', { name: /Ivy Invited/ });
    await row.getByText('Invite pending').waitFor();
    await shoot(page, 'admin-users-invite');

    const mail = await receivedLink(email, 'invite', before);
    expect(mail.subject).toMatch(/invited to Chordline/);
    // Built from the app's own address (NEXTAUTH_URL), with a 43-character token.
    expect(mail.link.startsWith(`${baseUrl}/invite/`)).toBe(true);

    const person = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const tab = await person.newPage();
    const personErrors = trackPageErrors(tab);
    await tab.goto(mail.link, { waitUntil: 'networkidle' });
    await tab.getByRole('heading', { name: 'Welcome to Chordline' }).waitFor();
    await tab.getByText(email).waitFor();
    await shoot(tab, 'invite-link');
    await choosePassword(tab, 'ivy-chose-these-words');
    await shoot(tab, 'invite-done');
    await tab.getByRole('link', { name: 'Go to sign in' }).click();
    await signIn(tab, baseUrl, email, 'ivy-chose-these-words');
    expect(new URL(tab.url()).pathname).toBe('/bridges');
    await expectLinkRefused(mail.link);

    // The administrator's list no longer shows the invite as pending.
    await page.reload({ waitUntil: 'networkidle' });
    await page
      .getByRole('row', { name: /Ivy Invited/ })
      .getByRole('button', { name: 'Send reset link' })
      .waitFor();
    expect(
      await page
        .getByRole('row', { name: /Ivy Invited/ })
        .getByText('Invite pending')
        .count(),
    ).toBe(0);
    expect(errors).toEqual([]);
    expect(personErrors).toEqual([]);
    await person.close();
    await admin.close();
  });

  it('anyone asks for a reset link from the sign-in page; the answer is the same for an unknown address; the link works once', async () => {
    // A person of its own (the demo accounts keep their passwords for the other browser tests).
    const email = `forgetful-${Date.now()}@example.com`;
    const admin = await browser.newContext();
    const adminPage = await admin.newPage();
    await signIn(adminPage, baseUrl, 'admin@example.com');
    const made = await adminPage.evaluate(async (address) => {
      const r = await fetch('/api/admin/users', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: address, name: 'Fern Forgetful', role: 'engineer', password: 'first-password-of-fern' }),
      });
      return r.status;
    }, email);
    expect(made).toBe(201);
    await admin.close();

    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    const ask = async (email: string) => {
      await page.goto(`${baseUrl}/signin`, { waitUntil: 'networkidle' });
      await shoot(page, 'signin');
      await page.getByRole('link', { name: 'Forgot password?' }).click();
      await page.getByRole('heading', { name: 'Forgot your password?' }).waitFor();
      const button = page.getByRole('button', { name: 'Send me a link' });
      for (let attempt = 0; attempt < 5; attempt++) {
        await page.getByLabel('E-mail').fill(email);
        if (await button.isEnabled()) break;
        await page.waitForTimeout(300);
      }
      await shoot(page, 'forgot-password');
      await button.click();
      const status = page.getByRole('status');
      await status.waitFor();
      return status.innerText();
    };
    const before = seen();
    const unknown = await ask('nobody-at-all@example.com');
    const known = await ask(email);
    expect(known).toBe(unknown);
    expect(known).toMatch(/If an account uses that address/);
    await shoot(page, 'forgot-password-answer');

    const mail = await receivedLink(email, 'reset', before);
    expect(mail.link.startsWith(`${baseUrl}/reset/`)).toBe(true);
    // Nothing was sent for the unknown address.
    const sentTo = fs
      .readdirSync(mailDir)
      .filter((n) => n.endsWith('.eml') && !before.has(n))
      .map((n) => fs.readFileSync(path.join(mailDir, n), 'utf8'));
    expect(sentTo.some((raw) => /nobody-at-all@example\.com/.test(raw))).toBe(false);

    await page.goto(mail.link, { waitUntil: 'networkidle' });
    await page.getByRole('heading', { name: 'Choose a new password' }).waitFor();
    await shoot(page, 'reset-link');
    await choosePassword(page, 'fern-new-chosen-words');
    await page.getByRole('link', { name: 'Go to sign in' }).click();
    await signIn(page, baseUrl, email, 'fern-new-chosen-words');
    await expectLinkRefused(mail.link);
    // The page a used link opens, for the screenshots.
    if (process.env.E2E_SCREENSHOTS) {
      const again = await context.newPage();
      await again.setViewportSize({ width: 1280, height: 900 });
      await again.goto(mail.link, { waitUntil: 'networkidle' });
      await shoot(again, 'reset-link-used');
    }
    expect(errors).toEqual([]);
    await context.close();
  });
});
