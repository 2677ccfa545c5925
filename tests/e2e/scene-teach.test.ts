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
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { trackPageErrors, shown } from './browser';
import { demoBridges } from '@/lib/demo/bridges';
import { DEVICES, PAGE_TIMEOUT, PRESETS, PRESET_TIMEOUT, choosePreset, overlapping, pageWidth, sceneSession, settledLabels } from './scene-teach-helpers';

const { openView, browser, stateFile } = sceneSession();

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
      const ctx = await browser().newContext({ viewport: device.viewport, isMobile: device.isMobile, hasTouch: device.isMobile, storageState: stateFile });
      ctx.setDefaultTimeout(PAGE_TIMEOUT);
      const page = await ctx.newPage();
      const errors = trackPageErrors(page);
      await page.goto(`${inject('baseUrl')}/learn`);
      await shown(page, 'scene-canvas').locator('canvas').waitFor({ timeout: PAGE_TIMEOUT });
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
