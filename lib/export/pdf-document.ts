/**
 * The page frame shared by Chordline's PDF sheets (pdfkit): the shipped Source Sans 3 embedded, a
 * title block at the top of every page (bridge, structure number, revision and its date, units,
 * page n of m) and the geometry-only line at the foot of every page. Content is laid out first with
 * the pages buffered; the frames are drawn at the end, when the page count is known.
 */
import path from 'node:path';
import PDFDocument from 'pdfkit';

export type Paper = 'letter' | 'a4';

/** What the title block says about the sheet; every text already formatted for display. */
export interface SheetMeta {
  /** What the sheet is, e.g. "Offset table" or "Field sheet". */
  kind: string;
  bridgeName: string;
  /** The bridge's structure number; empty or null prints nothing. */
  structureNumber: string | null;
  revision: number;
  /** Date of the revision, already as text. */
  revisionDate: string;
  /** Units line, e.g. "feet; lengths in feet-inches to 1/8 in". */
  unitsText: string;
  /** When the file was made, already as text. */
  printedAt: string;
  /** Optional extra line under the bridge name (e.g. "Span 2"). */
  subtitle?: string;
}

/** Paper sizes in PDF points (1/72 in): US letter 8.5 × 11 in, ISO A4 210 × 297 mm. */
const PAPER_POINTS: Record<Paper, [number, number]> = { letter: [612, 792], a4: [595.28, 841.89] };

const MARGIN = 36;
const TITLE_HEIGHT = 58;
const FOOT_HEIGHT = 22;

/** The default paper for a bridge: letter for a feet bridge, A4 for a metric one. */
export function paperFor(units: 'ft' | 'm', chosen?: Paper | null): Paper {
  return chosen ?? (units === 'm' ? 'a4' : 'letter');
}

/** The one line carried at the foot of every page. */
export const FOOT_CAUTION = 'Geometry only: check every number against the plans before use. The engineer of record and the agency decide.';

const FONT_DIR = path.join(process.cwd(), 'node_modules', '@fontsource', 'source-sans-3', 'files');
/** Font names registered on every sheet. */
export const FONT = { regular: 'SourceSans3', bold: 'SourceSans3-Semibold' } as const;

/** Where the content of a page may go (points, origin top left). */
export interface ContentBox {
  left: number;
  top: number;
  width: number;
  bottom: number;
}

export interface Sheet {
  doc: PDFKit.PDFDocument;
  box: ContentBox;
  meta: SheetMeta;
}

/**
 * Starts a sheet: pdfkit document with pages buffered, the fonts registered, the first page open
 * and the cursor at the top of the content box.
 */
export function startSheet(meta: SheetMeta, paper: Paper, layout: 'portrait' | 'landscape'): Sheet {
  const [w, h] = PAPER_POINTS[paper];
  const size = layout === 'landscape' ? [h, w] : [w, h];
  // font: null keeps pdfkit from loading its built-in Helvetica; only Source Sans 3 is used.
  const doc = new PDFDocument({
    size,
    margin: MARGIN,
    bufferPages: true,
    autoFirstPage: false,
    font: null as unknown as string,
    info: { Title: `${meta.kind}: ${meta.bridgeName}`, Creator: 'Chordline', Subject: `Revision ${meta.revision}` },
  });
  doc.registerFont(FONT.regular, path.join(FONT_DIR, 'source-sans-3-latin-400-normal.woff'));
  doc.registerFont(FONT.bold, path.join(FONT_DIR, 'source-sans-3-latin-600-normal.woff'));
  doc.addPage();
  doc.font(FONT.regular);
  const box = { left: MARGIN, top: MARGIN + TITLE_HEIGHT + 10, width: size[0] - 2 * MARGIN, bottom: size[1] - MARGIN - FOOT_HEIGHT };
  doc.y = box.top;
  doc.x = box.left;
  return { doc, box, meta };
}

/** A new page with the cursor at the top of its content box. */
export function newPage(sheet: Sheet): void {
  sheet.doc.addPage();
  sheet.doc.x = sheet.box.left;
  sheet.doc.y = sheet.box.top;
}

/** Makes room for `height` points: a new page when the rest of this one is shorter. */
export function ensureRoom(sheet: Sheet, height: number): void {
  if (sheet.doc.y + height > sheet.box.bottom) newPage(sheet);
}

function drawTitleBlock(sheet: Sheet, page: number, pages: number): void {
  const { doc, box, meta } = sheet;
  const top = MARGIN;
  doc.save();
  doc.lineWidth(0.8).strokeColor('#333333').rect(box.left, top, box.width, TITLE_HEIGHT).stroke();
  const split = box.left + box.width * 0.58;
  doc
    .moveTo(split, top)
    .lineTo(split, top + TITLE_HEIGHT)
    .stroke();
  doc
    .fillColor('#555555')
    .font(FONT.regular)
    .fontSize(7.5)
    .text(`CHORDLINE · ${meta.kind.toUpperCase()}`, box.left + 6, top + 5, { lineBreak: false });
  doc
    .fillColor('#000000')
    .font(FONT.bold)
    .fontSize(13)
    .text(meta.bridgeName, box.left + 6, top + 15, { width: split - box.left - 12, height: 17, ellipsis: true, lineBreak: false });
  const second = [meta.structureNumber ? `Structure no. ${meta.structureNumber}` : null, meta.subtitle ?? null].filter(Boolean).join(' · ');
  if (second)
    doc
      .font(FONT.regular)
      .fontSize(9)
      .text(second, box.left + 6, top + 34, { width: split - box.left - 12, lineBreak: false });
  const rx = split + 6;
  const rw = box.left + box.width - rx - 6;
  doc
    .font(FONT.bold)
    .fontSize(9)
    .text(`Revision ${meta.revision}`, rx, top + 5, { width: rw, lineBreak: false });
  doc.font(FONT.regular).fontSize(8.5);
  doc.text(`of ${meta.revisionDate}`, rx, top + 17, { width: rw, lineBreak: false });
  doc.text(`Units: ${meta.unitsText}`, rx, top + 29, { width: rw, height: 11, ellipsis: true, lineBreak: false });
  doc.font(FONT.bold).text(`Page ${page} of ${pages}`, rx, top + 42, { width: rw, lineBreak: false });
  doc.restore();
}

function drawFoot(sheet: Sheet): void {
  const { doc, box, meta } = sheet;
  const y = box.bottom + 8;
  doc.save();
  doc
    .lineWidth(0.5)
    .strokeColor('#999999')
    .moveTo(box.left, y - 3)
    .lineTo(box.left + box.width, y - 3)
    .stroke();
  doc.fillColor('#333333').font(FONT.regular).fontSize(7.5);
  doc.text(FOOT_CAUTION, box.left, y, { width: box.width * 0.75, lineBreak: false });
  doc.text(`Made ${meta.printedAt}`, box.left + box.width * 0.75, y, { width: box.width * 0.25, align: 'right', lineBreak: false });
  doc.restore();
}

/** Draws the title block and foot on every page, ends the document and returns its bytes. */
export function finishSheet(sheet: Sheet): Promise<Buffer> {
  const { doc } = sheet;
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // Drawing in the margins must not move onto a new page.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    drawTitleBlock(sheet, i - range.start + 1, range.count);
    drawFoot(sheet);
    doc.page.margins.bottom = bottom;
  }
  doc.end();
  return done;
}

/**
 * A paragraph in the content box, on a new page when it does not fit on this one.
 * @param size font size in points.
 */
export function paragraph(sheet: Sheet, text: string, options: { size?: number; bold?: boolean; color?: string; gap?: number } = {}): void {
  const { doc, box } = sheet;
  doc.font(options.bold ? FONT.bold : FONT.regular).fontSize(options.size ?? 9);
  const height = doc.heightOfString(text, { width: box.width });
  ensureRoom(sheet, height);
  doc.fillColor(options.color ?? '#000000').text(text, box.left, doc.y, { width: box.width });
  doc.fillColor('#000000');
  doc.y += options.gap ?? 4;
}

/** The full geometry-only caution in a bordered box (domain "Cautions the product must carry"). */
export function cautionBox(sheet: Sheet, caution: string): void {
  const { doc, box } = sheet;
  doc.font(FONT.regular).fontSize(8.5);
  const body = doc.heightOfString(caution, { width: box.width - 16 });
  const height = body + 24;
  ensureRoom(sheet, height);
  const y = doc.y;
  doc.save().lineWidth(1).strokeColor('#b45309').fillColor('#fff7e6').rect(box.left, y, box.width, height).fillAndStroke().restore();
  doc
    .fillColor('#92400e')
    .font(FONT.bold)
    .fontSize(8.5)
    .text('CAUTION: GEOMETRY ONLY', box.left + 8, y + 6, { lineBreak: false });
  doc
    .fillColor('#000000')
    .font(FONT.regular)
    .text(caution, box.left + 8, y + 17, { width: box.width - 16 });
  doc.y = y + height + 8;
}
