import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
// Screenshots for a person to look at; kept outside the repository.
const shots = process.env.CHORDLINE_SHOTS_DIR || fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-portfolio-shots-'));

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

async function engineerPage(viewport = { width: 1366, height: 900 }): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signIn(page, baseUrl, 'engineer@example.com');
  return page;
}

const api = (page: Page, url: string) => page.evaluate(async (u) => (await fetch(u)).json(), url);

describe('portfolio page', () => {
  it('shows the demo field history: check progress, a signed-off span and the open failure', async () => {
    const page = await engineerPage();
    const errors = trackPageErrors(page);
    await page.goto(`${baseUrl}/bridges`);
    const row = page.locator('[data-testid=portfolio-table] tr', { hasText: 'Marlow Creek Overpass' });
    await row.waitFor();
    const id = Number(await row.getAttribute('data-bridge-id'));
    // Independent reads: the bracket count from the offset table API (exterior girder rows), the
    // signed-off spans from the sign-off API.
    const offsets = await api(page, `/api/bridges/${id}/offsets`);
    const brackets = offsets.points.filter((p: { side: string }) => p.side !== 'interior').length;
    const signoffs = await api(page, `/api/bridges/${id}/signoffs`);
    const signed = signoffs.spans.filter((s: { signoff: { out_of_date: boolean } | null }) => s.signoff && !s.signoff.out_of_date).length;
    expect(signed).toBe(1);
    const text = (await row.innerText()).replace(/\s+/g, ' ');
    expect(text).toMatch(new RegExp(`\\d+ of ${brackets} brackets pass`));
    expect(text).toContain(`${signed} of ${signoffs.spans.length} signed off`);
    expect(text).toContain('1 out of tolerance');
    expect(text).not.toContain('No field work yet');
    await page.screenshot({ path: path.join(shots, 'portfolio-desktop.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('narrows the list on the server by search and by the attention filter', async () => {
    const page = await engineerPage();
    await page.goto(`${baseUrl}/bridges`);
    await page.getByLabel('Search', { exact: true }).fill('dm-0522');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.waitForURL(/q=dm-0522/);
    const names = () => page.locator('[data-testid=portfolio-table] tbody tr a').allInnerTexts();
    expect(await names()).toEqual(['Quarry Lane Connector']);

    await page.goto(`${baseUrl}/bridges`);
    await page.getByLabel('Needs attention').selectOption('failures');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.waitForURL(/attention=failures/);
    expect(await names()).toEqual(['Marlow Creek Overpass']);
    await page.close();
  });

  it('fits a 390 px phone: one card per bridge, nothing wider than the screen', async () => {
    const page = await engineerPage({ width: 390, height: 844 });
    await page.goto(`${baseUrl}/bridges`);
    await page.locator('li[data-bridge-id]', { hasText: 'Marlow Creek Overpass' }).waitFor();
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(shots, 'portfolio-phone.png'), fullPage: true });
    await page.close();
  });
});

describe('bridge overview', () => {
  it('serves the plan sketch in the page HTML, says the status in words and groups the actions', async () => {
    const page = await engineerPage();
    await page.goto(`${baseUrl}/bridges`);
    await page.getByRole('link', { name: 'Marlow Creek Overpass' }).first().click();
    await page.waitForURL(/\/bridges\/\d+$/);
    // Server-rendered: the SVG is in the HTML as sent, before any script runs.
    const html = await (await page.request.get(page.url())).text();
    expect(html).toMatch(/<svg[^>]*data-testid="plan-sketch"/);
    expect(await page.locator('[data-testid=plan-sketch] polyline[data-girder]').count()).toBeGreaterThanOrEqual(2);
    const status = await page.getByTestId('bridge-status').innerText();
    expect(status).toMatch(/Forming\./);
    expect(status).toMatch(/1 bracket is out of tolerance/);
    expect(status).toMatch(/1 of \d spans signed off/);
    const actions = page.getByTestId('bridge-actions');
    for (const group of ['Setting out', 'Checking', 'Geometry', '3D view']) expect(await actions.getByRole('heading', { name: group, exact: true }).isVisible()).toBe(true);
    expect(await actions.getByRole('link', { name: 'Edit geometry' }).isVisible()).toBe(true);
    expect(await page.getByTestId('bridge-record').innerText()).toContain('DM-0417');
    await page.screenshot({ path: path.join(shots, 'overview-desktop.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(shots, 'overview-phone.png'), fullPage: true });
    await page.close();
  });
});

describe('new bridge without JSON', () => {
  it('starts from the starter bridge in the form editor, takes the record and lands on the new overview', async () => {
    const page = await engineerPage();
    const errors = trackPageErrors(page);
    await page.goto(`${baseUrl}/bridges/new`);
    expect(await page.getByTestId('paste-json').getAttribute('open')).toBeNull();
    await page.getByRole('button', { name: 'Use the starter bridge' }).click();
    await page.getByLabel(/^Bridge name/).fill('Browser Test Viaduct');
    await page.getByLabel(/^Structure number/).fill('BT-7001');
    await page.getByLabel(/^Stage/).selectOption('forming');
    await page.screenshot({ path: path.join(shots, 'new-bridge-desktop.png'), fullPage: true });
    const create = page.getByRole('button', { name: 'Create bridge' });
    await page.waitForFunction(() => [...document.querySelectorAll('button')].some((b) => b.textContent === 'Create bridge' && !b.disabled));
    await create.click();
    await page.waitForURL(/\/bridges\/\d+$/);
    expect(await page.getByRole('heading', { level: 1 }).innerText()).toBe('Browser Test Viaduct');
    expect(await page.getByTestId('bridge-record').innerText()).toContain('BT-7001');
    const id = /\/bridges\/(\d+)$/.exec(page.url())![1];
    const stored = await api(page, `/api/bridges/${id}`);
    expect(stored).toMatchObject({ name: 'Browser Test Viaduct', structureNumber: 'BT-7001', stage: 'forming', revision: 1 });
    expect(errors).toEqual([]);
    await page.close();
  });
});
