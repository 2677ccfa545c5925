/**
 * The 3D view as a teaching picture, in headless Chromium with software WebGL (SwiftShader): for
 * every camera preset the labels the page reports never overlap and stay inside the picture, on a
 * desktop and on a 390 px phone (where no page scrolls sideways); the draw calls stay within 60 with
 * the sun's shadows on; "Save picture" gives a PNG twice the picture's size plus a caption strip that
 * names the bridge (decoded with jimp, an independent PNG decoder); and along the edge the form edge's
 * corner at an interior bent, as drawn, is plainly visible.
 *
 * Each page is opened once per device and bridge and every preset is its own test with its own
 * timeout; the tests wait for frames the page reports as drawn (`window.__chordlineStats.frames`),
 * never for fixed times, and assert nothing about speed (that is `npm run bench:3d`).
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { Jimp } from 'jimp';
import { signIn, trackPageErrors } from './browser';
import { demoBridges } from '@/lib/demo/bridges';

const FLAGS = [
  '--no-sandbox',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
  '--ignore-gpu-blocklist',
];
const PRESETS = ['Free orbit', 'Plan', 'Along the edge', 'Crew at a bent'] as const;
const DEVICES = [
  { name: 'desktop', viewport: { width: 1280, height: 900 }, isMobile: false },
  { name: '390 px phone', viewport: { width: 390, height: 844 }, isMobile: true },
] as const;
/**
 * A corner of 4° between two straight runs of a line is plain to the eye at the sizes a screen
 * draws them (common practice for "visibly not straight"; the eye resolves far less than a degree
 * of direction change on a long line).
 */
const VISIBLE_CORNER_DEG = 4;
/** Software WebGL on a busy 2-core machine: a page's first frames can take a minute. */
const PAGE_TIMEOUT = 150_000;
const PRESET_TIMEOUT = 90_000;

type Box = { x: number; y: number; w: number; h: number; text: string };

/**
 * Waits until the camera has settled and returns the label boxes: the boxes must stay the same while
 * the page draws three more frames and for 1.5 s (the stats page draws every frame; a preset's move
 * eases over about a second) or, on a page that draws on demand, while no frame is drawn for ten polls.
 * `minFrames`: frames that must be drawn first (a preset just chosen has to start its move).
 */
async function settledLabels(page: Page, minFrames = 2): Promise<Box[]> {
  const start = await page.evaluate(() => window.__chordlineStats?.frames ?? 0);
  await page.evaluate(() => ((window as unknown as { __settle: unknown }).__settle = null));
  await page.waitForFunction(
    (first) => {
      const s = window.__chordlineStats;
      if (!s) return false;
      const w = window as unknown as { __settle: { labels: string; since: number; at: number; last: number; idle: number } | null };
      const now = JSON.stringify(s.labels);
      const st = w.__settle;
      if (!st || st.labels !== now) {
        w.__settle = { labels: now, since: s.frames, at: performance.now(), last: s.frames, idle: 0 };
        return false;
      }
      st.idle = s.frames === st.last ? st.idle + 1 : 0;
      st.last = s.frames;
      // Also 1.5 s unchanged: the move lasts a second of clock time, and while every label is off the
      // picture mid-move the (empty) list does not change either.
      return s.frames >= first && ((s.frames - st.since >= 3 && performance.now() - st.at >= 1500) || st.idle >= 10);
    },
    start + minFrames,
    { timeout: PRESET_TIMEOUT, polling: 100 },
  );
  return page.evaluate(() => JSON.parse(JSON.stringify(window.__chordlineStats!.labels)) as Box[]);
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

async function choosePreset(page: Page, preset: string) {
  await page.getByRole('button', { name: preset, exact: true }).click();
  await page.getByRole('button', { name: preset, exact: true, pressed: true }).waitFor({ timeout: PRESET_TIMEOUT });
}

async function pageWidth(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth);
}

const stateFile = path.join(os.tmpdir(), `chordline-scene-teach-${process.pid}.json`);
let browser: Browser;
let bridgeIds: Map<string, number>;

beforeAll(async () => {
  const baseUrl = inject('baseUrl');
  browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', headless: true, args: FLAGS });
  const page = await browser.newPage();
  // Every wait of these pages (navigation, clicks) gets the generous timeout: the machine may be busy.
  page.setDefaultTimeout(PAGE_TIMEOUT);
  await signIn(page, baseUrl, 'engineer@example.com');
  const body = await (await page.request.get(`${baseUrl}/api/bridges`)).json();
  const rows: Array<{ id: number; name: string }> = Array.isArray(body) ? body : body.bridges;
  bridgeIds = new Map(rows.map((r) => [r.name, r.id]));
  await page.context().storageState({ path: stateFile });
  await page.close();
}, PAGE_TIMEOUT);

afterAll(async () => {
  await browser?.close();
  fs.rmSync(stateFile, { force: true });
});

/** Opens a bridge's 3D view with the render statistics on, on its own browser context. */
async function openView(device: (typeof DEVICES)[number], bridgeName: string, extra: { acceptDownloads?: boolean } = {}) {
  const baseUrl = inject('baseUrl');
  const id = bridgeIds.get(bridgeName);
  if (id === undefined) throw new Error(`The demo bridge ${bridgeName} is not stored`);
  const ctx = await browser.newContext({ viewport: device.viewport, isMobile: device.isMobile, hasTouch: device.isMobile, storageState: stateFile, ...extra });
  ctx.setDefaultTimeout(PAGE_TIMEOUT);
  const page = await ctx.newPage();
  const errors = trackPageErrors(page);
  await page.goto(`${baseUrl}/bridges/${id}/view?stats=1`);
  await page.waitForFunction(() => (window.__chordlineStats?.frames ?? 0) >= 3, null, { timeout: PAGE_TIMEOUT, polling: 100 });
  return { ctx, page, errors };
}

for (const device of DEVICES) {
  for (const bridge of demoBridges) {
    describe(`${bridge.name} on a ${device.name}`, () => {
      let ctx: BrowserContext;
      let page: Page;
      let errors: Error[];

      beforeAll(async () => {
        ({ ctx, page, errors } = await openView(device, bridge.name));
      }, PAGE_TIMEOUT);

      afterAll(async () => {
        await ctx?.close();
      });

      for (const preset of PRESETS) {
        it(
          `${preset}: labels apart and inside the picture, shadows on within 60 draw calls, no sideways scroll`,
          async () => {
            await choosePreset(page, preset);
            const labels = await settledLabels(page);
            expect(labels.length, 'at least one label shows').toBeGreaterThan(0);
            expect(overlapping(labels)).toEqual([]);
            const s = await page.evaluate(() => {
              const st = window.__chordlineStats!;
              return { calls: st.drawCalls, peak: st.peakDrawCalls, shadows: st.shadows, w: st.width, h: st.height };
            });
            expect(s.shadows).toBe(true);
            // The scene's parts are drawn (more than a handful of calls) within the budget.
            expect(s.calls).toBeGreaterThan(5);
            expect(s.calls).toBeLessThanOrEqual(60);
            // The shadow map is static: the frames that drew it (shadow pass and all) are within the budget too.
            expect(s.peak).toBeGreaterThanOrEqual(s.calls);
            expect(s.peak).toBeLessThanOrEqual(60);
            for (const l of labels) {
              expect(l.x, l.text).toBeGreaterThanOrEqual(0);
              expect(l.y, l.text).toBeGreaterThanOrEqual(0);
              expect(l.x + l.w, l.text).toBeLessThanOrEqual(s.w + 0.5);
              expect(l.y + l.h, l.text).toBeLessThanOrEqual(s.h + 0.5);
            }
            expect(s.w, 'the picture fits the screen').toBeLessThanOrEqual(device.viewport.width);
            expect(await pageWidth(page)).toBeLessThanOrEqual(device.viewport.width);
            expect(errors.map(String)).toEqual([]);
          },
          PRESET_TIMEOUT * 2,
        );
      }
    });
  }

  it(
    `the walkthrough fits a ${device.name} without sideways scrolling`,
    async () => {
      const ctx = await browser.newContext({ viewport: device.viewport, isMobile: device.isMobile, hasTouch: device.isMobile, storageState: stateFile });
      ctx.setDefaultTimeout(PAGE_TIMEOUT);
      const page = await ctx.newPage();
      const errors = trackPageErrors(page);
      await page.goto(`${inject('baseUrl')}/learn`);
      await page.getByTestId('scene-canvas').locator('canvas').waitFor({ timeout: PAGE_TIMEOUT });
      await page.waitForFunction(() => (window.__chordlineStats?.frames ?? 0) >= 3, null, { timeout: PAGE_TIMEOUT, polling: 100 });
      const labels = await settledLabels(page, 0);
      const size = await page.evaluate(() => ({ w: window.__chordlineStats!.width, h: window.__chordlineStats!.height }));
      expect(overlapping(labels)).toEqual([]);
      for (const l of labels) {
        expect(l.x, l.text).toBeGreaterThanOrEqual(0);
        expect(l.x + l.w, l.text).toBeLessThanOrEqual(size.w + 0.5);
      }
      expect(await pageWidth(page)).toBeLessThanOrEqual(device.viewport.width);
      expect(errors.map(String)).toEqual([]);
      await ctx.close();
    },
    PAGE_TIMEOUT * 2,
  );
}

describe(`${demoBridges[0].name} along the edge on a desktop: the kink and a saved picture`, () => {
  // The first demo bridge is framed with straight chords on a curve: its form edge turns at every pier.
  const bridge = demoBridges[0];
  let ctx: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    ({ ctx, page } = await openView(DEVICES[0], bridge.name, { acceptDownloads: true }));
    await choosePreset(page, 'Along the edge');
    await settledLabels(page);
  }, PAGE_TIMEOUT * 2);

  afterAll(async () => {
    await ctx?.close();
  });

  it(
    'the form edge’s corner at an interior bent is plainly visible at the preset’s ×8, and True scale brings the heights back',
    async () => {
      expect(await page.getByTestId('kink-note').textContent()).toMatch(/Heights ×8 to show the kink at each bent/);
      const kink = await page.evaluate(() => window.__chordlineStats!.kink);
      expect(kink).not.toBeNull();
      expect(kink!.bent).toMatch(/Pier/);
      console.info(`[scene] ${bridge.name}: at ${kink!.bent} the form edge turns ${kink!.formEdgeDeg.toFixed(1)}°, the rail ${kink!.railDeg.toFixed(1)}°, as drawn at ×8`);
      expect(kink!.formEdgeDeg).toBeGreaterThan(VISIBLE_CORNER_DEG);
      expect(kink!.railDeg).toBeGreaterThan(VISIBLE_CORNER_DEG);
      // True scale: the toggle brings the heights back and the note goes.
      await page.getByRole('button', { name: 'True scale' }).click();
      await settledLabels(page);
      expect(await page.getByTestId('kink-note').textContent()).not.toMatch(/Heights ×8 to show/);
    },
    PRESET_TIMEOUT * 2,
  );

  it(
    'Save picture gives a PNG twice the picture size with a caption strip that names the bridge',
    async () => {
      // Along the edge afresh (at ×8), whatever the test above left.
      await choosePreset(page, 'Free orbit');
      await choosePreset(page, 'Along the edge');
      await settledLabels(page);
      const [download] = await Promise.all([page.waitForEvent('download', { timeout: PRESET_TIMEOUT }), page.getByRole('button', { name: 'Save picture' }).click()]);
      const file = await download.path();
      const report = await page.evaluate(() => ({ ...window.__chordlineStats!.picture!, cssW: window.__chordlineStats!.width, cssH: window.__chordlineStats!.height }));
      expect(download.suggestedFilename()).toBe(report.fileName);
      expect(report.caption).toContain(bridge.name);
      expect(report.caption).toMatch(/revision \d+/);
      expect(report.caption).toMatch(/Along the edge/);
      expect(report.caption).toMatch(/heights ×8/);
      expect(report.caption).toMatch(/\d{4}-\d{2}-\d{2}/);
      expect(report.caution).toMatch(/Geometry only/);

      const img = await Jimp.read(file);
      const { width, height } = img.bitmap;
      // Twice the picture's CSS size, plus the caption strip below it.
      expect(width).toBe(report.cssW * 2);
      expect(report.sceneHeight).toBe(report.cssH * 2);
      expect(height).toBe(report.height);
      expect(height).toBeGreaterThan(report.sceneHeight + 80);
      const lum = (x: number, y: number) => {
        const c = img.getPixelColor(x, y) >>> 8;
        return ((c >> 16) & 255) * 0.3 + ((c >> 8) & 255) * 0.59 + (c & 255) * 0.11;
      };
      // Not blank: the scene part has many colours.
      const colours = new Set<number>();
      for (let y = 0; y < report.sceneHeight; y += 17) for (let x = 0; x < width; x += 13) colours.add(img.getPixelColor(x, y) >>> 8);
      expect(colours.size).toBeGreaterThan(50);

      // The caption strip: a light ground with dark type, every pixel looked at.
      let dark = 0;
      let light = 0;
      for (let y = report.sceneHeight + 8; y < height; y++)
        for (let x = 0; x < width; x++) {
          const l = lum(x, y);
          if (l < 110) dark++;
          else if (l > 200) light++;
        }
      expect(light).toBeGreaterThan(dark * 4);
      expect(dark).toBeGreaterThan(1000);

      // The first line of the strip is the caption, and it begins with the bridge's name: the ink of
      // that line, column by column, matches the name drawn by the page in the caption's type.
      const name = await page.evaluate(
        ({ text, scale }) => {
          const c = document.createElement('canvas');
          const ctx = c.getContext('2d')!;
          ctx.font = `700 ${15 * scale}px "Source Sans 3", system-ui, sans-serif`;
          return { width: ctx.measureText(text).width, space: ctx.measureText(' · ').width };
        },
        { text: bridge.name, scale: 2 },
      );
      // The caption's first line: 14 px padding, 15 px bold type, 20 px line pitch (all × 2).
      const lineTop = report.sceneHeight + 20;
      const lineBottom = report.sceneHeight + 28 + 40;
      const inkColumns: boolean[] = [];
      for (let x = 0; x < width; x++) {
        let ink = false;
        for (let y = lineTop; y < lineBottom && !ink; y++) ink = lum(x, y) < 110;
        inkColumns.push(ink);
      }
      const firstInk = inkColumns.indexOf(true);
      expect(firstInk, 'the caption starts at the strip’s left padding').toBeGreaterThan(10);
      expect(firstInk).toBeLessThan(60);
      // A gap wider than a letter's follows the name (the " · " separator's spaces) where the name ends.
      const nameEnd = firstInk + name.width;
      let gapAt = -1;
      for (let x = Math.round(nameEnd - 20); x < nameEnd + 20 && gapAt < 0; x++) {
        let run = 0;
        while (x + run < width && !inkColumns[x + run]) run++;
        if (run >= name.space * 0.25) gapAt = x;
      }
      expect(gapAt, `a gap after the bridge's name near x = ${nameEnd.toFixed(0)}`).toBeGreaterThan(0);
      // The name's own width is mostly inked columns (letters), not an empty stretch.
      const inked = inkColumns.slice(firstInk, Math.round(nameEnd)).filter(Boolean).length;
      expect(inked / name.width).toBeGreaterThan(0.5);
    },
    PRESET_TIMEOUT * 2,
  );
});
