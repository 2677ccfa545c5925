/**
 * The geometry editor's spiral, flared-edge and deflection parts in a real browser: an engineer turns
 * the first tangent of a copy of the first demo bridge into a clothoid spiral, flares the right deck
 * edge, pastes a deflection table, sees the preview follow, is stopped at the field by a bad value, saves
 * a revision and finds the deflection and screed-grade columns in the offsets table. Every expected
 * number and message comes from the engine (lib/geometry) run here on the same description; the data
 * contract (bridge-format.md: "Spirals", flared edges, "Definitions the engine computes") is the outside
 * source of what the engine computes.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchChromium, signIn, trackPageErrors, shown } from './browser';
import { demoBridges } from '@/lib/demo/bridges';
import { bridgeDescriptionSchema, computeOffsetTable, formatFeet, GeometryError, type BridgeDescription } from '@/lib/geometry';
import { elevationCell, lengthCell } from '@/lib/units';

const baseUrl = inject('baseUrl');
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

/** The message the shared schema or the engine gives at `path` for this description (null when none). */
function engineMessage(description: unknown, path: string): string | null {
  const parsed = bridgeDescriptionSchema.safeParse(description);
  if (!parsed.success) return parsed.error.issues.find((i) => i.path.map(String).join('.') === path)?.message ?? null;
  try {
    computeOffsetTable(parsed.data);
  } catch (err) {
    if (err instanceof GeometryError) return err.issues.find((i) => i.path === path)?.message ?? null;
    throw err;
  }
  return null;
}

const copy = (d: BridgeDescription): BridgeDescription => JSON.parse(JSON.stringify(d));
const ready = (page: Page) => page.locator('#main').getByText('Computes cleanly').waitFor();
const spanCell = (page: Page, span: number, side: 'left' | 'right', which: 'min-width' | 'max-width') =>
  page.locator(`[data-testid="span-widths"] tr[data-span="${span}"][data-side="${side}"] [data-testid="${which}"]`);
const widthsOf = (d: BridgeDescription, span: number, side: 'left' | 'right') => {
  const s = computeOffsetTable(d).span_summaries.find((x) => x.span === span && x.side === side)!;
  return { min: formatFeet(s.min_edge_width), max: formatFeet(s.max_edge_width) };
};

describe('geometry editor: spirals, flared edges and deflections', () => {
  it('an engineer adds a spiral, a flared edge and deflections, is stopped by bad values, saves, and the offsets table shows the engine deflection and screed grade', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'engineer@example.com');
    const created = await page.evaluate(
      async ([n, d]) => {
        const r = await fetch('/api/bridges', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ name: n, description: d }) });
        return { status: r.status, body: await r.json() };
      },
      [`Editor spiral ${Date.now()}`, demoBridges[0]] as const,
    );
    expect(created.status).toBe(201);
    const id = created.body.id as number;

    await page.goto(`${baseUrl}/bridges/${id}/edit`);
    await ready(page);
    const save = page.getByRole('button', { name: 'Save revision' });
    // The note first, so Save is held off by the problems alone.
    await page.getByLabel(/Note for the history/).fill('Spiral into the curve, flared right edge, deflection table');
    const base = demoBridges[0];
    expect(await spanCell(page, 1, 'left', 'max-width').textContent()).toBe(widthsOf(base, 1, 'left').max);

    // 1. The first tangent becomes a 300 ft spiral from the tangent into the 1000 ft arc, turning right:
    // it runs under span 1 into span 2, so the chords there sit under a changing curvature.
    const element = page.locator('#alignment li').nth(0);
    await element.getByLabel('Type', { exact: true }).selectOption('spiral');
    await element.getByLabel('Starts on').selectOption('tangent');
    await element.getByLabel('Ends on').selectOption('radius');
    await element.getByLabel('End radius').fill('1000');
    await element.getByLabel('Turns').selectOption('right');
    const spiral = copy(base);
    spiral.alignment.elements[0] = { type: 'spiral', length: 300, radius_start: null, radius_end: 1000, direction: 'right' };

    // A negative spiral length is marked at the Length field with the message of the shared schema/engine.
    const length = element.getByLabel('Length', { exact: true });
    await length.fill('-150');
    const badLength = copy(spiral);
    (badLength.alignment.elements[0] as { length: number }).length = -150;
    const lengthMessage = engineMessage(badLength, 'alignment.elements.0.length');
    expect(lengthMessage).toBeTruthy();
    await element.getByText(lengthMessage!, { exact: true }).waitFor();
    expect(await length.getAttribute('aria-invalid')).toBe('true');
    expect(await save.isDisabled()).toBe(true);
    await length.fill('300');
    await ready(page);
    // The preview follows the spiral: the engine's widths for the edited description, not the old ones.
    const withSpiral = widthsOf(spiral, 1, 'left');
    expect(withSpiral.max).not.toBe(widthsOf(base, 1, 'left').max);
    await expect.poll(() => spanCell(page, 1, 'left', 'max-width').textContent()).toBe(withSpiral.max);

    // 2. The right edge flares from 21 ft RT at Abutment 1 to 24 ft RT at Abutment 4.
    const right = shown(page, 'edge-right');
    await right.getByLabel('Edge line').selectOption('table');
    await right.getByLabel('Station 1', { exact: true }).fill('12+00');
    await right.getByLabel('Station 2', { exact: true }).fill('14+80');
    await right.getByLabel('Offset 2', { exact: true }).fill('24');
    const flared = copy(spiral);
    flared.deck.right_edge_offset = [
      { station: 1200, offset: 21 },
      { station: 1480, offset: 24 },
    ];
    const flaredRight = widthsOf(flared, 3, 'right');
    expect(flaredRight.max).not.toBe(widthsOf(spiral, 3, 'right').max);
    await expect.poll(() => spanCell(page, 3, 'right', 'max-width').textContent()).toBe(flaredRight.max);

    // 3. A cross slope typed as 80 % is refused at its field with the engine's message naming it.
    const slope = page.getByLabel('Left slope').first();
    const slopeBefore = await slope.inputValue();
    await slope.fill('80');
    const steep = copy(flared);
    steep.cross_slopes[0].left = 0.8;
    const slopeMessage = engineMessage(steep, 'cross_slopes.0.left');
    expect(slopeMessage).toMatch(/^cross_slopes\.0\.left: /);
    await page.getByText(slopeMessage!, { exact: true }).first().waitFor();
    expect(await slope.getAttribute('aria-invalid')).toBe('true');
    expect(await save.isDisabled()).toBe(true);
    await slope.fill(slopeBefore);
    await ready(page);

    // 4. Deflection tables for both exterior girders in span 1, pasted as spreadsheet rows.
    const values = '0\t0.31\t0.58\t0.79\t0.92\t0.96\t0.92\t0.79\t0.58\t0.31\t0';
    await page.getByLabel(/Pasted rows/).fill(`G1\t1\t${values}\nG5\t1\t${values}`);
    await page.getByRole('button', { name: 'Read pasted rows' }).click();
    await shown(page, 'deflection-paste')
      .getByText(/Read 2 rows/)
      .waitFor();
    expect(await shown(page, 'deflection-rows').locator(':scope > li').count()).toBe(2);
    await ready(page);

    expect(await save.isDisabled()).toBe(false);
    await save.click();
    await shown(page, 'save-result').waitFor();
    expect(await shown(page, 'save-result').textContent()).toMatch(/Saved as revision 2/);

    // The stored description holds all three, and the engine run on it gives the numbers to expect.
    const stored = await page.evaluate(async (bridgeId) => (await fetch(`/api/bridges/${bridgeId}`)).json(), id);
    const saved: BridgeDescription = stored.description;
    expect(saved.alignment.elements[0]).toMatchObject({ type: 'spiral', length: 300, radius_start: null, radius_end: 1000, direction: 'right' });
    expect(saved.deck.right_edge_offset).toEqual(flared.deck.right_edge_offset);
    expect(saved.cross_slopes[0].left).toBe(base.cross_slopes[0].left);
    expect(saved.deflections?.map((d) => `${d.girder}/${d.span}/${d.values.length}`)).toEqual(['G1/1/11', 'G5/1/11']);
    const table = computeOffsetTable(saved);

    await page.goto(`${baseUrl}/bridges/${id}/offsets`);
    await shown(page, 'deflection-note').waitFor();
    for (const [side, girder] of [
      ['left', 'G1'],
      ['right', 'G5'],
    ] as const) {
      const t = page.locator('table', { has: page.locator('caption', { hasText: `Span 1, ${side} overhang: exterior girder ${girder}` }) });
      const headers = (await t.locator('thead th').allTextContents()).map((h) => h.trim());
      const di = headers.findIndex((h) => h.startsWith('Deflection'));
      const si = headers.findIndex((h) => h.startsWith('Screed grade'));
      expect(di).toBeGreaterThan(0);
      expect(si).toBeGreaterThan(0);
      const rows = table.points.filter((p) => p.span === 1 && p.girder === girder);
      expect(rows.some((p) => p.deflection !== 0)).toBe(true);
      for (const p of rows) {
        const cells = t.locator(`tbody tr[data-point="${p.point}"]`).locator('th, td');
        expect((await cells.nth(di).textContent())?.trim()).toBe(lengthCell(p.deflection, 'ft', 'decimal-feet'));
        expect((await cells.nth(si).textContent())?.trim()).toBe(elevationCell(p.screed_grade, 'ft'));
      }
    }
    expect(errors).toEqual([]);
    await context.close();
  });
});
