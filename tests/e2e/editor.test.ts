import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable, formatFeet, type BridgeDescription } from '@/lib/geometry';

const baseUrl = inject('baseUrl');
const fixtures = path.resolve(__dirname, '../fixtures/landxml');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

async function engineerPage(): Promise<{ context: BrowserContext; page: Page; errors: Error[] }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  const errors = trackPageErrors(page);
  await signIn(page, baseUrl, 'engineer@example.com');
  return { context, page, errors };
}

/** A fresh copy of the first demo bridge, created through the API, so these tests own their revisions. */
async function newBridge(page: Page, name: string): Promise<number> {
  const res = await page.evaluate(
    async ([n, d]) => {
      const r = await fetch('/api/bridges', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ name: n, description: d }) });
      return { status: r.status, body: await r.json() };
    },
    [name, demoBridges[0]] as const,
  );
  expect(res.status).toBe(201);
  return res.body.id as number;
}

/** Waits until the editor's preview says the description computes (the streamed page lands in #main). */
const ready = (page: Page) => page.locator('#main').getByText('Computes cleanly').waitFor();
const girderRow = (page: Page, name: string) => page.locator('li', { has: page.getByRole('heading', { name: `Girder ${name}`, exact: true }) });
const spanCell = (page: Page, span: number, side: 'left' | 'right', which: 'min-width' | 'max-width') =>
  page.locator(`[data-testid="span-widths"] tr[data-span="${span}"][data-side="${side}"] [data-testid="${which}"]`);

describe('geometry editor in a real browser', () => {
  it('an engineer edits a girder offset, sees the preview change and saves a revision; a second tab on the old revision is told to reload', async () => {
    const a = await engineerPage();
    const id = await newBridge(a.page, `Editor test ${Date.now()}`);
    const b = await engineerPage();
    await b.page.goto(`${baseUrl}/bridges/${id}/edit`);
    await ready(b.page);

    await a.page.goto(`${baseUrl}/bridges/${id}`);
    await a.page.getByRole('link', { name: 'Edit geometry' }).click();
    await a.page.waitForURL(/\/edit$/);
    await ready(a.page);

    // The preview's numbers come from the engine: compare with the engine run here on the same input.
    const before = computeOffsetTable(demoBridges[0]).span_summaries.find((s) => s.span === 1 && s.side === 'left')!;
    expect(await spanCell(a.page, 1, 'left', 'min-width').textContent()).toBe(formatFeet(before.min_edge_width));
    const sketchBefore = await a.page.locator('[data-girder="G1"]').getAttribute('points');

    // G1 at Abutment 1: 18.2 ft LT → 17.5 ft LT (0.7 ft toward the alignment: a wider overhang).
    const field = girderRow(a.page, 'G1').getByLabel('Offset at Abutment 1', { exact: true });
    expect(await field.inputValue()).toBe('18.2');
    await field.fill('17.5');
    const edited: BridgeDescription = JSON.parse(JSON.stringify(demoBridges[0]));
    edited.girders[0].offsets[0] = -17.5;
    const after = computeOffsetTable(edited).span_summaries.find((s) => s.span === 1 && s.side === 'left')!;
    expect(formatFeet(after.max_edge_width)).not.toBe(formatFeet(before.max_edge_width));
    await expect.poll(() => spanCell(a.page, 1, 'left', 'max-width').textContent()).toBe(formatFeet(after.max_edge_width));
    expect(await a.page.locator('[data-girder="G1"]').getAttribute('points')).not.toBe(sketchBefore);

    await a.page.getByLabel(/Note for the history/).fill('G1 moved 0.7 ft inboard at Abutment 1');
    await a.page.getByRole('button', { name: 'Save revision' }).click();
    await shown(a.page, 'save-result').waitFor();
    expect(await shown(a.page, 'save-result').textContent()).toMatch(/Saved as revision 2/);
    const stored = await a.page.evaluate(async (bridgeId) => (await fetch(`/api/bridges/${bridgeId}`)).json(), id);
    expect(stored.revision).toBe(2);
    expect(stored.description.girders[0].offsets[0]).toBe(-17.5);

    // The second tab still edits revision 1.
    await girderRow(b.page, 'G2').getByLabel('Offset at Pier 2', { exact: true }).fill('9');
    // A revision needs a note: the button waits for one.
    expect(await b.page.getByRole('button', { name: 'Save revision' }).isDisabled()).toBe(true);
    await b.page.getByLabel(/Note for the history/).fill('G2 moved at Pier 2');
    await b.page.getByRole('button', { name: 'Save revision' }).click();
    const stale = shown(b.page, 'stale-revision');
    await stale.waitFor();
    expect(await stale.textContent()).toMatch(/newer revision/);
    await b.page.getByRole('button', { name: 'Reload the latest revision' }).click();
    await b.page.locator('#main p', { hasText: /opened at revision\s*2/ }).waitFor();
    expect(await girderRow(b.page, 'G1').getByLabel('Offset at Abutment 1', { exact: true }).inputValue()).toBe('17.5');

    // The history shows the change field by field and the edge widths that moved.
    await a.page.getByRole('link', { name: 'See what changed' }).click();
    await a.page.waitForURL(/history\?from=1&to=2/);
    const fields = shown(a.page, 'field-changes');
    await fields.waitFor();
    expect(await fields.textContent()).toMatch(/Girder G1 · offset at Abutment 1.*18\.20 ft LT.*17\.50 ft LT/);
    expect(await shown(a.page, 'point-width-changes').locator('tbody tr').count()).toBeGreaterThan(0);

    expect(a.errors).toEqual([]);
    expect(b.errors).toEqual([]);
    await a.context.close();
    await b.context.close();
  });

  it('accepts stations as 12+34.56, marks a bad value at its field and keeps Save off until it is fixed', async () => {
    const { context, page, errors } = await engineerPage();
    const id = await newBridge(page, `Editor stations ${Date.now()}`);
    await page.goto(`${baseUrl}/bridges/${id}/edit`);
    const pier = page.locator('li', { has: page.getByRole('heading', { name: 'Pier 2', exact: true }) });
    const station = pier.getByLabel('Station', { exact: true });
    expect(await station.inputValue()).toBe('12+90.00');
    await station.fill('12+9O');
    await pier.getByText(/is not a station/).waitFor();
    // The preview names the problem and takes the user to it.
    expect(await shown(page, 'problem-list').textContent()).toMatch(/Pier 2 · station: .*is not a station/);
    await page.getByRole('button', { name: 'Go to the first problem' }).click();
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-invalid'))).toBe('true');
    expect(await station.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(await page.getByRole('button', { name: 'Save revision' }).isDisabled()).toBe(true);
    // Past the last bent: the engine's own check names the bent.
    await station.fill('15+00');
    const pier3 = page.locator('li', { has: page.getByRole('heading', { name: 'Pier 3', exact: true }) });
    await pier3.getByText(/Pier 3 at 13\+90\.00 must be up-station of Pier 2 at 15\+00\.00/).waitFor();
    expect(await page.getByRole('button', { name: 'Save revision' }).isDisabled()).toBe(true);
    await station.fill('1291.5');
    await ready(page);
    await page.getByLabel(/Note for the history/).fill('Pier 2 station');
    expect(await page.getByRole('button', { name: 'Save revision' }).isDisabled()).toBe(false);
    // Rows can be added and removed: a new bent adds an offset to every girder.
    await page.getByRole('button', { name: '+ Add bent' }).click();
    expect(
      await girderRow(page, 'G3')
        .getByRole('textbox', { name: /^Offset at / })
        .count(),
    ).toBe(5);
    await page.getByRole('button', { name: 'Remove Bent 5' }).click();
    expect(
      await girderRow(page, 'G3')
        .getByRole('textbox', { name: /^Offset at / })
        .count(),
    ).toBe(4);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('imports a LandXML alignment and profile into the editor, refusing a file in the wrong unit', async () => {
    const { context, page, errors } = await engineerPage();
    const id = await newBridge(page, `Editor import ${Date.now()}`);
    await page.goto(`${baseUrl}/bridges/${id}/edit`);
    await page.getByRole('button', { name: 'Import from LandXML' }).click();
    const file = page.getByLabel(/LandXML file/);
    await file.setInputFiles(path.join(fixtures, 'two-ramps-m.xml'));
    await page.getByRole('button', { name: 'Read file' }).click();
    await shown(page, 'landxml-error').waitFor();
    expect(await shown(page, 'landxml-error').textContent()).toMatch(/metres .* this bridge is in feet/);

    // A file with two alignments: the user picks one and the preview follows the choice.
    const single = fs.readFileSync(path.join(fixtures, 'creek-road-ft.xml'), 'utf8');
    const second = single
      .slice(single.indexOf('<Alignment name='), single.indexOf('</Alignments>'))
      .replace('name="Willowmere Creek Road CL"', 'name="Creek Road east"')
      .replace('staStart="1000.0000000000"', 'staStart="500.0"');
    const two = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-landxml-')), 'two-alignments-ft.xml');
    fs.writeFileSync(two, single.replace('</Alignments>', `${second}</Alignments>`));
    await file.setInputFiles(two);
    await page.getByRole('button', { name: 'Read file' }).click();
    const preview = shown(page, 'landxml-preview');
    await preview.waitFor();
    expect(await page.getByRole('radio').count()).toBe(2);
    await page.getByRole('radio', { name: 'Creek Road east' }).check();
    await expect.poll(async () => (await preview.textContent()) ?? '').toMatch(/Starts at station 5\+00\.00/);
    await page.getByRole('radio', { name: 'Willowmere Creek Road CL' }).check();
    await expect.poll(async () => (await preview.textContent()) ?? '').toMatch(/Starts at station 10\+00\.00/);
    const text = (await preview.textContent()) ?? '';
    // What the fixture says: arcs of radius 800 (cw) and 1200 (ccw), four PVIs, 10+00 to 19+00.
    expect(text).toMatch(/800\.00/);
    expect(text).toMatch(/1200\.00/);
    expect(text).toMatch(/Right \(cw\)/);
    expect(text).toMatch(/Left \(ccw\)/);
    expect(text).toMatch(/19\+00\.00/);
    expect(await preview.locator('table').nth(1).locator('tbody tr').count()).toBe(4);
    await page.getByRole('button', { name: 'Use this alignment and profile' }).click();

    const alignment = page.locator('#alignment');
    expect(await alignment.getByRole('heading', { name: /^Element \d/ }).count()).toBe(4);
    expect(await alignment.locator('li').nth(1).getByLabel('Radius').inputValue()).toBe('800');
    expect(await alignment.getByLabel('Start easting (x)').inputValue()).toBe('20000');
    await ready(page);
    await page.getByLabel(/Note for the history/).fill('Alignment and profile from the road design (LandXML)');
    await page.getByRole('button', { name: 'Save revision' }).click();
    await shown(page, 'save-result').waitFor();
    const stored = await page.evaluate(async (bridgeId) => (await fetch(`/api/bridges/${bridgeId}`)).json(), id);
    expect(stored.description.alignment.elements).toHaveLength(4);
    expect(stored.description.alignment.elements[1]).toMatchObject({ type: 'arc', radius: 800, direction: 'right' });
    expect(stored.description.profile.pvis[2]).toMatchObject({ station: 1650, elevation: 251.5, curve_length: 200 });
    expect(errors).toEqual([]);
    await context.close();
  });

  it('offers editing to engineers only; everyone signed in can read the history', async () => {
    const { context: ec, page: ep } = await engineerPage();
    const id = await newBridge(ep, `Editor roles ${Date.now()}`);
    await ec.close();
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, baseUrl, 'crew@example.com');
    await page.goto(`${baseUrl}/bridges/${id}`);
    await page.locator('#main').getByRole('link', { name: 'History' }).waitFor();
    expect(await page.locator('#main').getByRole('link', { name: 'Edit geometry' }).count()).toBe(0);
    await page.goto(`${baseUrl}/bridges/${id}/edit`);
    await page.locator('#main').getByRole('heading', { name: 'Editing needs an engineer' }).waitFor();
    expect(await page.locator('#main').getByRole('button', { name: 'Save revision' }).count()).toBe(0);
    await page.goto(`${baseUrl}/bridges/${id}/history`);
    await page
      .locator('#main')
      .getByText(/one revision so far/)
      .waitFor();
    await context.close();
  });

  it('looks finished at desktop and phone widths', async () => {
    const { context, page } = await engineerPage();
    const id = await newBridge(page, `Editor look ${Date.now()}`);
    for (const width of [1280, 390]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${baseUrl}/bridges/${id}/edit`);
      await ready(page);
      // Nothing spills sideways off the page.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(1);
      await page.screenshot({ path: path.join(process.env.EDITOR_SHOTS_DIR ?? '/tmp', `chordline-editor-${width}.png`), fullPage: true });
    }
    await context.close();
  });
});
