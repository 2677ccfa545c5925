/**
 * The offset table as a PDF: per span, each exterior girder's setting numbers, the deck-edge chord
 * offsets and the bottom of slab over every girder, rounded exactly as the on-screen table rounds
 * them (lib/units table cells over the engine's format helpers).
 */
import type { OffsetPoint, OffsetTable, SpanSummary } from '@/lib/geometry';
import { type DisplayStyle, effectiveStyle, elevationCell, lengthCell, lengthUnit, lengthWithUnit, offsetCell, stationText, type Units } from '@/lib/units';
import { cautionBox, finishSheet, paragraph, startSheet, type Paper, type SheetMeta } from './pdf-document';
import { drawTable, type PdfColumn, type PdfTable } from './pdf-table';

export interface OffsetsPdfInput {
  meta: Omit<SheetMeta, 'kind' | 'unitsText'>;
  table: OffsetTable;
  style: DisplayStyle;
  paper: Paper;
  caution: string;
}

/** Units line of the title block: what the lengths are in and how they are rounded. */
export function offsetsUnitsText(units: Units, style: DisplayStyle): string {
  const s = effectiveStyle(units, style);
  if (s === 'metric') return 'metres, to 0.001 m';
  if (s === 'feet-inches') return 'feet; lengths ft-in to 1/8 in, elevations 0.01 ft';
  return 'feet, to 0.01 ft';
}

/** True when the bridge's deflection table sets any deflection: the screen then adds its columns. */
export function hasDeflections(table: OffsetTable): boolean {
  return table.points.some((p) => typeof p.deflection === 'number' && p.deflection !== 0);
}

function girderTable(span: number, side: 'left' | 'right', rows: OffsetPoint[], units: Units, style: DisplayStyle, summary: SpanSummary | undefined, deflections: boolean): PdfTable {
  const lu = lengthUnit(units, style);
  const base: PdfColumn[] = [
    { label: 'Point', share: 0.6, bold: true },
    { label: 'Station', share: 1.2 },
    { label: `Offset (${lu})`, share: 1.25 },
    { label: `Edge width (${lu})`, share: 1.1, bold: true },
    { label: `Edge drop (${lu})`, share: 1 },
    { label: `Form target (${units})`, share: 1.1 },
    { label: `Top of girder (${units})`, share: 1.1 },
    { label: `Buildup (${lu})`, share: 1 },
    { label: `Drop from girder top (${lu})`, share: 1.2, bold: true },
  ];
  // As on screen: deflection and screed grade after the form target when the bridge has deflections.
  const extra: PdfColumn[] = [
    { label: `Deflection (${lu})`, share: 1 },
    { label: `Screed grade (${units})`, share: 1.1 },
  ];
  const columns = deflections ? [...base.slice(0, 6), ...extra, ...base.slice(6)] : base;
  const sorted = [...rows].sort((a, b) => a.point - b.point);
  const fast = summary?.fastest_change ?? null;
  const girder = sorted[0]?.girder ?? summary?.girder ?? '';
  const note = summary
    ? `Edge width ${lengthCell(summary.min_edge_width, units, style)} to ${lengthWithUnit(summary.max_edge_width, units, style)}` +
      (fast ? ` · changes fastest between points ${fast.from_point} and ${fast.to_point} (${lengthWithUnit(Math.abs(fast.width_change), units, style)}), shaded` : '')
    : undefined;
  return {
    caption: `Span ${span}, ${side} overhang: exterior girder ${girder}`,
    note,
    columns,
    rows: sorted.map((p) => [
      String(p.point),
      stationText(p.station, units),
      offsetCell(p.offset, units, style),
      lengthCell(p.edge_width, units, style),
      lengthCell(p.edge_drop, units, style),
      elevationCell(p.form_target, units),
      ...(deflections ? [lengthCell(p.deflection, units, style), elevationCell(p.screed_grade, units)] : []),
      elevationCell(p.top_of_girder, units),
      lengthCell(p.buildup, units, style),
      lengthCell(p.drop_from_girder_top, units, style),
    ]),
    marked: (r) => fast !== null && (sorted[r].point === fast.from_point || sorted[r].point === fast.to_point),
  };
}

function chordTables(table: OffsetTable, span: number, style: DisplayStyle): PdfTable[] {
  const units = table.units;
  const lu = lengthUnit(units, style);
  return table.chord_offsets
    .filter((c) => c.span === span)
    .sort((a, b) => (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1))
    .map((c) => ({
      caption: `Span ${span}, ${c.side} edge chord: ${lengthWithUnit(c.chord_length, units, style)} in ${c.spaces} spaces`,
      note: 'Offset square to the chord; positive where the edge lies outward of the chord.',
      columns: [
        { label: 'Division', share: 1, bold: true },
        { label: `Along chord (${lu})`, share: 2 },
        { label: `Chord offset (${lu})`, share: 2, bold: true },
      ],
      rows: [...c.offsets].sort((a, b) => a.i - b.i).map((o) => [String(o.i), lengthCell(o.distance, units, style), lengthCell(o.offset, units, style)]),
    }));
}

/** Most girder columns in one bottom-of-slab table; wider bridges get several tables. */
const SLAB_COLUMNS = 10;

const OVER_GIRDERS = {
  bottom_of_slab: 'bottom of slab over every girder',
  screed_grade: 'screed grade (top of deck plus the deflection still to come) over every girder',
} as const;

function slabTables(table: OffsetTable, span: number, field: keyof typeof OVER_GIRDERS = 'bottom_of_slab'): PdfTable[] {
  const points = table.points.filter((p) => p.span === span);
  const girders = [...new Set(points.map((p) => p.girder))];
  const byKey = new Map(points.map((p) => [`${p.girder}\u0000${p.point}`, p]));
  const numbers = [...new Set(points.map((p) => p.point))].sort((a, b) => a - b);
  const out: PdfTable[] = [];
  for (let i = 0; i < girders.length; i += SLAB_COLUMNS) {
    const some = girders.slice(i, i + SLAB_COLUMNS);
    const part = girders.length > SLAB_COLUMNS ? `, girders ${some[0]} to ${some[some.length - 1]}` : '';
    out.push({
      caption: `Span ${span}: ${OVER_GIRDERS[field]} (${table.units})${part}`,
      columns: [{ label: 'Point', share: 0.8, bold: true }, ...some.map((g) => ({ label: g, share: 1 }))],
      rows: numbers.map((k) => [
        String(k),
        ...some.map((g) => {
          const p = byKey.get(`${g}\u0000${k}`);
          return p ? elevationCell(p[field], table.units) : '—';
        }),
      ]),
    });
  }
  return out;
}

/**
 * Lays out the offset-table PDF and returns its bytes. Lengths follow `style` on a feet bridge
 * (metres always on a metric one); elevations stay decimal, as on screen.
 */
export async function offsetsPdf(input: OffsetsPdfInput): Promise<Buffer> {
  const { table } = input;
  const units = table.units;
  const style = effectiveStyle(units, input.style);
  const deflections = hasDeflections(table);
  // Eleven columns with the deflections: landscape keeps them readable.
  const sheet = startSheet({ ...input.meta, kind: 'Offset table', unitsText: offsetsUnitsText(units, style) }, input.paper, deflections ? 'landscape' : 'portrait');
  paragraph(
    sheet,
    `Offsets left (LT) or right (RT) of the alignment. Edge width: girder centreline to deck edge, horizontal and square to the girder. Edge drop: bottom of slab over the girder to the bottom outside edge of the overhang. The form target includes the form settlement allowance. Buildup and drop from girder top appear where the top of girder has been surveyed.`,
    { size: 8.5, gap: 8 },
  );
  if (deflections) {
    paragraph(
      sheet,
      'This bridge has a dead-load deflection table: form targets, buildups and drops from the girder top include the deflection still to come, and the screed grade is the top of deck plus that deflection (set high so the deck ends at grade after the pour).',
      { size: 8.5, gap: 8 },
    );
  }
  cautionBox(sheet, input.caution);
  const exterior = table.points.filter((p) => p.side !== 'interior');
  const spans = [...new Set(table.points.map((p) => p.span))].sort((a, b) => a - b);
  for (const span of spans) {
    paragraph(sheet, `Span ${span}`, { size: 13, bold: true, gap: 4 });
    for (const side of ['left', 'right'] as const) {
      const rows = exterior.filter((p) => p.span === span && p.side === side);
      if (rows.length === 0) continue;
      const summary = table.span_summaries?.find((s) => s.span === span && s.side === side);
      drawTable(sheet, girderTable(span, side, rows, units, style, summary, deflections));
    }
    for (const t of chordTables(table, span, style)) drawTable(sheet, t);
    for (const t of slabTables(table, span)) drawTable(sheet, t);
    if (deflections) for (const t of slabTables(table, span, 'screed_grade')) drawTable(sheet, t);
  }
  return finishSheet(sheet);
}
