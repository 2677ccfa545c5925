import { chromium, type Browser, type Page } from 'playwright-core';

/** Debian's Chromium, headless, with the flags this closed network needs. Never a downloaded browser. */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
}

/** Signs in through the real sign-in page. */
export async function signIn(page: Page, baseUrl: string, email: string, password = 'chordline-demo'): Promise<void> {
  await page.goto(`${baseUrl}/signin`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL(/\/bridges/);
}

/** Collects uncaught page errors so a test can assert there were none. */
export function trackPageErrors(page: Page): Error[] {
  const errors: Error[] = [];
  page.on('pageerror', (e) => errors.push(e));
  return errors;
}
