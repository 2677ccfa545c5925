// Offline field mode: nothing lost through an expired sign-in or another person, nothing left on the phone after signing out.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn } from './browser';
import { SOON, Check, bridgeId, openControlledFieldMode, keepOnPhone, waitingItems, recordHere, apiGet } from './offline-helpers';

const baseUrl = inject('baseUrl');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

describe('nothing lost, nothing leaked', () => {
  const DESK = { viewport: { width: 1280, height: 800 } };

  function outboxCount(page: Page): Promise<number> {
    return waitingItems(page).then((items) => items.length);
  }

  it('keeps a measurement through an expired sign-in and another person signing in, then sends it under the person who took it', async () => {
    const context = await browser.newContext(DESK);
    const page = await context.newPage();
    await signIn(page, baseUrl, 'inspector@example.com');
    const inspector = await page.evaluate(async () => (await (await fetch('/api/auth/session')).json()).user.name as string);
    const id = await bridgeId(page, 'Quarry Lane Connector');
    await openControlledFieldMode(page, id);
    await keepOnPhone(page);
    await context.setOffline(true);
    await recordHere(page);
    const [item] = await waitingItems(page);

    // The sign-in expires while the phone is offline; the connection comes back.
    await context.clearCookies();
    await context.setOffline(false);
    await expect.poll(() => page.getByText('Signed out: sign in again to send.').count(), { timeout: 60000 }).toBeGreaterThan(0);
    expect(await outboxCount(page)).toBe(1);

    // Someone else signs in on this phone: the measurement is not theirs to send.
    await signIn(page, baseUrl, 'crew@example.com');
    await page.goto(`${baseUrl}/bridges/${id}/field`);
    await expect.poll(() => page.getByText(/taken on this phone by inspector@example\.com wait for that person/).count(), SOON).toBe(1);
    expect(await outboxCount(page)).toBe(1);
    const early = await apiGet<Check[]>(page, `/api/bridges/${id}/checks`);
    expect(early.filter((c) => c.client_key === item.key)).toEqual([]);
    // Signing out with nothing of their own waiting does not ask, and leaves the inspector's measurement.
    await page.goto(`${baseUrl}/bridges`);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(/\/signin/);
    expect(await outboxCount(page)).toBe(1);

    // The inspector signs in again: it goes, once, under the inspector's name.
    await signIn(page, baseUrl, 'inspector@example.com');
    await expect.poll(() => outboxCount(page), { timeout: 60000 }).toBe(0);
    const sent = (await apiGet<(Check & { by: string })[]>(page, `/api/bridges/${id}/checks`)).filter((c) => c.client_key === item.key);
    expect(sent).toHaveLength(1);
    expect(sent[0].by).toBe(inspector);
    await context.close();
  });

  it('asks before signing out deletes unsent measurements, then clears the bridge data from the phone', async () => {
    const context = await browser.newContext(DESK);
    const page = await context.newPage();
    await signIn(page, baseUrl, 'inspector@example.com');
    const id = await bridgeId(page, 'Marlow Creek Overpass');
    await openControlledFieldMode(page, id);
    await keepOnPhone(page);
    await context.setOffline(true);
    await recordHere(page);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect.poll(() => page.getByRole('alertdialog').textContent(), SOON).toMatch(/1 measurement or photo has not reached the server yet/);
    await page.getByRole('button', { name: 'Stay signed in' }).click();
    expect(await outboxCount(page)).toBe(1);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Delete and sign out' }).click();
    await expect.poll(() => outboxCount(page), SOON).toBe(0);
    const left = await page.evaluate(
      () =>
        new Promise<{ bridges: number; caches: string[] }>((resolve) => {
          const open = indexedDB.open('chordline-offline');
          open.onsuccess = () => {
            const req = open.result.transaction('bridges').objectStore('bridges').count();
            req.onsuccess = async () => resolve({ bridges: req.result, caches: await caches.keys() });
          };
        }),
    );
    expect(left.bridges).toBe(0);
    expect(left.caches.filter((c) => ['chordline-pages', 'chordline-rsc', 'chordline-data', 'chordline-photos'].includes(c))).toEqual([]);
    await context.close();
  });
});
