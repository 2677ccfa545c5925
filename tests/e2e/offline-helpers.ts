/** Shared pieces of the offline field mode browser tests: phone viewport, waits and page helpers. */
import type { Page } from 'playwright-core';
import { expect, inject } from 'vitest';
import { shown } from './browser';

const baseUrl = inject('baseUrl');

// A phone-sized viewport (390 × 844 CSS px, a common phone size), touch enabled.
export const PHONE = { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 };
// Room to wait on a busy machine (an upper bound on waiting, not a timing check).
export const SOON = { timeout: 30000 };

export type Check = { id: number; span: number; girder: string; point: number; revision: number; client_key: string | null; pass: boolean; computed_edge_width: number | null };
export type Photo = { id: number; check_id: number | null; client_key: string | null; content_type: string; url: string };
export type Waiting = { key: string; kind: string; checkKey: string | null };

export async function bridgeId(page: Page, name: string): Promise<string> {
  const list = (await page.evaluate(async () => (await fetch('/api/bridges', { headers: { accept: 'application/json' } })).json())) as unknown;
  const rows = (Array.isArray(list) ? list : ((list as { bridges?: unknown[]; items?: unknown[] }).bridges ?? (list as { items?: unknown[] }).items ?? [])) as { id: number; name: string }[];
  const row = rows.find((b) => b.name === name);
  expect(row, `demo bridge ${name}`).toBeDefined();
  return String(row!.id);
}

/** Opens field mode once the service worker controls the page (the first visit installs it). */
export async function openControlledFieldMode(page: Page, id: string): Promise<void> {
  await page.goto(`${baseUrl}/bridges/${id}/field`);
  await page.evaluate(async () => {
    await navigator.serviceWorker.ready;
  });
  if (!(await page.evaluate(() => Boolean(navigator.serviceWorker.controller)))) await page.reload();
  await expect.poll(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller)), SOON).toBe(true);
  await shown(page, 'target-width').waitFor();
}

export async function keepOnPhone(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Keep on this phone' }).click();
  await expect.poll(() => shown(page, 'kept-status').textContent(), { timeout: 30000 }).toMatch(/^Kept on this phone · saved \d\d:\d\d · revision \d+$/);
}

/** The phone's waiting items, straight from IndexedDB. */
export function waitingItems(page: Page): Promise<Waiting[]> {
  return page.evaluate(
    () =>
      new Promise<Waiting[]>((resolve, reject) => {
        const open = indexedDB.open('chordline-offline');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const req = open.result.transaction('outbox').objectStore('outbox').getAll();
          req.onsuccess = () => {
            resolve((req.result as Waiting[]).map((i) => ({ key: i.key, kind: i.kind, checkKey: i.checkKey ?? null })));
            open.result.close();
          };
          req.onerror = () => reject(req.error);
        };
      }),
  );
}

/** The decimal edge-width target shown under the feet-inches one, e.g. "4.53 ft" → 4.53. */
export async function decimalTarget(page: Page): Promise<number> {
  const text = (await shown(page, 'target-width').locator('xpath=following-sibling::dd[1]').textContent()) ?? '';
  return Number(text.replace(/[^0-9.]/g, ''));
}

/** Records the shown target as the measured width at the current bracket, then steps on. */
export async function recordHere(page: Page): Promise<void> {
  await page.getByLabel(/Measured edge width/).fill((await decimalTarget(page)).toFixed(2));
  await page.getByRole('button', { name: 'Record' }).click();
  await expect.poll(() => shown(page, 'field-verdict').textContent(), SOON).toBe('PASS');
}

export async function pickLastSpan(page: Page): Promise<{ span: number; girder: string }> {
  const spans = page.getByRole('group', { name: 'Span' }).getByRole('button');
  const fallback = page.locator('fieldset').first().getByRole('button');
  const buttons = (await spans.count()) ? spans : fallback;
  const last = buttons.last();
  const span = Number(await last.textContent());
  await last.click();
  const girder = ((await page.locator('fieldset').nth(1).getByRole('button').first().textContent()) ?? '').replace(/(LT|RT)$/, '').trim();
  await page.locator('fieldset').nth(1).getByRole('button').first().click();
  return { span, girder };
}

export function apiGet<T>(page: Page, url: string): Promise<T> {
  return page.evaluate(async (u) => (await fetch(u, { headers: { accept: 'application/json' }, cache: 'no-store' })).json(), url) as Promise<T>;
}
