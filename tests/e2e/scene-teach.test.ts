/**
 * The 3D view as a teaching picture, in headless Chromium with software WebGL (SwiftShader): for
 * every camera preset the labels the page reports never overlap, on a desktop and on a 390 px phone
 * (where no page scrolls sideways); the draw calls stay within 60 with the sun's shadows on; "Save
 * picture" gives a PNG twice the picture's size plus a caption strip that names the bridge (decoded
 * with jimp, an independent PNG decoder); and along the edge the handrail's corner at an interior
 * bent, as drawn, is plainly visible. Generous timeouts, no timing assertions.
 */
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { Jimp } from 'jimp';
import { signIn, trackPageErrors } from './browser';

const FLAGS = ['--no-sandbox', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--use-angle=swiftshader', '--enable-unsafe-swiftshader', '--ignore-gpu-blocklist'];
const PRESETS = ['Free orbit', 'Plan', 'Along the edge', 'Crew at a bent'];
/**
 * A corner of 4° between two straight runs of a line is plain to the eye at the sizes a screen
 * draws them (common practice for "visibly not straight"; the eye resolves far less than a degree
 * of direction change on a long line).
 */
const VISIBLE_CORNER_DEG = 4;

type Box = { x: number; y: number; w: number; h: number; text: string };

async function waitFrames(page: Page, more: number) {
  const start = await page.evaluate(() => window.__chordlineStats?.frames ?? 0);
  await page.waitForFunction((n) => (window.__chordlineStats?.frames ?? 0) >= n, start + more, { timeout: 90000 });
}

/** Waits until the camera has settled (the label list stops changing) and returns it. */
async function settledLabels(page: Page): Promise<Box[]> {
  let last = '';
  for (let i = 0; i < 40; i++) {
    await waitFrames(page, 5);
    const now = await page.evaluate(() => JSON.stringify(window.__chordlineStats?.labels ?? []));
    if (now === last) return JSON.parse(now);
    last = now;
  }
  return JSON.parse(last);
}

function overlapping(boxes: Box[]): string[] {
  const out: string[] = [];
  for (let a = 0; a < boxes.length; a++)
    for (let b = a + 1; b < boxes.length; b++) {
      const A = boxes[a];
      const B = boxes[b];
      if (A.x < B.x + B.w && B.x < A.x + A.w && A.y < B.y + B.h && B.y < A.y + A.h) out.push(`${A.text} / ${B.text}`);
    }
  return out;
}

describe('3D view for teaching: labels, draw calls, pictures, the kink', () => {
  const baseUrl = inject('baseUrl');
  let browser: Browser;
  let bridges: Array<{ id: number; name: string }>;

  beforeAll(async () => {
    browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', headless: true, args: FLAGS });
    const page = await browser.newPage();
    await signIn(page, baseUrl, 'engineer@example.com');
    const body = await (await page.request.get(`${baseUrl}/api/bridges`)).json();
    bridges = Array.isArray(body) ? body : body.bridges;
    await page.context().storageState({ path: '/tmp/chordline-scene-teach-state.json' });
    await page.close();
  });

  afterAll(async () => {
    await browser?.close();
    fs.rmSync('/tmp/chordline-scene-teach-state.json', { force: true });
  });

  for (const device of [
    { name: 'desktop', viewport: { width: 1280, height: 900 }, isMobile: false },
    { name: '390 px phone', viewport: { width: 390, height: 844 }, isMobile: true },
  ]) {
    it(`labels never overlap in any preset, with shadows within 60 draw calls, on a ${device.name}`, async () => {
      const ctx = await browser.newContext({ viewport: device.viewport, isMobile: device.isMobile, hasTouch: device.isMobile, storageState: '/tmp/chordline-scene-teach-state.json' });
      const page = await ctx.newPage();
      const errors = trackPageErrors(page);
      for (const b of bridges) {
        await page.goto(`${baseUrl}/bridges/${b.id}/view?stats=1`);
        await waitFrames(page, 3);
        for (const preset of PRESETS) {
          await page.getByRole('button', { name: preset, exact: true }).click();
          const labels = await settledLabels(page);
          expect(overlapping(labels), `${b.name}, ${preset}`).toEqual([]);
          const s = await page.evaluate(() => ({ calls: window.__chordlineStats!.drawCalls, shadows: window.__chordlineStats!.shadows, w: window.__chordlineStats!.width, h: window.__chordlineStats!.height }));
          expect(s.shadows).toBe(true);
          expect(s.calls, `${b.name}, ${preset}: draw calls`).toBeGreaterThan(5);
          expect(s.calls, `${b.name}, ${preset}: draw calls`).toBeLessThanOrEqual(60);
          for (const l of labels) {
            expect(l.x).toBeGreaterThanOrEqual(0);
            expect(l.x + l.w).toBeLessThanOrEqual(s.w + 0.5);
          }
        }
        const width = await page.evaluate(() => document.documentElement.scrollWidth);
        expect(width, `${b.name}: page width`).toBeLessThanOrEqual(device.viewport.width);
      }
      await page.goto(`${baseUrl}/learn`);
      await page.getByTestId('scene-canvas').locator('canvas').waitFor({ timeout: 90000 });
      await waitFrames(page, 3);
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(device.viewport.width);
      expect(errors.map(String)).toEqual([]);
      await ctx.close();
    });
  }

  it('Save picture gives a PNG twice the picture size with a caption strip naming the bridge', async () => {
    const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true, storageState: '/tmp/chordline-scene-teach-state.json' });
    const page = await ctx.newPage();
    const b = bridges[0];
    await page.goto(`${baseUrl}/bridges/${b.id}/view?stats=1`);
    await waitFrames(page, 3);
    await page.getByRole('button', { name: 'Along the edge', exact: true }).click();
    await settledLabels(page);
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 90000 }), page.getByRole('button', { name: 'Save picture' }).click()]);
    const file = await download.path();
    const report = await page.evaluate(() => ({ ...window.__chordlineStats!.picture!, cssW: window.__chordlineStats!.width, cssH: window.__chordlineStats!.height }));
    expect(report.caption).toContain(b.name);
    expect(report.caption).toMatch(/Along the edge/);
    expect(report.caption).toMatch(/heights ×8/);
    expect(report.caution).toMatch(/Geometry only/);
    const img = await Jimp.read(file);
    // Twice the picture's CSS size, plus the caption strip below it.
    expect(img.bitmap.width).toBe(report.cssW * 2);
    expect(report.sceneHeight).toBe(report.cssH * 2);
    expect(img.bitmap.height).toBe(report.height);
    expect(img.bitmap.height).toBeGreaterThan(report.sceneHeight + 40);
    // Not blank: the scene part has many colours; the strip has dark text on its light ground.
    const colours = new Set<number>();
    for (let y = 0; y < report.sceneHeight; y += 17) for (let x = 0; x < img.bitmap.width; x += 13) colours.add(img.getPixelColor(x, y) >>> 8);
    expect(colours.size).toBeGreaterThan(50);
    let dark = 0;
    let light = 0;
    for (let y = report.sceneHeight + 4; y < img.bitmap.height; y += 2)
      for (let x = 0; x < img.bitmap.width; x += 3) {
        const c = img.getPixelColor(x, y) >>> 8;
        const lum = ((c >> 16) & 255) * 0.3 + ((c >> 8) & 255) * 0.59 + (c & 255) * 0.11;
        if (lum < 90) dark++;
        else if (lum > 200) light++;
      }
    expect(dark).toBeGreaterThan(200);
    expect(light).toBeGreaterThan(dark);
    await ctx.close();
  });

  it('along the edge, the handrail’s corner at an interior bent is plainly visible at the preset’s ×8', async () => {
    const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 }, storageState: '/tmp/chordline-scene-teach-state.json' });
    const page = await ctx.newPage();
    // The first demo bridge is framed with straight chords on a curve: its rail turns at every pier.
    const b = bridges.find((x) => /Marlow/.test(x.name)) ?? bridges[0];
    await page.goto(`${baseUrl}/bridges/${b.id}/view?stats=1`);
    await waitFrames(page, 3);
    await page.getByRole('button', { name: 'Along the edge', exact: true }).click();
    await settledLabels(page);
    expect(await page.getByTestId('kink-note').textContent()).toMatch(/Heights ×8 to show the kink at each bent/);
    const kink = await page.evaluate(() => window.__chordlineStats!.kink);
    expect(kink).not.toBeNull();
    expect(kink!.bent).toMatch(/Pier/);
    console.info(`[scene] ${b.name}: rail corner at ${kink!.bent} ${kink!.railDeg.toFixed(1)}°, form edge ${kink!.formEdgeDeg.toFixed(1)}° as drawn at ×8`);
    expect(kink!.railDeg).toBeGreaterThan(VISIBLE_CORNER_DEG);
    // True scale: the toggle brings the heights back and the note goes.
    await page.getByRole('button', { name: 'True scale' }).click();
    await settledLabels(page);
    expect(await page.getByTestId('kink-note').textContent()).not.toMatch(/Heights ×8 to show/);
    await ctx.close();
  });
});
