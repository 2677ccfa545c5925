/**
 * Field mode's target card and the printed field sheet on a bridge with a dead-load deflection table
 * (the ramp demo bridge): the card shows the deflection still to come at the point and the screed grade,
 * with their units and a word on what each means; a bridge without deflections shows neither. The
 * expected numbers are the engine's rows for the stored description, fetched through the API
 * (bridge-format.md, "Definitions the engine computes": deflection at Pk; screed grade = top of deck +
 * deflection), rounded as the tables round them (lib/units).
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';
import { computeOffsetTable, type BridgeDescription } from '@/lib/geometry';
import { lengthText } from '@/lib/units';

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

/** The id and stored description of a demo bridge, found by name through the API. */
async function demoByName(page: Page, name: string): Promise<{ id: number; description: BridgeDescription }> {
  return page.evaluate(async (n) => {
    const list = await (await fetch(`/api/bridges?q=${encodeURIComponent(n)}`)).json();
    const rows: Array<{ id: number; name: string }> = Array.isArray(list) ? list : list.bridges;
    const found = rows.find((b) => b.name === n);
    if (!found) throw new Error(`no bridge named ${n}`);
    const detail = await (await fetch(`/api/bridges/${found.id}`)).json();
    return { id: found.id, description: detail.description };
  }, name);
}

const heading = (page: Page) => page.locator('h2').filter({ hasText: 'Point' }).first();

describe('field mode with deflections', () => {
  it('shows the deflection and screed grade at each point of the ramp bridge on a phone, and nothing of them on a bridge without deflections', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'inspector@example.com');

    const ramp = await demoByName(page, 'Tansy Hollow Ramp B');
    const table = computeOffsetTable(ramp.description);
    await page.goto(`${baseUrl}/bridges/${ramp.id}/field`);
    await shown(page, 'target-width').waitFor();
    await page.getByRole('button', { name: '2', exact: true }).click();
    const girder = table.points.find((p) => p.span === 2 && p.side === 'left')!.girder;
    await page.getByRole('button', { name: new RegExp(`^${girder}`) }).click();
    await expect.poll(() => heading(page).textContent()).toMatch(/Point\s*0/);
    // Step to midspan (point 5 of 10), where the deflection is largest.
    for (let k = 1; k <= 5; k++) {
      await page.getByRole('button', { name: /Next/ }).click();
      await expect.poll(() => heading(page).textContent()).toMatch(new RegExp(`Point\\s*${k}\\b`));
    }
    const p = table.points.find((q) => q.span === 2 && q.girder === girder && q.point === 5)!;
    expect(p.deflection).toBeGreaterThan(0);
    await expect.poll(() => shown(page, 'target-deflection').textContent()).toBe(lengthText(p.deflection, 'ft'));
    expect(await shown(page, 'target-screed').textContent()).toBe(lengthText(p.screed_grade, 'ft'));
    const card = page.locator('section', { has: heading(page) });
    expect(await card.textContent()).toMatch(/sags this much under the wet deck/);
    expect(await card.textContent()).toMatch(/Top of deck plus deflection/);
    // Readable at arm's length, and nothing spills sideways on the phone.
    expect(await shown(page, 'target-deflection').evaluate((el) => parseFloat(getComputedStyle(el).fontSize))).toBeGreaterThanOrEqual(24);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: `${process.env.FIELD_SHOTS_DIR ?? '/tmp'}/chordline-field-deflection-390.png` });

    // The printed sheet says what the two columns mean and has them in every table.
    await page.goto(`${baseUrl}/bridges/${ramp.id}/sheet`);
    await shown(page, 'sheet-deflection-note').waitFor();
    const tables = page.locator('section.sheet-group table');
    const count = await tables.count();
    expect(count).toBe(new Set(table.points.filter((q) => q.side !== 'interior').map((q) => `${q.span}/${q.girder}`)).size);
    for (let i = 0; i < count; i++) expect(await tables.nth(i).locator('thead').textContent()).toMatch(/Deflection \(ft\).*Screed grade \(ft\)/);

    // A bridge without deflections: the card is as it always was.
    const plain = await demoByName(page, 'Marlow Creek Overpass');
    expect(plain.description.deflections ?? []).toEqual([]);
    await page.goto(`${baseUrl}/bridges/${plain.id}/field`);
    await shown(page, 'target-width').waitFor();
    expect(await shown(page, 'target-deflection').count()).toBe(0);
    expect(await shown(page, 'target-screed').count()).toBe(0);
    await page.goto(`${baseUrl}/bridges/${plain.id}/sheet`);
    await page.locator('section.sheet-group table').first().waitFor();
    expect(await shown(page, 'sheet-deflection-note').count()).toBe(0);
    expect(await page.locator('section.sheet-group thead').first().textContent()).not.toMatch(/Screed grade/);

    expect(errors).toEqual([]);
    await context.close();
  });
});
