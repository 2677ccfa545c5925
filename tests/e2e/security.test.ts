/**
 * Issue 11 against the served app in a real browser: a page from another origin auto-submits a
 * text/plain form (JSON in the body) to POST /api/admin/users in a signed-in admin's browser and
 * creates nothing; a session cookie saved before sign-out is refused after it; a signed-out bridge
 * page leaks no name; the open-redirect callback lands on this site; attachments keep their own CSP;
 * and the administrator disables and removes a user on the users page.
 */
import http from 'node:http';
import net from 'node:net';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { launchChromium, signIn } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
let attacker: http.Server;
let attackerUrl = '';

/** The attacker's page: a form that posts JSON as text/plain to the app the moment it loads. */
function attackPage(target: string): string {
  const name = '{"email":"planted@test.invalid","name":"Planted","role":"admin","password":"planted-password-1","pad":"';
  return `<!doctype html><html><body><form method="POST" action="${target}/api/admin/users" enctype="text/plain">
<input type="hidden" name='${name}' value='"}'></form><script>document.forms[0].submit()</script></body></html>`;
}

beforeAll(async () => {
  browser = await launchChromium();
  // Another port of the same host: the same "site" for SameSite cookies, another origin.
  attacker = http.createServer((_, res) => {
    res.writeHead(200, { 'content-type': 'text/html' });
    res.end(attackPage(baseUrl));
  });
  await new Promise<void>((resolve) => attacker.listen(0, '127.0.0.1', resolve));
  attackerUrl = `http://127.0.0.1:${(attacker.address() as net.AddressInfo).port}/`;
});

afterAll(async () => {
  await browser?.close();
  await new Promise((r) => attacker?.close(r));
});

describe('attacks against the served app', () => {
  it("another origin's auto-submitted text/plain form creates no admin in a signed-in admin's browser", async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'admin@example.com');
    const answer = page.waitForResponse((r) => r.url() === `${baseUrl}/api/admin/users` && r.request().method() === 'POST');
    await page.goto(attackerUrl);
    expect((await answer).status()).toBe(403);
    await page.goto(`${baseUrl}/admin/users`);
    const users = await page.evaluate(async () => (await fetch('/api/admin/users')).json());
    expect(users.map((u: { email: string }) => u.email)).not.toContain('planted@test.invalid');
    await context.close();
  });

  it('a session cookie saved before sign-out is refused after it', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'crew@example.com');
    const saved = (await context.cookies())
      .filter((c) => c.name.includes('session-token'))
      .map((c) => `${c.name}=${c.value}`)
      .join('; ');
    expect((await fetch(`${baseUrl}/api/bridges`, { headers: { cookie: saved } })).status).toBe(200);
    await page.getByRole('button', { name: /sign out/i }).click();
    await page.waitForURL(/\/signin/);
    expect((await fetch(`${baseUrl}/api/bridges`, { headers: { cookie: saved } })).status).toBe(401);
    await context.close();
  });

  it('signed out, a bridge page and its editor answer only the sign-in redirect, without the name', async () => {
    for (const path of ['/bridges/1', '/bridges/1/edit']) {
      const res = await fetch(`${baseUrl}${path}`, { redirect: 'manual' });
      const text = await res.text();
      // The page streams, so the redirect may come as a 307 or inside a 200 (Next.js's streamed redirect).
      const target = res.headers.get('location') ?? /signin\?callbackUrl=[^"';]*/.exec(text)?.[0] ?? '';
      expect(target, path).toMatch(/signin\?callbackUrl=/);
      expect(text, path).not.toMatch(/Marlow Creek/);
      expect(/<title>[^<]*<\/title>/.exec(text)?.[0] ?? '', path).not.toMatch(/Marlow/);
    }
  });

  it('a callbackUrl of /%09/evil.example:3100/x lands on this site after sign-in', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await page.goto(`${baseUrl}/signin?callbackUrl=/%09/evil.example:3100/x`, { waitUntil: 'networkidle' });
    await page.getByLabel(/e-?mail/i).fill('crew@example.com');
    await page.getByLabel(/password/i).fill('chordline-demo');
    await page.getByRole('button', { name: /sign in/i }).click();
    await page.waitForURL(/\/bridges/);
    expect(new URL(page.url()).origin).toBe(baseUrl);
    // Signed in, the same link also stays here. A fresh tab of the same session, so the first tab's
    // client-side replace and refresh after sign-in cannot abort this navigation.
    const second = await context.newPage();
    await second.goto(`${baseUrl}/signin?callbackUrl=/%09/evil.example:3100/x`);
    expect(new URL(second.url()).origin).toBe(baseUrl);
    await context.close();
  });

  it('the administrator disables and then removes a user on the users page', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'admin@example.com');
    await page.goto(`${baseUrl}/admin/users`);
    const made = await page.evaluate(async () => {
      const r = await fetch('/api/admin/users', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ email: 'leaving@example.com', name: 'Lee Leaving', role: 'crew', password: 'leaving-password-1' }),
      });
      return r.status;
    });
    expect(made).toBe(201);
    await page.reload();
    const row = page.getByRole('row', { name: /Lee Leaving/ });
    await row.getByRole('button', { name: 'Disable' }).click();
    await row.getByText('Disabled', { exact: true }).waitFor();
    await row.getByRole('button', { name: 'Enable' }).waitFor();
    if (process.env.E2E_SCREENSHOTS) await page.screenshot({ path: `${process.env.E2E_SCREENSHOTS}/admin-users-disabled.png`, fullPage: true });
    await row.getByRole('button', { name: 'Remove' }).click();
    await page
      .getByRole('alertdialog')
      .getByText(/keep their name/)
      .waitFor();
    if (process.env.E2E_SCREENSHOTS) await page.screenshot({ path: `${process.env.E2E_SCREENSHOTS}/admin-users-remove.png`, fullPage: true });
    await page.getByRole('button', { name: 'Yes, remove this user' }).click();
    await expect.poll(() => page.getByRole('row', { name: /Lee Leaving/ }).count()).toBe(0);
    await context.close();
  });

  it('attachments keep their own sandbox CSP on the served app', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'inspector@example.com');
    const headers = await page.evaluate(async () => {
      const png = Uint8Array.from(atob('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mP8z8BQDwAEhQGAhKmMIQAAAABJRU5ErkJggg=='), (c) => c.charCodeAt(0));
      const form = new FormData();
      form.append('file', new Blob([png], { type: 'image/png' }), 'dot.png');
      const up = await (await fetch('/api/bridges/1/attachments', { method: 'POST', body: form })).json();
      const res = await fetch(`/api/attachments/${up.id}`);
      return { csp: res.headers.get('content-security-policy'), cache: res.headers.get('cache-control') };
    });
    expect(headers.csp).toBe("default-src 'none'; sandbox");
    expect(headers.cache).toBe('no-store');
    await context.close();
  });
});
