import { chromium, type Browser, type Locator, type Page } from 'playwright-core';

/** Debian's Chromium, headless, with the flags this closed network needs. Never a downloaded browser. */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    // Software WebGL (SwiftShader) so the 3D view renders on machines without a GPU.
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--use-angle=swiftshader',
      '--enable-unsafe-swiftshader',
      '--ignore-gpu-blocklist',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

/** Signs in through the real sign-in page. */
export async function signIn(page: Page, baseUrl: string, email: string, password = 'chordline-demo'): Promise<void> {
  await page.goto(`${baseUrl}/signin`, { waitUntil: 'networkidle' });
  const button = page.getByRole('button', { name: /sign in/i });
  // Typing before React has hydrated the form is lost; retype until the button takes the values.
  for (let attempt = 0; attempt < 5; attempt++) {
    await page.getByLabel(/e-?mail/i).fill(email);
    await page.getByLabel(/password/i).fill(password);
    if (await button.isEnabled()) break;
    await page.waitForTimeout(300);
  }
  await button.click();
  await page.waitForURL(/\/bridges/);
}

/** Collects uncaught page errors so a test can assert there were none. */
export function trackPageErrors(page: Page): Error[] {
  const errors: Error[] = [];
  page.on('pageerror', (e) => errors.push(e));
  return errors;
}

/**
 * The shown element with this test id. While React streams a page in, a finished part can sit in a
 * hidden holder beside its revealed copy for a moment; a bare getByTestId then matches two elements.
 */
export function shown(scope: Page | Locator, testId: string): Locator {
  return scope.getByTestId(testId).filter({ visible: true });
}
