import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, shown, signIn, trackPageErrors } from './browser';
import { csrfJar } from '../support/csrf-jar';

const baseUrl = inject('baseUrl');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

describe('served pages', () => {
  it('carry the security headers and a session cookie scripts cannot read', async () => {
    const page = await fetch(`${baseUrl}/signin`);
    expect(page.headers.get('content-security-policy')).toMatch(/frame-ancestors 'none'/);
    expect(page.headers.get('content-security-policy')).toMatch(/default-src 'self'/);
    expect(page.headers.get('x-content-type-options')).toBe('nosniff');
    expect(page.headers.get('referrer-policy')).toBe('strict-origin-when-cross-origin');
    const { csrfToken, jar } = await csrfJar(baseUrl);
    const signIn = await fetch(`${baseUrl}/api/auth/callback/credentials`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar, origin: baseUrl },
      body: new URLSearchParams({ csrfToken, email: 'crew@example.com', password: 'chordline-demo' }),
    });
    const session = signIn.headers.getSetCookie().find((c) => c.includes('session-token'));
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
    const big = await fetch(`${baseUrl}/api/compute`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: (session as string).split(';')[0], origin: baseUrl },
      body: JSON.stringify({ name: 'x'.repeat(3 * 1024 * 1024) }),
    });
    expect(big.status).toBe(413);
  });
});

describe('foundation in a real browser', () => {
  it('an engineer signs in, creates a bridge from the starter and sees it listed', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 860 } });
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'engineer@example.com');
    await page
      .getByRole('link', { name: /new bridge/i })
      .first()
      .click();
    await page.waitForURL(/\/bridges\/new/);
    const name = `Browser test bridge ${Date.now()}`;
    // A new bridge starts in the form editor from the starter bridge (JSON is only for integrators).
    await page.getByRole('button', { name: 'Use the starter bridge' }).click();
    await page.getByLabel(/^Bridge name/).fill(name);
    await page.waitForFunction(() => [...document.querySelectorAll('button')].some((b) => b.textContent === 'Create bridge' && !b.disabled), undefined, { timeout: 60000 });
    await page.getByRole('button', { name: 'Create bridge' }).click();
    await page.waitForURL(/\/bridges\/\d+$/);
    await page.getByRole('heading', { name }).waitFor();
    await page.goto(`${baseUrl}/bridges`);
    await page.getByRole('link', { name }).waitFor();
    expect(await page.getByRole('link', { name }).count()).toBe(1);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('every demo account signs in and its session carries its role', async () => {
    for (const role of ['admin', 'engineer', 'inspector', 'crew']) {
      const context = await browser.newContext();
      const page = await context.newPage();
      await signIn(page, baseUrl, `${role}@example.com`);
      const session = await page.evaluate(async () => (await fetch('/api/auth/session')).json());
      expect(session.user.role).toBe(role);
      await page.getByRole('heading', { level: 1, name: 'Bridges' }).waitFor();
      // What a role may not do is not offered on the page.
      const offersNew = await page.getByRole('link', { name: /new bridge/i }).count();
      expect(offersNew > 0).toBe(role === 'engineer' || role === 'admin');
      await context.close();
    }
  });

  it('a wrong password gets one plain message that does not say which part was wrong', async () => {
    const page = await browser.newPage();
    await page.goto(`${baseUrl}/signin`);
    await page.getByLabel(/e-?mail/i).fill('inspector@example.com');
    await page.getByLabel(/password/i).fill('not-the-password');
    await page.getByRole('button', { name: /sign in/i }).click();
    const alert = page.locator('#signin-message');
    await alert.waitFor();
    const text = (await alert.textContent()) ?? '';
    expect(text).toMatch(/do not match/i);
    expect(text).not.toMatch(/unknown|no such|wrong password/i);
    expect(page.url()).toMatch(/\/signin/);
    await page.close();
  });

  it('a link opened while signed out comes back to its page after signing in', async () => {
    const page = await browser.newPage();
    const res = await page.goto(`${baseUrl}/bridges/1/checks`);
    expect(res?.ok()).toBe(true);
    await page.waitForURL(/\/signin\?callbackUrl=/);
    expect(new URL(page.url()).searchParams.get('callbackUrl')).toBe('/bridges/1/checks');
    for (let attempt = 0; attempt < 5; attempt++) {
      await page.getByLabel(/e-?mail/i).fill('inspector@example.com');
      await page.getByLabel(/password/i).fill('chordline-demo');
      if (await page.getByRole('button', { name: /sign in/i }).isEnabled()) break;
      await page.waitForTimeout(300);
    }
    await page.getByRole('button', { name: /sign in/i }).click();
    await page.waitForURL(/\/bridges\/1\/checks$/);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toMatch(/Checks/);
    await page.close();
  });

  it('opened at another address than the app’s own, the sign-in page says so and links to the right one', async () => {
    // The served app's own address is 127.0.0.1 (NEXTAUTH_URL); the same server answers as localhost,
    // where a sign-in would be refused as a cross-site request.
    const other = baseUrl.replace('127.0.0.1', 'localhost');
    const page = await browser.newPage();
    const errors = trackPageErrors(page);
    await page.goto(`${other}/signin?callbackUrl=/bridges/1/checks`);
    const notice = shown(page, 'signin-elsewhere');
    await notice.waitFor();
    expect(await notice.innerText()).toContain(`set up to be opened at ${baseUrl}`);
    expect(await page.getByRole('button', { name: /sign in/i }).count()).toBe(0);
    await notice.getByRole('link', { name: `Open the sign-in page at ${baseUrl}` }).click();
    await page.waitForURL(`${baseUrl}/signin?callbackUrl=%2Fbridges%2F1%2Fchecks`);
    await page.getByRole('button', { name: /sign in/i }).waitFor();
    expect(await shown(page, 'signin-elsewhere').count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });
});
