/**
 * The 3D teaching view's corner and saved picture, in headless Chromium with software WebGL
 * (SwiftShader): along the edge, the form edge's corner at an interior bent, as drawn, is plainly
 * visible; "Save picture" gives a PNG twice the picture's size plus a caption strip that names the
 * bridge (decoded with jimp, an independent PNG decoder). Waits for frames the page reports as drawn,
 * never for fixed times.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { Jimp } from 'jimp';
import { demoBridges } from '@/lib/demo/bridges';
import { DEVICES, PAGE_TIMEOUT, PRESET_TIMEOUT, VISIBLE_CORNER_DEG, choosePreset, sceneSession, settledLabels } from './scene-teach-helpers';
import { shown } from './browser';

const { openView } = sceneSession();

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
      expect(await shown(page, 'kink-note').textContent()).toMatch(/Heights ×8 to show the kink at each bent/);
      const kink = await page.evaluate(() => window.__chordlineStats!.kink);
      expect(kink).not.toBeNull();
      expect(kink!.bent).toMatch(/Pier/);
      console.info(`[scene] ${bridge.name}: at ${kink!.bent} the form edge turns ${kink!.formEdgeDeg.toFixed(1)}°, the rail ${kink!.railDeg.toFixed(1)}°, as drawn at ×8`);
      expect(kink!.formEdgeDeg).toBeGreaterThan(VISIBLE_CORNER_DEG);
      expect(kink!.railDeg).toBeGreaterThan(VISIBLE_CORNER_DEG);
      // True scale: the toggle brings the heights back and the note goes.
      await page.getByRole('button', { name: 'True scale' }).click();
      await settledLabels(page);
      expect(await shown(page, 'kink-note').textContent()).not.toMatch(/Heights ×8 to show/);
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
