/**
 * The offset table and field sheet as PDF, read back with pdf-parse (an independent PDF reader from
 * the registry, built on Mozilla's pdf.js): every number a crew sets is in the file exactly as the
 * on-screen table rounds it, with the revision, the caution and a title block on every page.
 */
import { NextRequest } from 'next/server';
import { PDFParse } from 'pdf-parse';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import type { BridgeDescription, OffsetTable } from '@/lib/geometry';
import { elevationCell, lengthCell, lengthText, offsetCell, stationText, type DisplayStyle } from '@/lib/units';
import { SHEET_CAUTION } from '@/lib/services/field-sheet';
import * as offsetsPdf from '@/app/api/bridges/[id]/offsets.pdf/route';
import * as sheetPdf from '@/app/api/bridges/[id]/field-sheet.pdf/route';
import * as offsets from '@/app/api/bridges/[id]/offsets/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as signoffs from '@/app/api/bridges/[id]/signoffs/route';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge } from './field-helpers';
import { metricCopy } from './export-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
beforeAll(async () => {
  people = await makeUsers();
});

type Handler = (req: NextRequest, ctx: { params: Promise<{ id: string }> }) => Promise<Response>;

/** GETs a PDF route as the crew and reads it with pdf-parse: text per page, page sizes, headers. */
async function readPdf(handler: unknown, id: string, query = '') {
  const req = new NextRequest(new URL(`/api/bridges/${id}/x.pdf${query}`, 'http://localhost:3000'), { headers: { cookie: people.crew.cookie } });
  const res = await (handler as Handler)(req, { params: Promise.resolve({ id }) });
  const bytes = new Uint8Array(await res.arrayBuffer());
  if (res.status !== 200) throw new Error(`${res.status}: ${Buffer.from(bytes).toString()}`);
  const parser = new PDFParse({ data: bytes.slice() });
  const text = await parser.getText();
  const info = await parser.getInfo({ parsePageInfo: true });
  await parser.destroy();
  const lines = new Set(text.pages.flatMap((p) => p.text.split('\n').map((l) => l.trim())));
  return { res, bytes, pages: text.pages.map((p) => p.text), lines, sizes: (info.pages ?? []).map((p) => [p.width, p.height]), all: text.text };
}

const squash = (s: string) => s.replace(/\s+/g, ' ').trim();

async function tableOf(id: string): Promise<OffsetTable> {
  const res = await call(offsets.GET, { cookie: people.crew.cookie, params: { id } });
  expect(res.status).toBe(200);
  return res.json as OffsetTable;
}

/** The girder-point row as the on-screen GirderPointTable renders it (lib/units table cells). */
function screenRow(p: OffsetTable['points'][number], units: 'ft' | 'm', style: DisplayStyle, deflections = false): string {
  return [
    String(p.point),
    stationText(p.station, units),
    offsetCell(p.offset, units, style),
    lengthCell(p.edge_width, units, style),
    lengthCell(p.edge_drop, units, style),
    elevationCell(p.form_target, units),
    // With a deflection table the screen adds the deflection and the screed grade after the form target.
    ...(deflections ? [lengthCell(p.deflection, units, style), elevationCell(p.screed_grade, units)] : []),
    elevationCell(p.top_of_girder, units),
    lengthCell(p.buildup, units, style),
    lengthCell(p.drop_from_girder_top, units, style),
  ].join(' ');
}

describe('GET /api/bridges/:id/offsets.pdf', () => {
  it('holds every exterior girder point row as the screen rounds it, in decimal feet and in feet-inches', async () => {
    const id = await demoBridge(people.engineer);
    const table = await tableOf(id);
    const exterior = table.points.filter((p) => p.side !== 'interior');
    expect(exterior.length).toBeGreaterThan(100);
    for (const style of ['decimal-feet', 'feet-inches'] as const) {
      // pdf-parse (pdf.js text layer) returns each table row as one line of its cells.
      const pdf = await readPdf(offsetsPdf.GET, id, `?style=${style}`);
      for (const p of exterior) expect(pdf.lines.has(screenRow(p, 'ft', style)), `${style} span ${p.span} ${p.girder} point ${p.point}`).toBe(true);
    }
  });

  it('answers a PDF attachment, never cached, with the fonts embedded and a title block on every page', async () => {
    const id = await demoBridge(people.engineer);
    const pdf = await readPdf(offsetsPdf.GET, id);
    expect(pdf.res.headers.get('content-type')).toBe('application/pdf');
    expect(pdf.res.headers.get('content-disposition')).toMatch(/^attachment; filename=".*-rev1-offsets\.pdf"$/);
    expect(pdf.res.headers.get('cache-control')).toBe('no-store');
    expect(Buffer.from(pdf.bytes.subarray(0, 5)).toString('latin1')).toBe('%PDF-');
    // The embedded font program is Source Sans 3 (PDF 1.7 §9.8: FontName of the font descriptor).
    expect(Buffer.from(pdf.bytes).toString('latin1')).toMatch(/\/FontName \/[A-Z]{6}\+SourceSans3-Regular/);
    const n = pdf.pages.length;
    expect(n).toBeGreaterThan(2);
    pdf.pages.forEach((page, i) => {
      expect(page).toContain('Revision 1');
      expect(page).toContain(`Page ${i + 1} of ${n}`);
      expect(page).toMatch(/Field test \d+/);
      // Headers repeat on every page that carries a table.
      expect(page).toMatch(/Point Station|Division|Point G1/);
    });
    expect(squash(pdf.all)).toContain(squash(SHEET_CAUTION));
    expect(pdf.sizes.every(([w, h]) => w === 612 && h === 792)).toBe(true); // US letter, 8.5 × 11 in at 72 pt/in
  });

  it('names the current revision after a new one is saved', async () => {
    const id = await demoBridge(people.engineer);
    const changed = { ...demoBridges[0], deck: { ...demoBridges[0].deck, right_edge_offset: 21.5 } };
    const saved = await call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: changed, note: 'Wider right overhang' } });
    expect(saved.status).toBe(201);
    const pdf = await readPdf(offsetsPdf.GET, id);
    expect(pdf.pages.every((p) => p.includes('Revision 2'))).toBe(true);
    expect(pdf.all).not.toContain('Revision 1');
    const table = await tableOf(id);
    const right = table.points.filter((p) => p.side === 'right');
    for (const p of right) expect(pdf.lines.has(screenRow(p, 'ft', 'decimal-feet'))).toBe(true);
  });

  it('adds the deflection and screed-grade columns, as the screen does, when the bridge has a deflection table', async () => {
    const deflections = [1, 2, 3].flatMap((span) => ['G1', 'G5'].map((girder) => ({ girder, span, values: [0, 0.03, 0.05, 0.06, 0.05, 0.03, 0] })));
    const id = await demoBridge(people.engineer, { ...demoBridges[0], deflections });
    const table = await tableOf(id);
    expect(table.points.some((p) => p.deflection > 0)).toBe(true);
    const pdf = await readPdf(offsetsPdf.GET, id, '?style=feet-inches');
    for (const p of table.points.filter((q) => q.side !== 'interior')) expect(pdf.lines.has(screenRow(p, 'ft', 'feet-inches', true)), `${p.span} ${p.girder} ${p.point}`).toBe(true);
    expect(pdf.all).toContain('screed grade (top of deck plus the deflection still to come) over every girder');
  });

  it('grows by pages as the table grows', async () => {
    const small = await demoBridge(people.engineer, { ...demoBridges[0], points_per_span: 10, top_of_girder: [] });
    const large = await demoBridge(people.engineer, { ...demoBridges[0], points_per_span: 60, top_of_girder: [] });
    const a = await readPdf(offsetsPdf.GET, small);
    const b = await readPdf(offsetsPdf.GET, large);
    expect(b.pages.length).toBeGreaterThan(a.pages.length + 3);
  });

  it('prints a metric bridge in metres on A4, and letter when asked', async () => {
    const id = await demoBridge(people.engineer, metricCopy(demoBridges[0] as BridgeDescription));
    const table = await tableOf(id);
    const pdf = await readPdf(offsetsPdf.GET, id, '?style=feet-inches');
    for (const p of table.points.filter((q) => q.side !== 'interior')) expect(pdf.lines.has(screenRow(p, 'm', 'metric'))).toBe(true);
    expect(pdf.sizes.every(([w, h]) => Math.abs(w - 595.28) < 0.01 && Math.abs(h - 841.89) < 0.01)).toBe(true); // ISO 216 A4, 210 × 297 mm
    const letter = await readPdf(offsetsPdf.GET, id, '?paper=letter');
    expect(letter.sizes.every(([w, h]) => w === 612 && h === 792)).toBe(true);
  });

  it('refuses a bad query with field errors, a stranger with 401 and an unknown bridge with 404', async () => {
    const id = await demoBridge(people.engineer);
    const bad = await call(offsetsPdf.GET, { cookie: people.crew.cookie, params: { id }, path: `/api/bridges/${id}/offsets.pdf?paper=legal` });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.paper).toBeDefined();
    expect((await call(offsetsPdf.GET, { params: { id } })).status).toBe(401);
    expect((await call(offsetsPdf.GET, { cookie: people.crew.cookie, params: { id: '999999' } })).status).toBe(404);
  });
});

describe('GET /api/bridges/:id/field-sheet.pdf', () => {
  it('holds every bracket with its edge width and form target as the sheet page shows them, and each span’s sign-off', async () => {
    const id = await demoBridge(people.engineer);
    const table = await tableOf(id);
    const span1 = table.points.filter((p) => p.span === 1 && p.side !== 'interior');
    // Pass every check of span 1 (within a few thousandths), then sign it off.
    for (const p of span1) {
      const body = {
        span: 1,
        girder: p.girder,
        point: p.point,
        measured_edge_width: (p.edge_width as number) + 0.003,
        ...(p.drop_from_girder_top !== null ? { measured_drop_from_girder_top: p.drop_from_girder_top - 0.004 } : {}),
      };
      expect((await call(checks.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body })).status).toBe(201);
    }
    expect((await call(signoffs.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { span: 1 } })).status).toBe(201);

    const pdf = await readPdf(sheetPdf.GET, id);
    expect(pdf.res.headers.get('content-disposition')).toMatch(/-rev1-field-sheet\.pdf"$/);
    const num = (v: number | null) => (v === null ? '—' : lengthText(v, 'ft', false));
    for (const p of table.points.filter((q) => q.side !== 'interior')) {
      // The sheet row: point, station, tape width, decimal width, reading, rods, extra, form target.
      const line = [...pdf.lines].find((l) => l.startsWith(`${p.point} ${stationText(p.station, 'ft')} `));
      expect(line, `span ${p.span} ${p.girder} ${p.point}`).toBeDefined();
      const rows = [...pdf.lines].filter((l) => l.startsWith(`${p.point} ${stationText(p.station, 'ft')} ${lengthCell(p.edge_width, 'ft', 'feet-inches')} ${num(p.edge_width)} `));
      expect(rows.some((l) => l.endsWith(` ${num(p.form_target)}`))).toBe(true);
    }
    // Span 2 has every width and every surveyed reading still to check (the sign-off rule of the field work).
    const span2 = table.points.filter((p) => p.span === 2 && p.side !== 'interior');
    const missing2 = span2.length + span2.filter((p) => p.drop_from_girder_top !== null).length;
    expect(pdf.all).toMatch(new RegExp(`1 ${span1.length} Signed off by Test inspector on .* at revision 1`));
    expect(pdf.all).toContain(`2 ${span2.length} Not signed off: ${missing2} checks still to pass`);
    expect(squash(pdf.all)).toContain(squash(SHEET_CAUTION));
    pdf.pages.forEach((page, i) => expect(page).toContain(`Page ${i + 1} of ${pdf.pages.length}`));
    // Landscape letter: 11 × 8.5 in.
    expect(pdf.sizes.every(([w, h]) => w === 792 && h === 612)).toBe(true);
  });

  it('gives one span when asked and refuses a span the bridge lacks', async () => {
    const id = await demoBridge(people.engineer);
    const one = await readPdf(sheetPdf.GET, id, '?span=2');
    expect(one.all).toContain('Span 2 · G1');
    expect(one.all).not.toContain('Span 1 · G1');
    const bad = await call(sheetPdf.GET, { cookie: people.crew.cookie, params: { id }, path: `/api/bridges/${id}/field-sheet.pdf?span=9` });
    expect(bad.status).toBe(400);
  });
});
