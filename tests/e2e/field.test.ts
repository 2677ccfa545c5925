import { Jimp } from 'jimp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;

// A phone-sized viewport (390 × 844 CSS px, a common phone size), touch enabled.
const PHONE = { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 };

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

async function openFieldMode(page: Page): Promise<string> {
  await page.goto(`${baseUrl}/bridges`);
  await page.getByRole('link', { name: 'Marlow Creek Overpass' }).first().click();
  await page.waitForURL(/\/bridges\/\d+$/);
  const id = /\/bridges\/(\d+)$/.exec(page.url())![1];
  await page.getByRole('link', { name: 'Field mode' }).click();
  await page.waitForURL(/\/field$/);
  await shown(page, 'target-width').waitFor();
  return id;
}

/** What waits in the phone's offline store (IndexedDB "chordline-offline", store "outbox"). */
function outbox(page: Page): Promise<{ kind: string; bridgeId: number; body?: unknown }[]> {
  return page.evaluate(
    () =>
      new Promise((resolve, reject) => {
        const open = indexedDB.open('chordline-offline');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const req = open.result.transaction('outbox').objectStore('outbox').getAll();
          req.onsuccess = () => {
            resolve(req.result);
            open.result.close();
          };
          req.onerror = () => reject(req.error);
        };
      }),
  );
}

/** The decimal edge-width target shown under the feet-inches one, e.g. "4.53 ft" → 4.53. */
async function decimalTarget(page: Page): Promise<number> {
  const text = (await shown(page, 'target-width').locator('xpath=following-sibling::dd[1]').textContent()) ?? '';
  const value = Number(text.replace(/[^0-9.]/g, ''));
  expect(Number.isFinite(value) && value > 0, text).toBe(true);
  return value;
}

describe('field mode on a phone', () => {
  it('walks an inspector bracket by bracket: pass, fail, and an entry kept through a dropped connection', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'inspector@example.com');
    const id = await openFieldMode(page);
    // The demo data already holds checks on this bridge; only the ones made here are looked at below.
    const before: number[] = await page.evaluate(async (bridge) => (await (await fetch(`/api/bridges/${bridge}/checks`)).json()).map((c: { id: number }) => c.id), id);

    // Big type: the target numbers are at least 24 px; nothing scrolls sideways on the phone.
    const size = await shown(page, 'target-width').evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(size).toBeGreaterThanOrEqual(24);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);

    await page.getByRole('button', { name: '1', exact: true }).click();
    await page.getByRole('button', { name: /^G1/ }).click();

    // Point 0: type the shown decimal target (rounded to 0.01 ft, within the 1/4" tolerance) → PASS.
    const width0 = await decimalTarget(page);
    await page.getByLabel(/Measured edge width/).fill(width0.toFixed(2));
    await page.getByRole('button', { name: 'Record' }).click();
    await expect.poll(() => shown(page, 'field-verdict').textContent()).toBe('PASS');
    await expect.poll(() => shown(page, 'field-result').textContent()).toMatch(/Saved as check #\d+/);

    // A photo for that check, as the phone's camera would hand it over.
    const png = await new Jimp({ width: 640, height: 480, color: 0x5a7d9aff }).getBuffer('image/png');
    await page.locator('input[type=file]').setInputFiles({ name: 'bracket.png', mimeType: 'image/png', buffer: png });
    await expect.poll(() => page.getByText(/Photo attached to check #\d+/).count(), { timeout: 30000 }).toBe(1);

    // Next bracket, six inches wide → FAIL.
    await page.getByRole('button', { name: /Next/ }).click();
    await expect.poll(() => page.locator('h2').filter({ hasText: 'Point' }).first().textContent()).toMatch(/Point\s*1/);
    const width1 = await decimalTarget(page);
    await page.getByLabel(/Measured edge width/).fill((width1 + 0.5).toFixed(3));
    await page.getByRole('button', { name: 'Record' }).click();
    await expect.poll(() => shown(page, 'field-verdict').textContent()).toBe('FAIL');
    // Half a foot too wide: the crew is told to bring the edge in by about six inches.
    expect(await shown(page, 'fix-width').textContent()).toMatch(/^Bring the form edge in [56]\.\d\d in\.$/);

    // Connection lost: the entry shows at once, is kept on the phone, and goes when the connection returns.
    await page.getByRole('button', { name: /Next/ }).click();
    const width2 = await decimalTarget(page);
    await context.setOffline(true);
    await page.getByLabel(/Measured edge width/).fill(width2.toFixed(2));
    await page.getByRole('button', { name: 'Record' }).click();
    await expect.poll(() => shown(page, 'field-verdict').textContent()).toBe('PASS');
    await expect
      .poll(() =>
        page
          .getByRole('status')
          .filter({ hasText: /1 waiting/ })
          .count(),
      )
      .toBeGreaterThan(0);
    const kept = await outbox(page);
    expect(kept).toHaveLength(1);
    expect(kept[0]).toMatchObject({ kind: 'check', bridgeId: Number(id), body: { span: 1, girder: 'G1', point: 2 } });
    await context.setOffline(false);
    await expect.poll(() => page.getByText('All sent').count(), { timeout: 40000 }).toBe(1);
    expect(await outbox(page)).toEqual([]);

    // The server has all three, judged the same way.
    const checks = await page.evaluate(async (bridge) => (await fetch(`/api/bridges/${bridge}/checks`)).json(), id);
    const mine = checks.filter((c: { id: number; span: number; girder: string; point: number }) => !before.includes(c.id) && c.span === 1 && c.girder === 'G1' && c.point <= 2);
    expect(mine.find((c: { point: number }) => c.point === 0).photos).toHaveLength(1);
    expect(mine.map((c: { point: number; pass: boolean }) => [c.point, c.pass]).sort()).toEqual([
      [0, true],
      [1, false],
      [2, true],
    ]);

    // Where the top of girder was not surveyed, field mode says so instead of offering a reading box.
    await expect.poll(() => page.getByText(/not surveyed at this point/).count()).toBe(1);

    // The check history shows the photo (made a JPEG on the phone) as its thumbnail (made by the served app's worker: 320 px
    // on the longer side), not the whole file.
    await page.goto(`${baseUrl}/bridges/${id}/checks`);
    const thumb = page.locator('img[alt^="Photo bracket.jpg of check"]').first();
    await thumb.waitFor();
    expect(await thumb.getAttribute('src')).toMatch(/^\/api\/attachments\/\d+\?size=thumb$/);
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && [img.naturalWidth, img.naturalHeight].join('×'))).toBe('320×240');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('shows crew the targets without a Record button', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    await signIn(page, baseUrl, 'crew@example.com');
    await openFieldMode(page);
    expect(await page.getByRole('button', { name: 'Record' }).count()).toBe(0);
    expect(await page.getByText(/Read only/).count()).toBe(1);
    await context.close();
  });

  it('prints a field sheet with the caution, the revision and blank measurement columns', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, baseUrl, 'inspector@example.com');
    await page.goto(`${baseUrl}/bridges`);
    await page.getByRole('link', { name: 'Marlow Creek Overpass' }).first().click();
    await page.waitForURL(/\/bridges\/\d+$/);
    // The overview offers the sheet in its setting-out group and again as a PDF download: the page link is first.
    await page.getByRole('link', { name: 'Field sheet', exact: true }).first().click();
    await page.waitForURL(/\/sheet$/);
    await page.getByRole('link', { name: 'Span 1' }).click();
    await page.waitForURL(/span=1/);
    expect(await page.getByRole('heading', { name: /Span 1 · G1/ }).count()).toBe(1);
    expect(await page.getByRole('heading', { name: /Span 2/ }).count()).toBe(0);
    expect(await page.getByText(/revision\s*1/).count()).toBeGreaterThan(0);
    await page.emulateMedia({ media: 'print' });
    expect(
      await page
        .getByRole('note')
        .filter({ hasText: /geometry only/i })
        .isVisible(),
    ).toBe(true);
    expect(await page.getByRole('button', { name: 'Print sheet' }).isVisible()).toBe(false);
    await page.close();
  });
});
