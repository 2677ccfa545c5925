/**
 * The deliverables downloaded through the buttons of a freshly started app, read with independent
 * parsers: the offset-table and field-sheet PDFs with pdf-parse (pdf.js) against the JSON offset
 * table as the screen rounds it, the DXF plan with dxf-parser against the engine's coordinates, and
 * the LandXML with the product's importer against the stored description.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import DxfParser from 'dxf-parser';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Download, Page } from 'playwright-core';
import type { BridgeDescription, OffsetTable } from '@/lib/geometry';
import { parseLandXml } from '@/lib/import/landxml';
import { elevationCell, lengthCell, lengthText, offsetCell, stationText } from '@/lib/units';
import { launchChromium, signIn, trackPageErrors } from './browser';

const baseUrl = inject('baseUrl');
let browser: Browser;
const shots = process.env.CHORDLINE_SHOTS_DIR || fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-exports-shots-'));

beforeAll(async () => {
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
});

async function bytesOf(download: Download): Promise<Buffer> {
  const file = path.join(shots, download.suggestedFilename());
  await download.saveAs(file);
  return fs.readFileSync(file);
}

async function click(page: Page, name: RegExp): Promise<Buffer> {
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name }).first().click()]);
  return bytesOf(download);
}

async function pdfLines(bytes: Buffer): Promise<{ lines: Set<string>; text: string; pages: number }> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  const out = await parser.getText();
  await parser.destroy();
  return { lines: new Set(out.text.split('\n').map((l) => l.trim())), text: out.text, pages: out.total };
}

describe('the designer’s deliverables from the offsets and sheet pages', () => {
  it('downloads the PDFs, the DXF and the LandXML of the demo bridge, each matching the app’s own numbers', async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 }, acceptDownloads: true })).newPage();
    const errors = trackPageErrors(page);
    await signIn(page, baseUrl, 'engineer@example.com');
    await page.goto(`${baseUrl}/bridges`);
    await page.getByRole('link', { name: 'Marlow Creek Overpass' }).first().click();
    await page.waitForURL(/\/bridges\/\d+$/);
    const id = /\/bridges\/(\d+)$/.exec(page.url())![1];
    await page.goto(`${baseUrl}/bridges/${id}/offsets`);
    await page.getByRole('table', { name: /span 1, left overhang/i }).waitFor();
    await page.screenshot({ path: path.join(shots, 'offsets-exports.png') });
    const table = (await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${id}/offsets`)) as OffsetTable;
    const stored = (await page.evaluate(async (u) => (await fetch(u)).json(), `/api/bridges/${id}`)) as { revision: number; description: BridgeDescription };
    const exterior = table.points.filter((p) => p.side !== 'interior');

    // PDF (pdf-parse): every exterior row exactly as the on-screen table rounds it (decimal feet).
    const offsetsPdf = await pdfLines(await click(page, /Download PDF/));
    for (const p of exterior) {
      const row = [
        p.point,
        stationText(p.station, 'ft'),
        offsetCell(p.offset, 'ft', 'decimal-feet'),
        lengthCell(p.edge_width, 'ft', 'decimal-feet'),
        lengthCell(p.edge_drop, 'ft', 'decimal-feet'),
        elevationCell(p.form_target, 'ft'),
      ].join(' ');
      expect(
        [...offsetsPdf.lines].some((l) => l.startsWith(`${row} `)),
        row,
      ).toBe(true);
    }
    expect(offsetsPdf.text).toContain(`Revision ${stored.revision}`);
    expect(offsetsPdf.text).toContain('CAUTION: GEOMETRY ONLY');

    // DXF (dxf-parser): a POINT at every exterior girder point and edge point, at the engine's x and y.
    const dxf = new DxfParser().parseSync((await click(page, /Plan \(DXF\)/)).toString('utf8')) as unknown as { entities: { type: string; layer: string; position?: { x: number; y: number } }[] };
    const points = dxf.entities.filter((e) => e.type === 'POINT' && e.layer === 'GIRDER-POINT').map((e) => e.position!);
    expect(points.length).toBe(2 * exterior.length);
    for (const p of exterior) {
      expect(points.some((q) => Math.abs(q.x - p.x) <= 1e-6 && Math.abs(q.y - p.y) <= 1e-6)).toBe(true);
      expect(points.some((q) => Math.abs(q.x - (p.edge_x as number)) <= 1e-6 && Math.abs(q.y - (p.edge_y as number)) <= 1e-6)).toBe(true);
    }

    // LandXML (the product's importer): the stored alignment and profile to 1e-9.
    const imported = parseLandXml((await click(page, /LandXML/)).toString('utf8'), 'ft').alignments[0];
    const want = stored.description.alignment;
    expect(Math.abs(imported.alignment.start_x - want.start_x) + Math.abs(imported.alignment.start_y - want.start_y)).toBeLessThanOrEqual(1e-9);
    imported.alignment.elements.forEach((e, i) => expect(Math.abs(e.length - want.elements[i].length)).toBeLessThanOrEqual(1e-9));
    imported.profile!.pvis.forEach((p, i) => expect(Math.abs(p.elevation - stored.description.profile.pvis[i].elevation)).toBeLessThanOrEqual(1e-9));

    // Field sheet PDF: every bracket's tape width, decimal width and form target as the sheet page shows them.
    await page.goto(`${baseUrl}/bridges/${id}/sheet`);
    await page.getByRole('heading', { name: /Field sheet:/ }).waitFor();
    await page.screenshot({ path: path.join(shots, 'sheet-exports.png') });
    const sheetPdf = await pdfLines(await click(page, /Download PDF/));
    for (const p of exterior) {
      const start = [p.point, stationText(p.station, 'ft'), lengthCell(p.edge_width, 'ft', 'feet-inches'), lengthText(p.edge_width, 'ft', false)].join(' ');
      const line = [...sheetPdf.lines].find((l) => l.startsWith(`${start} `) && l.endsWith(` ${lengthText(p.form_target, 'ft', false)}`));
      expect(line, start).toBeDefined();
    }
    expect(sheetPdf.text).toMatch(/Sign-off by span/);
    expect(errors).toEqual([]);
  });
});
