import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { demoBridges } from '@/lib/demo/bridges';
import { formatFeet, formatFeetInches, formatMetres } from '@/lib/geometry';
import { launchChromium, signIn, trackPageErrors } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
// Screenshots for a person to look at; kept outside the repository.
const shots = process.env.CHORDLINE_SHOTS_DIR || fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-tables-shots-'));

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

type Point = { span: number; side: string; girder: string; point: number; station: number; bottom_of_slab: number; edge_width: number | null; buildup: number | null };

/** Opens the demo precast bridge's offset table and returns its id and the API's table. */
async function openTable(page: Page): Promise<{ id: string; points: Point[] }> {
  await page.goto(`${baseUrl}/bridges`);
  await page.getByRole('link', { name: 'Marlow Creek Overpass' }).first().click();
  await page.waitForURL(/\/bridges\/\d+$/);
  const id = /\/bridges\/(\d+)$/.exec(page.url())![1];
  await page.goto(`${baseUrl}/bridges/${id}/offsets`);
  await page.getByRole('table', { name: /span 1, left overhang/i }).waitFor();
  const table = await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${id}/offsets`);
  return { id, points: table.points };
}

/** The text of one column of a girder point table, row by row. */
async function column(page: Page, tableName: RegExp, header: RegExp): Promise<string[]> {
  const table = page.getByRole('table', { name: tableName });
  const headers = await table.locator('thead th').allTextContents();
  const index = headers.findIndex((h) => header.test(h));
  expect(index, `column ${header} in ${headers.join(' | ')}`).toBeGreaterThanOrEqual(0);
  return table.locator('tbody tr').evaluateAll((rows, i) => rows.map((r) => (r.children[i] as HTMLElement).innerText.trim()), index);
}

describe('offset tables in a real browser', () => {
  it('toggles decimal feet and feet-inches, sorts by a column and filters by span, side and point', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'crew@example.com');
    const { points } = await openTable(page);
    const left1 = points.filter((p) => p.span === 1 && p.side === 'left').sort((a, b) => a.point - b.point);
    const name = /span 1, left overhang/i;

    // Decimal feet: 0.01 ft (format helpers of the engine, the same rounding as the CSV export).
    await page.getByRole('radio', { name: /decimal feet/i }).click();
    expect(await column(page, name, /edge width/i)).toEqual(left1.map((p) => formatFeet(p.edge_width!)));
    // Feet-inches to the nearest 1/8 inch.
    await page.getByRole('radio', { name: /feet-inches/i }).click();
    const widths = await column(page, name, /edge width \(ft-in\)/i);
    expect(widths).toEqual(left1.map((p) => formatFeetInches(p.edge_width!)));
    expect(widths[0]).toMatch(/^\d+'-\d+( \d\/\d)?"$/);

    // Sorting: a click on "Edge width" orders the rows by edge width, a second click reverses them.
    const header = page.getByRole('table', { name }).getByRole('button', { name: /edge width/i });
    await header.click();
    const ascending = [...left1].sort((a, b) => a.edge_width! - b.edge_width! || a.point - b.point).map((p) => String(p.point));
    expect((await column(page, name, /point/i)).map((t) => t.replace(/\D+/g, ''))).toEqual(ascending);
    await header.click();
    const firstPoint = (await column(page, name, /point/i))[0].replace(/\D+/g, '');
    const widest = [...left1].sort((a, b) => b.edge_width! - a.edge_width! || a.point - b.point)[0];
    expect(firstPoint).toBe(String(widest.point));
    expect(await page.getByRole('table', { name }).locator('th[aria-sort="descending"]').count()).toBe(1);

    // Filters: span 2, right side, point 10 leaves one row of one table.
    await page.getByLabel('Span', { exact: true }).selectOption('2');
    await page.getByLabel('Side', { exact: true }).selectOption('right');
    await page.getByLabel(/station or point/i).fill('10');
    await expect.poll(() => page.getByRole('table', { name: /overhang/i }).count()).toBe(1);
    const only = page.getByRole('table', { name: /span 2, right overhang/i });
    expect(await only.locator('tbody tr').count()).toBe(1);
    expect(await page.getByText(/showing 1 of \d+ girder points/i).count()).toBe(1);

    // A station typed with its "+" finds the points within 5 ft of it, on every girder and span.
    await page.getByLabel('Span', { exact: true }).selectOption('all');
    await page.getByLabel('Side', { exact: true }).selectOption('both');
    const probe = points.filter((p) => p.side !== 'interior')[7];
    const typed = Math.round(probe.station);
    const near = points.filter((p) => p.side !== 'interior' && Math.abs(p.station - typed) <= 5).length;
    expect(near).toBeGreaterThan(0);
    const text = `${Math.floor(typed / 100)}+${String(typed % 100).padStart(2, '0')}`;
    await page.getByLabel(/station or point/i).fill(text);
    await expect.poll(() => page.getByText(new RegExp(`showing ${near} of \\d+ girder points within 5 ft of ${text.replace('+', '\\+')}`, 'i')).count()).toBe(1);

    // The designer's elevations: bottom of slab over every girder, interior ones too, per span.
    await page.getByLabel(/station or point/i).fill('');
    await page.getByText('Bottom of slab over every girder, span 1').click();
    const slab = page.getByRole('table', { name: /span 1: bottom-of-slab elevation/i });
    const g3 = points.find((p) => p.span === 1 && p.girder === 'G3' && p.point === 4)!;
    expect(g3.side).toBe('interior');
    const slabHeader = await slab.locator('thead th').allTextContents();
    const slabRow = slab.locator('tbody tr').nth(4);
    expect(await slabRow.locator('th').textContent()).toBe('4');
    expect(
      await slabRow
        .locator('td')
        .nth(slabHeader.indexOf('G3') - 1)
        .textContent(),
    ).toBe(formatFeet(g3.bottom_of_slab));
    expect(errors).toEqual([]);
    await page.close();
  });

  it('the Download CSV button follows the chosen display style', async () => {
    const context = await browser.newContext({ acceptDownloads: true, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, baseUrl, 'inspector@example.com');
    const { id } = await openTable(page);
    for (const [radio, style, column] of [
      [/feet-inches/i, 'feet-inches', 'edge_width_ft_in'],
      [/decimal feet/i, 'decimal-feet', 'edge_width_ft'],
    ] as const) {
      await page.getByRole('radio', { name: radio }).click();
      const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /download csv/i }).click()]);
      const file = await download.path();
      const text = fs.readFileSync(file!, 'utf8');
      expect(text.split('\n')[0].split(',')).toContain(column);
      const direct = await page.evaluate(async (u) => (await fetch(u)).text(), `/api/bridges/${id}/offsets.csv?style=${style}`);
      expect(text).toBe(direct);
    }
    await context.close();
  });

  it('a metric bridge always shows metres and downloads the metric CSV', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'engineer@example.com');
    // The demo deck's numbers read as metres: an invented metric bridge of the same shape.
    const description = { ...demoBridges[0], units: 'm', deck: { ...demoBridges[0].deck, form_settlement: 0.005 }, top_of_girder: [] };
    const created = await page.evaluate(async (body) => (await fetch('/api/bridges', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) })).json(), {
      name: `Metric browser bridge ${Date.now()}`,
      description,
    });
    await page.goto(`${baseUrl}/bridges/${created.id}/offsets`);
    const name = /span 1, left overhang/i;
    await page.getByRole('table', { name }).waitFor();
    expect(await page.getByRole('radio').count()).toBe(0);
    expect(await page.getByText(/this bridge is metric/i).count()).toBe(1);
    const table = await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${created.id}/offsets`);
    const left1 = (table.points as Point[]).filter((p) => p.span === 1 && p.side === 'left').sort((a, b) => a.point - b.point);
    expect(await column(page, name, /edge width \(m\)/i)).toEqual(left1.map((p) => formatMetres(p.edge_width!)));
    expect(await page.getByRole('link', { name: /download csv/i }).getAttribute('href')).toBe(`/api/bridges/${created.id}/offsets.csv?style=metric`);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('imports a top-of-girder survey: bad rows are reported and stored nowhere, a good file changes the buildup', async () => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'inspector@example.com');
    const { id, points } = await openTable(page);
    const before = points.find((p) => p.girder === 'G1' && p.span === 3 && p.point === 6)!;
    expect(before.buildup).toBeNull();
    await page.goto(`${baseUrl}/bridges/${id}/survey`);
    const input = page.getByLabel(/survey csv file/i);
    await expect.poll(() => input.isEnabled()).toBe(true);
    await input.setInputFiles({ name: 'bad.csv', mimeType: 'text/csv', buffer: Buffer.from('girder,span,point,elevation\nG1,3,6,254.10\nG9,3,6,254.10\n') });
    await page.getByText(/1 with problems/i).waitFor();
    await page.getByText(/unknown girder "G9"/i).waitFor();
    expect(await page.getByRole('button', { name: /store/i }).isDisabled()).toBe(true);
    await page.screenshot({ path: path.join(shots, 'survey-report-1280.png'), fullPage: true });
    const unchanged = await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${id}/survey`);
    expect(unchanged.values).toEqual([]);

    await input.setInputFiles({ name: 'good.csv', mimeType: 'text/csv', buffer: Buffer.from('girder,span,point,elevation\nG1,3,6,254.10\n') });
    await page.getByText(/0 with problems/i).waitFor();
    await page.getByRole('button', { name: /store 1 surveyed point/i }).click();
    await page.getByText(/stored 1 surveyed point/i).waitFor();
    await page.getByRole('table', { name: /stored top-of-girder/i }).waitFor();
    const after = await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${id}/offsets`);
    const p = (after.points as (Point & { bottom_of_slab: number; top_of_girder: number })[]).find((x) => x.girder === 'G1' && x.span === 3 && x.point === 6)!;
    expect(p.top_of_girder).toBeCloseTo(254.1, 9);
    // bridge-format.md: buildup = bottom of slab − top of girder.
    expect(p.buildup).toBeCloseTo(p.bottom_of_slab - 254.1, 9);
    await page.goto(`${baseUrl}/bridges/${id}/offsets`);
    await page.getByRole('radio', { name: /decimal feet/i }).click();
    const buildups = await column(page, /span 3, left overhang/i, /buildup/i);
    expect(buildups[6]).toBe(formatFeet(p.buildup!));
    expect(errors).toEqual([]);
    await page.close();
  });

  it('looks finished at desktop and phone widths and on paper', async () => {
    const desktop = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(desktop, baseUrl, 'engineer@example.com');
    const { id } = await openTable(desktop);
    await desktop.getByRole('radio', { name: /decimal feet/i }).click();
    await desktop.getByRole('img', { name: /edge width along the bridge/i }).waitFor();
    await desktop.screenshot({ path: path.join(shots, 'offsets-1280.png'), fullPage: true });
    await desktop.emulateMedia({ media: 'print' });
    await desktop.screenshot({ path: path.join(shots, 'offsets-print.png'), fullPage: true });
    await desktop.pdf({ path: path.join(shots, 'offsets.pdf'), format: 'Letter', landscape: true, printBackground: true });
    // On paper: the caution, the bridge name and revision are there; the controls are not.
    expect(await desktop.getByText(/caution: geometry only/i).isVisible()).toBe(true);
    expect(
      await desktop
        .getByText(/revision \d+/i)
        .first()
        .isVisible(),
    ).toBe(true);
    expect(await desktop.getByRole('region', { name: /table controls/i }).isVisible()).toBe(false);
    await desktop.close();

    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, deviceScaleFactor: 2 });
    const phone = await context.newPage();
    await signIn(phone, baseUrl, 'crew@example.com');
    await phone.goto(`${baseUrl}/bridges/${id}/offsets`);
    await phone.getByRole('table', { name: /span 1, left overhang/i }).waitFor();
    await phone.getByRole('img', { name: /edge width along the bridge/i }).waitFor();
    // The page itself never scrolls sideways; wide tables scroll inside their card with the point column pinned.
    expect(await phone.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    // Tap targets of at least 44 CSS px (WCAG 2.2, 2.5.5 target size, enhanced).
    const heights = await phone.locator('thead button, [role=radio], select, input[type=search]').evaluateAll((els) => els.map((e) => e.getBoundingClientRect().height));
    expect(Math.min(...heights)).toBeGreaterThanOrEqual(44);
    await phone.screenshot({ path: path.join(shots, 'offsets-390.png'), fullPage: true });
    await phone.getByRole('table', { name: /span 1, left overhang/i }).scrollIntoViewIfNeeded();
    await phone.screenshot({ path: path.join(shots, 'offsets-390-table.png') });
    await context.close();
  });
});
