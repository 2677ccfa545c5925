/**
 * A plain ruled table for the PDF sheets: a caption, a header row repeated at the top of every page
 * the table runs onto, and one line per row. Cells are text already rounded for display.
 */
import { ensureRoom, FONT, newPage, type Sheet } from './pdf-document';

export interface PdfColumn {
  label: string;
  /** Share of the content width (the shares of a table are scaled to fill it). */
  share: number;
  align?: 'left' | 'right' | 'center';
  bold?: boolean;
  /** A blank column for the field to fill in: white, ruled, never holds text. */
  blank?: boolean;
}

export interface PdfTable {
  caption: string;
  /** A second, smaller caption line (e.g. the edge-width range). */
  note?: string;
  columns: PdfColumn[];
  rows: string[][];
  /** Rows to shade (e.g. where the edge width changes fastest). */
  marked?: (row: number) => boolean;
}

const ROW = 13;
const HEAD = 25;
const FONT_SIZE = 8.5;

function widths(sheet: Sheet, columns: PdfColumn[]): number[] {
  const total = columns.reduce((s, c) => s + c.share, 0);
  return columns.map((c) => (sheet.box.width * c.share) / total);
}

function caption(sheet: Sheet, table: PdfTable, continued: boolean): void {
  const { doc, box } = sheet;
  doc
    .fillColor('#000000')
    .font(FONT.bold)
    .fontSize(10)
    .text(`${table.caption}${continued ? ' (continued)' : ''}`, box.left, doc.y, { width: box.width, lineBreak: false });
  doc.y += 13;
  if (table.note && !continued) {
    doc.font(FONT.regular).fontSize(8).fillColor('#333333').text(table.note, box.left, doc.y, { width: box.width, lineBreak: false });
    doc.fillColor('#000000');
    doc.y += 11;
  }
}

function header(sheet: Sheet, table: PdfTable, w: number[]): void {
  const { doc, box } = sheet;
  const y = doc.y;
  doc.save().fillColor('#e7e5e4').rect(box.left, y, box.width, HEAD).fill().restore();
  let x = box.left;
  doc.font(FONT.bold).fontSize(7.5).fillColor('#000000');
  table.columns.forEach((c, i) => {
    doc.text(c.label, x + 2, y + 3, { width: w[i] - 4, align: c.blank ? 'left' : (c.align ?? 'right'), lineGap: -1 });
    x += w[i];
  });
  rule(sheet, y, HEAD, w);
  doc.y = y + HEAD;
}

function rule(sheet: Sheet, y: number, height: number, w: number[]): void {
  const { doc, box } = sheet;
  doc.save().lineWidth(0.4).strokeColor('#8a8580');
  doc.rect(box.left, y, box.width, height).stroke();
  let x = box.left;
  for (let i = 0; i < w.length - 1; i++) {
    x += w[i];
    doc
      .moveTo(x, y)
      .lineTo(x, y + height)
      .stroke();
  }
  doc.restore();
}

/**
 * Draws a table from the cursor down, onto new pages as needed; the caption (marked "continued")
 * and the header row are repeated on every page. Leaves the cursor under the table.
 */
export function drawTable(sheet: Sheet, table: PdfTable): void {
  const { doc, box } = sheet;
  const w = widths(sheet, table.columns);
  const captionHeight = 13 + (table.note ? 11 : 0);
  // Caption, header and at least three rows (or all of them) stay together.
  ensureRoom(sheet, captionHeight + HEAD + ROW * Math.min(3, Math.max(1, table.rows.length)));
  caption(sheet, table, false);
  header(sheet, table, w);
  table.rows.forEach((cells, r) => {
    if (doc.y + ROW > box.bottom) {
      newPage(sheet);
      caption(sheet, table, true);
      header(sheet, table, w);
    }
    const y = doc.y;
    if (table.marked?.(r)) doc.save().fillColor('#fde68a').rect(box.left, y, box.width, ROW).fill().restore();
    else if (r % 2 === 1) doc.save().fillColor('#f5f5f4').rect(box.left, y, box.width, ROW).fill().restore();
    let x = box.left;
    table.columns.forEach((c, i) => {
      if (c.blank) {
        doc
          .save()
          .fillColor('#ffffff')
          .rect(x + 0.5, y + 0.5, w[i] - 1, ROW - 1)
          .fill()
          .restore();
      } else {
        doc
          .font(c.bold ? FONT.bold : FONT.regular)
          .fontSize(FONT_SIZE)
          .fillColor('#000000');
        doc.text(cells[i] ?? '', x + 3, y + 2.5, { width: w[i] - 6, align: c.align ?? 'right', lineBreak: false });
      }
      x += w[i];
    });
    rule(sheet, y, ROW, w);
    doc.y = y + ROW;
  });
  doc.y += 10;
}
