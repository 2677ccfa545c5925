import { Jimp } from 'jimp';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, BrowserContext } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';
import { PHONE, SOON, Check, Photo, bridgeId, openControlledFieldMode, keepOnPhone, waitingItems, recordHere, pickLastSpan, apiGet } from './offline-helpers';

const baseUrl = inject('baseUrl');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

describe('installable app', () => {
  it('serves the manifest with name, start URL, colours and 192/512 px icons including a maskable one', async () => {
    const res = await fetch(`${baseUrl}/manifest.webmanifest`);
    expect(res.status).toBe(200);
    const m = (await res.json()) as {
      name: string;
      short_name: string;
      start_url: string;
      display: string;
      theme_color: string;
      background_color: string;
      icons: { src: string; sizes: string; purpose?: string }[];
    };
    expect(m.name).toMatch(/Chordline/);
    expect(m.short_name).toBe('Chordline');
    expect(m.start_url).toBe('/bridges');
    expect(m.display).toBe('standalone');
    // tailwind.config.ts tokens brand-800 and concrete-50.
    expect(m.theme_color.toLowerCase()).toBe('#0e4039');
    expect(m.background_color.toLowerCase()).toBe('#f7f6f3');
    for (const size of [192, 512]) {
      for (const purpose of ['any', 'maskable']) {
        const icon = m.icons.find((i) => i.sizes === `${size}x${size}` && (i.purpose ?? 'any').split(' ').includes(purpose));
        expect(icon, `${size} ${purpose}`).toBeDefined();
        const png = await fetch(new URL(icon!.src, baseUrl));
        expect(png.headers.get('content-type')).toBe('image/png');
        const image = await Jimp.read(Buffer.from(await png.arrayBuffer()));
        expect([image.width, image.height]).toEqual([size, size]);
      }
    }
  });

  it('registers the service worker with scope / and it controls field mode', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    await signIn(page, baseUrl, 'crew@example.com');
    const id = await bridgeId(page, 'Marlow Creek Overpass');
    await openControlledFieldMode(page, id);
    const sw = await page.evaluate(async () => {
      const reg = await navigator.serviceWorker.getRegistration();
      return { scope: reg?.scope, script: navigator.serviceWorker.controller?.scriptURL, manifest: document.querySelector('link[rel="manifest"]')?.getAttribute('href') };
    });
    expect(sw.scope).toBe(`${baseUrl}/`);
    expect(sw.script).toBe(`${baseUrl}/serwist/sw.js`);
    expect(sw.manifest).toMatch(/^\/manifest\.webmanifest/);
    await context.close();
  });
});

describe('field mode without a connection', () => {
  it('opens from the phone, keeps three checks and a photo through a closed page, and sends each once on reconnecting', async () => {
    const context: BrowserContext = await browser.newContext(PHONE);
    let page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'inspector@example.com');
    const id = await bridgeId(page, 'Marlow Creek Overpass');
    await openControlledFieldMode(page, id);
    const { span, girder } = await pickLastSpan(page);
    const onlineTarget = await shown(page, 'target-width').textContent();
    await keepOnPhone(page);
    const before = await apiGet<Check[]>(page, `/api/bridges/${id}/checks`);

    await context.setOffline(true);
    await page.reload();
    await shown(page, 'target-width').waitFor();
    await expect.poll(() => shown(page, 'field-source').textContent(), SOON).toMatch(/^offline · saved \d\d:\d\d · revision 1$/);
    await pickLastSpan(page);
    // The numbers on screen offline are the kept offset table's, the same as online.
    expect(await shown(page, 'target-width').textContent()).toBe(onlineTarget);

    for (let point = 0; point < 3; point++) {
      if (point > 0) await page.getByRole('button', { name: /Next/ }).click();
      await recordHere(page);
    }
    // A camera photo larger than the phone keeps (2400 × 1800 px); made small before it is stored.
    const png = await new Jimp({ width: 2400, height: 1800, color: 0x5a7d9aff }).getBuffer('image/png');
    await page.locator('input[type=file]').setInputFiles({ name: 'edge.png', mimeType: 'image/png', buffer: png });
    await expect.poll(() => page.getByText(/Photo kept on this phone/).count(), SOON).toBe(1);
    await expect.poll(() => shown(page, 'field-waiting').textContent(), SOON).toBe('4 waiting');
    const waiting = await waitingItems(page);
    expect(waiting.map((w) => w.kind)).toEqual(['check', 'check', 'check', 'photo']);
    expect(waiting[3].checkKey).toBe(waiting[2].key);

    // Close the page and open field mode again, still without a connection: nothing is lost.
    await page.close();
    page = await context.newPage();
    errors.push(...trackPageErrors(page));
    await page.goto(`${baseUrl}/bridges/${id}/field`);
    await shown(page, 'target-width').waitFor();
    await expect.poll(() => shown(page, 'field-waiting').textContent(), SOON).toBe('4 waiting');

    await context.setOffline(false);
    await expect.poll(() => shown(page, 'field-waiting').textContent(), { timeout: 60000 }).toBe('All sent');
    expect(await waitingItems(page)).toEqual([]);

    const after = await apiGet<Check[]>(page, `/api/bridges/${id}/checks`);
    const fresh = after.filter((c) => !before.some((b) => b.id === c.id));
    expect(fresh.map((c) => c.client_key).sort()).toEqual(
      waiting
        .slice(0, 3)
        .map((w) => w.key)
        .sort(),
    );
    expect(fresh.map((c) => [c.span, c.girder, c.point, c.pass]).sort()).toEqual([0, 1, 2].map((p) => [span, girder, p, true]));
    const photos = (await apiGet<Photo[]>(page, `/api/bridges/${id}/attachments`)).filter((p) => p.client_key === waiting[3].key);
    expect(photos).toHaveLength(1);
    expect(photos[0].check_id).toBe(fresh.find((c) => c.client_key === waiting[2].key)!.id);
    expect(photos[0].content_type).toBe('image/jpeg');
    const stored = await page.evaluate(async (u) => Array.from(new Uint8Array(await (await fetch(u)).arrayBuffer())), photos[0].url);
    const image = await Jimp.read(Buffer.from(stored));
    expect(Math.max(image.width, image.height)).toBeLessThanOrEqual(1600);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('marks checks sent after a revision saved while the phone was offline as against the older revision', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    await signIn(page, baseUrl, 'inspector@example.com');
    const id = await bridgeId(page, 'Quarry Lane Connector');
    await openControlledFieldMode(page, id);
    await pickLastSpan(page);
    await keepOnPhone(page);
    await context.setOffline(true);
    await page.reload();
    await shown(page, 'target-width').waitFor();
    await pickLastSpan(page);
    await recordHere(page);
    await page.getByRole('button', { name: /Next/ }).click();
    await recordHere(page);
    const keys = (await waitingItems(page)).map((w) => w.key);
    expect(keys).toHaveLength(2);

    // Meanwhile, in the office, the engineer saves revision 2 (the deck half a foot wider on the right).
    const office = await browser.newContext();
    const desk = await office.newPage();
    await signIn(desk, baseUrl, 'engineer@example.com');
    const saved = await desk.evaluate(async (bridge) => {
      const current = await (await fetch(`/api/bridges/${bridge}`, { headers: { accept: 'application/json' } })).json();
      const description = { ...current.description, deck: { ...current.description.deck, right_edge_offset: current.description.deck.right_edge_offset + 0.5 } };
      const res = await fetch(`/api/bridges/${bridge}/revisions`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', accept: 'application/json' },
        body: JSON.stringify({ base_revision: current.revision ?? current.current_revision ?? 1, description, note: 'Wider deck on the right' }),
      });
      return { status: res.status, body: await res.json() };
    }, id);
    expect(saved.status, JSON.stringify(saved.body)).toBe(201);
    await office.close();

    await context.setOffline(false);
    await expect.poll(() => shown(page, 'field-waiting').textContent(), { timeout: 60000 }).toBe('All sent');
    const sent = (await apiGet<Check[]>(page, `/api/bridges/${id}/checks`)).filter((c) => c.client_key && keys.includes(c.client_key));
    expect(sent).toHaveLength(2);
    for (const c of sent) expect(c.revision).toBe(1);
    // The history says so beside each of them.
    await page.goto(`${baseUrl}/bridges/${id}/checks`);
    for (const c of sent) {
      const row = page.locator('tbody tr').filter({ has: page.locator('td:first-child', { hasText: new RegExp(`^${c.id}$`) }) });
      await expect.poll(() => row.textContent(), SOON).toMatch(/rev 1\s*\(older revision\)/);
    }
    await context.close();
  });
});
