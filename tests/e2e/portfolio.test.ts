/**
 * Portfolio page and bridge overview in a real browser, against the served app with the demo data.
 * The browser test files share one server and one data folder and run one after another, so other
 * files may have recorded checks, imported surveys and created bridges before these tests run. These
 * tests therefore never assume a count: what a demo bridge's row and overview must say is worked out
 * at that moment from other routes (the sign-off API's per-span list of what is missing, which the
 * sign-off rule computes live from the checks), and the search and filter test creates the bridges
 * and the failing check it filters for.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { demoBridges } from '@/lib/demo/bridges';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
// Screenshots for a person to look at; kept outside the repository.
const shots = process.env.CHORDLINE_SHOTS_DIR || fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-portfolio-shots-'));
const DEMO = 'Marlow Creek Overpass';

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

async function signedInPage(email: string, viewport = { width: 1366, height: 900 }): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signIn(page, baseUrl, email);
  return page;
}

const api = (page: Page, url: string) => page.evaluate(async (u) => (await fetch(u)).json(), url);

async function send(page: Page, method: string, url: string, body: unknown): Promise<{ status: number; body: Record<string, unknown> }> {
  return page.evaluate(
    async ([m, u, b]) => {
      const r = await fetch(u, { method: m, headers: { 'content-type': 'application/json' }, body: JSON.stringify(b) });
      return { status: r.status, body: await r.json() };
    },
    [method, url, body] as const,
  );
}

type SpanStatus = { span: number; brackets: number; missing: { girder: string; point: number; reason: string }[]; signoff: { out_of_date: boolean } | null };

/**
 * A bridge's status as the sign-off API says it is right now (every span's brackets and what still
 * stands between each and its sign-off): brackets passing of all, brackets whose latest check is out
 * of tolerance, spans signed off at the current revision.
 */
async function liveStatus(page: Page, id: number) {
  const { spans } = (await api(page, `/api/bridges/${id}/signoffs`)) as { spans: SpanStatus[] };
  let total = 0;
  let passing = 0;
  let failures = 0;
  for (const s of spans) {
    total += s.brackets;
    passing += s.brackets - new Set(s.missing.map((m) => `${m.girder}|${m.point}`)).size;
    failures += new Set(s.missing.filter((m) => m.reason.includes('out of tolerance')).map((m) => `${m.girder}|${m.point}`)).size;
  }
  const signed = spans.filter((s) => s.signoff && !s.signoff.out_of_date).length;
  return { total, passing, failures, signed, spans: spans.length };
}

/** The id of the demo bridge named exactly `name`, from the portfolio API's search. */
async function bridgeIdByName(page: Page, name: string): Promise<number> {
  const rows = (await api(page, `/api/bridges?q=${encodeURIComponent(name)}`)) as { id: number; name: string }[];
  const found = rows.filter((r) => r.name === name);
  expect(found).toHaveLength(1);
  return found[0].id;
}

const tableNames = (page: Page) => page.locator('[data-testid=portfolio-table] tbody tr a').allInnerTexts();

describe('portfolio page', () => {
  it('shows the demo field history: check progress, a signed-off span and the open failure, as the sign-off rule counts them now', async () => {
    const page = await signedInPage('engineer@example.com');
    const errors = trackPageErrors(page);
    const id = await bridgeIdByName(page, DEMO);
    // Searched by name so the demo bridge is on the first page however many bridges other tests made.
    await page.goto(`${baseUrl}/bridges?q=${encodeURIComponent(DEMO)}`);
    const row = page.locator(`[data-testid=portfolio-table] tr[data-bridge-id="${id}"]`);
    await row.waitFor();
    const live = await liveStatus(page, id);
    // The demo history (migrations/demo-history.ts): span 1 checked and signed off, one bracket of span 2
    // out of tolerance. Other browser tests only add checks elsewhere and never save a new revision of
    // this bridge, so these hold on a fresh demo and after them.
    expect(live.signed).toBeGreaterThanOrEqual(1);
    expect(live.passing).toBeGreaterThan(0);
    expect(live.passing).toBeLessThan(live.total);
    expect(live.failures).toBeGreaterThanOrEqual(1);
    const text = (await row.innerText()).replace(/\s+/g, ' ');
    expect(text).toContain(`${live.passing} of ${live.total} brackets pass`);
    expect(text).toContain(`${live.signed} of ${live.spans} signed off`);
    expect(text).toContain(`${live.failures} out of tolerance`);
    expect(text).not.toContain('No field work yet');
    // The whole first page, for a person to look at.
    await page.goto(`${baseUrl}/bridges`);
    await page.locator('[data-testid=portfolio-table] tr[data-bridge-id]').first().waitFor();
    await page.screenshot({ path: path.join(shots, 'portfolio-desktop.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  }, 240_000);

  it('narrows the list on the server by search, district, stage and the attention filter', async () => {
    // Admin: may create bridges and record checks. The bridges carry a token no other bridge holds.
    const page = await signedInPage('admin@example.com');
    const errors = trackPageErrors(page);
    const token = `pf${Date.now().toString(36)}`;
    const district = `District ${token}`;
    const made: Record<string, { id: number; name: string }> = {};
    for (const [key, record] of Object.entries({
      alder: { structureNumber: `${token.toUpperCase()}-1`, district, stage: 'design' },
      birch: { structureNumber: `${token.toUpperCase()}-2`, district, stage: 'forming' },
      cedar: { structureNumber: `${token.toUpperCase()}-3`, district: `Elsewhere ${token}`, stage: 'forming' },
    })) {
      const name = `Portfolio ${token} ${key}`;
      const res = await send(page, 'POST', '/api/bridges', { name, description: demoBridges[0], ...record });
      expect(res.status).toBe(201);
      made[key] = { id: res.body.id as number, name };
    }
    // One out-of-tolerance check on birch: the first exterior bracket measured 0.5 ft too wide.
    const offsets = await api(page, `/api/bridges/${made.birch.id}/offsets`);
    const p = (offsets.points as { span: number; girder: string; point: number; side: string; edge_width: number | null }[]).find((x) => x.side !== 'interior' && x.edge_width !== null)!;
    const check = await send(page, 'POST', `/api/bridges/${made.birch.id}/checks`, { span: p.span, girder: p.girder, point: p.point, measured_edge_width: p.edge_width! + 0.5 });
    expect(check.status).toBe(201);
    expect(check.body.pass).toBe(false);

    const all = [made.alder.name, made.birch.name, made.cedar.name];
    const choose = async (fields: { q?: string; stage?: string; district?: string; attention?: string }, url: RegExp) => {
      await page.goto(`${baseUrl}/bridges`);
      await page.getByLabel('Search', { exact: true }).fill(fields.q ?? '');
      if (fields.stage) await page.getByLabel('Stage', { exact: true }).selectOption(fields.stage);
      if (fields.district) await page.getByLabel('District', { exact: true }).selectOption(fields.district);
      if (fields.attention) await page.getByLabel('Attention', { exact: true }).selectOption(fields.attention);
      await page.getByRole('button', { name: 'Show' }).click();
      await page.waitForURL(url);
    };
    // The address changes at once and the new list streams in after it (for a moment the old and new
    // tables can both be in the page), so the names are polled until the page shows one list.
    const shown = async () => (await tableNames(page)).sort();
    // Search: the token finds the three; a structure number typed in lower case finds its bridge alone.
    await choose({ q: token }, new RegExp(`q=${token}`));
    await expect.poll(shown).toEqual(all);
    await choose({ q: `${token}-2` }, new RegExp(`q=${token}-2`));
    await expect.poll(shown).toEqual([made.birch.name]);
    // Filters, each with the search: district, stage, and bridges with an out-of-tolerance check.
    await choose({ q: token, district }, /district=District/);
    await expect.poll(shown).toEqual([made.alder.name, made.birch.name]);
    await choose({ q: token, stage: 'forming' }, /stage=forming/);
    await expect.poll(shown).toEqual([made.birch.name, made.cedar.name]);
    await choose({ q: token, attention: 'failures' }, /attention=failures/);
    await expect.poll(shown).toEqual([made.birch.name]);
    // The form shows the filters it was sent with.
    expect(await page.getByLabel('Attention', { exact: true }).inputValue()).toBe('failures');

    // The narrowing is the server's: the HTML as sent holds only the matching bridge, and so does the API.
    const html = await (await page.request.get(`${baseUrl}/bridges?q=${token}&attention=failures`)).text();
    expect(html).toContain(made.birch.name);
    expect(html).not.toContain(made.alder.name);
    expect(html).not.toContain(made.cedar.name);
    const rows = (await api(page, `/api/bridges?q=${token}&attention=failures`)) as { name: string }[];
    expect(rows.map((r) => r.name)).toEqual([made.birch.name]);
    // The demo's failing bracket puts the demo bridge in the attention list too.
    await page.goto(`${baseUrl}/bridges?attention=failures`);
    await expect.poll(() => tableNames(page)).toContain(DEMO);
    expect(errors).toEqual([]);
    await page.close();
  }, 240_000);

  it('fits a 390 px phone: one card per bridge, nothing wider than the screen', async () => {
    const page = await signedInPage('engineer@example.com', { width: 390, height: 844 });
    await page.goto(`${baseUrl}/bridges`);
    await page.locator('li[data-bridge-id]').first().waitFor();
    expect(await page.locator('[data-testid=portfolio-table]').isVisible()).toBe(false);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(shots, 'portfolio-phone.png'), fullPage: true });
    await page.close();
  });
});

describe('bridge overview', () => {
  it('serves the plan sketch in the page HTML, says the status in words and groups the actions', async () => {
    const page = await signedInPage('engineer@example.com');
    const errors = trackPageErrors(page);
    const id = await bridgeIdByName(page, DEMO);
    await page.goto(`${baseUrl}/bridges?q=${encodeURIComponent(DEMO)}`);
    await page.locator(`[data-testid=portfolio-table] tr[data-bridge-id="${id}"]`).getByRole('link', { name: DEMO, exact: true }).click();
    await page.waitForURL(new RegExp(`/bridges/${id}$`));
    // The link navigates in the page: the URL changes at once and the overview streams in after the
    // loading panel, so wait for its parts before counting anything in them.
    const actions = shown(page, 'bridge-actions');
    await actions.waitFor();
    await shown(page, 'plan-sketch').waitFor();
    // Server-rendered: the SVG is in the HTML as sent, before any script runs.
    const html = await (await page.request.get(page.url())).text();
    expect(html).toMatch(/<svg[^>]*data-testid="plan-sketch"/);
    expect(await page.locator('[data-testid=plan-sketch] polyline[data-girder]').count()).toBeGreaterThanOrEqual(2);

    const live = await liveStatus(page, id);
    const bridge = await api(page, `/api/bridges/${id}`);
    const status = (await shown(page, 'bridge-status').innerText()).replace(/\s+/g, ' ');
    expect(status).toContain(`${bridge.stage[0].toUpperCase()}${bridge.stage.slice(1)}.`);
    expect(status).toContain(`${live.passing} of ${live.total} brackets pass their latest checks`);
    expect(live.failures).toBeGreaterThanOrEqual(1);
    expect(status).toContain(`${live.failures} ${live.failures === 1 ? 'bracket is' : 'brackets are'} out of tolerance`);
    expect(status).toContain(`${live.signed} of ${live.spans} spans signed off`);

    const groups = await actions.getByRole('heading').allInnerTexts();
    // The headings are styled upper case; their text is the group's name.
    expect(groups.map((g) => g.toLowerCase())).toEqual(['setting out', 'checking', 'geometry', '3d view']);
    const group = (title: string) => actions.locator('section', { has: page.getByRole('heading', { name: title, exact: true }) });
    expect(await group('Setting out').getByRole('link', { name: 'Field mode', exact: true }).count()).toBe(1);
    expect(await group('Checking').getByRole('link', { name: 'Checks and sign-off', exact: true }).count()).toBe(1);
    expect(await group('Geometry').getByRole('link', { name: 'Edit geometry', exact: true }).isVisible()).toBe(true);
    expect(await group('3D view').getByRole('link', { name: '3D view', exact: true }).count()).toBe(1);
    expect(await shown(page, 'bridge-record').innerText()).toContain('DM-0417');
    await page.screenshot({ path: path.join(shots, 'overview-desktop.png'), fullPage: true });
    await page.setViewportSize({ width: 390, height: 844 });
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(shots, 'overview-phone.png'), fullPage: true });
    expect(errors).toEqual([]);
    await page.close();
  });

  it('offers a crew member no way to edit the geometry', async () => {
    const page = await signedInPage('crew@example.com');
    const id = await bridgeIdByName(page, DEMO);
    await page.goto(`${baseUrl}/bridges/${id}`);
    const actions = shown(page, 'bridge-actions');
    await actions.waitFor();
    expect(await actions.getByRole('link', { name: 'Checks and sign-off', exact: true }).count()).toBe(1);
    expect(await actions.getByRole('link', { name: 'Edit geometry', exact: true }).count()).toBe(0);
    expect(await actions.getByRole('link', { name: 'Survey import', exact: true }).count()).toBe(0);
    await page.close();
  });
});

describe('new bridge without JSON', () => {
  it('starts from the starter bridge in the form editor, takes the record and lands on the new overview', async () => {
    const page = await signedInPage('engineer@example.com');
    const errors = trackPageErrors(page);
    const name = `Browser Test Viaduct ${Date.now().toString(36)}`;
    await page.goto(`${baseUrl}/bridges/new`);
    expect(await shown(page, 'paste-json').getAttribute('open')).toBeNull();
    await page.getByRole('button', { name: 'Use the starter bridge' }).click();
    await page.getByLabel(/^Bridge name/).fill(name);
    await page.getByLabel(/^Structure number/).fill('BT-7001');
    await page.getByLabel(/^Stage/).selectOption('forming');
    await page.screenshot({ path: path.join(shots, 'new-bridge-desktop.png'), fullPage: true });
    await page.waitForFunction(() => [...document.querySelectorAll('button')].some((b) => b.textContent === 'Create bridge' && !b.disabled), undefined, { timeout: 60000 });
    await page.getByRole('button', { name: 'Create bridge' }).click();
    await page.waitForURL(/\/bridges\/\d+$/);
    // The overview streams in after the loading panel: wait for its heading, then read the record.
    await page.getByRole('heading', { level: 1, name, exact: true }).waitFor();
    expect(await shown(page, 'bridge-record').innerText()).toContain('BT-7001');
    const id = /\/bridges\/(\d+)$/.exec(page.url())![1];
    const stored = await api(page, `/api/bridges/${id}`);
    expect(stored).toMatchObject({ name, structureNumber: 'BT-7001', stage: 'forming', revision: 1 });
    expect(errors).toEqual([]);
    await page.close();
  });
});
