/** Shared pieces of the 3D teaching view browser tests: presets, devices, waits for a settled picture, the signed-in browser. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, inject } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors } from './browser';

export const PRESETS = ['Free orbit', 'Plan', 'Along the edge', 'Crew at a bent'] as const;
export const DEVICES = [
  { name: 'desktop', viewport: { width: 1280, height: 900 }, isMobile: false },
  { name: '390 px phone', viewport: { width: 390, height: 844 }, isMobile: true },
] as const;
/**
 * A corner of 4° between two straight runs of a line is plain to the eye at the sizes a screen
 * draws them (common practice for "visibly not straight"; the eye resolves far less than a degree
 * of direction change on a long line).
 */
export const VISIBLE_CORNER_DEG = 4;
/** Software WebGL on a busy 2-core machine: a page's first frames can take a minute. */
export const PAGE_TIMEOUT = 150_000;
export const PRESET_TIMEOUT = 90_000;

export type Box = { x: number; y: number; w: number; h: number; text: string };

/**
 * Waits until the camera has settled and returns the label boxes: the boxes must stay the same while
 * the page draws three more frames and for 1.5 s (the stats page draws every frame; a preset's move
 * eases over about a second) or, on a page that draws on demand, while no frame is drawn for ten polls.
 * `minFrames`: frames that must be drawn first (a preset just chosen has to start its move).
 */
export async function settledLabels(page: Page, minFrames = 2): Promise<Box[]> {
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

export function overlapping(boxes: Box[]): string[] {
  const out: string[] = [];
  for (let a = 0; a < boxes.length; a++)
    for (let b = a + 1; b < boxes.length; b++) {
      const A = boxes[a];
      const B = boxes[b];
      if (A.x < B.x + B.w && B.x < A.x + A.w && A.y < B.y + B.h && B.y < A.y + A.h) out.push(`${A.text} / ${B.text}`);
    }
  return out;
}

export async function choosePreset(page: Page, preset: string) {
  await page.getByRole('button', { name: preset, exact: true }).click();
  await page.getByRole('button', { name: preset, exact: true, pressed: true }).waitFor({ timeout: PRESET_TIMEOUT });
}

export async function pageWidth(page: Page): Promise<number> {
  return page.evaluate(() => document.documentElement.scrollWidth);
}

/**
 * Signs in once for the calling test file (beforeAll/afterAll of that file) and returns a way to open a
 * bridge's 3D view with the render statistics on, each on its own browser context.
 */
export function sceneSession() {
  const stateFile = path.join(os.tmpdir(), `chordline-scene-teach-${process.pid}.json`);
  let browser: Browser;
  let bridgeIds: Map<string, number>;

  beforeAll(async () => {
    const baseUrl = inject('baseUrl');
    browser = await launchChromium();
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
  return { openView, browser: () => browser, stateFile };
}
