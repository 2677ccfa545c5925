/**
 * The field sheet as a PDF: the sign-off state of each span, then per span and exterior girder one
 * row per bracket with the numbers the crew sets and blank columns for what the inspector measures.
 * Numbers are rounded as the field sheet page shows them (lib/units).
 */
import { dateTimeText, lengthText, stationText, type Units } from '@/lib/units';
import { cautionBox, finishSheet, paragraph, startSheet, type Paper, type SheetMeta } from './pdf-document';
import { drawTable, type PdfColumn, type PdfTable } from './pdf-table';

/** One bracket row as the field sheet service gives it (lengths in the bridge's units). */
export interface SheetPdfRow {
  point: number;
  station: number;
  edge_width: number;
  /** Edge width as the crew tapes it: feet-inches to 1/8 in, or metres with unit. */
  edge_width_text: string;
  form_target: number;
  /** Dead-load deflection still to come at the girder point (bridge units, positive down). */
  deflection?: number;
  /** Top of deck over the girder plus the deflection (bridge units, elevation). */
  screed_grade?: number;
  reading: number | null;
  girder_rod: number | null;
  form_rod: number | null;
  extra_rod: number | null;
}

export interface SheetPdfGroup {
  span: number;
  girder: string;
  side: 'left' | 'right';
  rows: SheetPdfRow[];
}

/** Sign-off state of one span, as the sign-off service reports it. */
export interface SpanSignOffState {
  span: number;
  brackets: number;
  ready: boolean;
  missing: number;
  signoff: { by: string | null; revision: number; created_at: string; out_of_date: boolean; note: string } | null;
}

export interface FieldSheetPdfInput {
  meta: Omit<SheetMeta, 'kind' | 'unitsText'>;
  units: Units;
  baseRodLength: number;
  groups: SheetPdfGroup[];
  spans: SpanSignOffState[];
  currentRevision: number;
  paper: Paper;
  caution: string;
  rodDefinition: string;
  /** Given when the bridge has a deflection table: what the deflection and screed-grade columns mean; the columns are added. */
  deflectionDefinition?: string;
}

/** One sentence on where a span stands with its sign-off. */
export function signOffText(s: SpanSignOffState, currentRevision: number): string {
  const still = s.missing === 1 ? '1 check still to pass' : `${s.missing} checks still to pass`;
  if (s.signoff && !s.signoff.out_of_date) {
    return `Signed off by ${s.signoff.by ?? 'a removed user'} on ${dateTimeText(s.signoff.created_at)} at revision ${s.signoff.revision}${s.signoff.note ? ` (“${s.signoff.note.length > 80 ? `${s.signoff.note.slice(0, 79)}…` : s.signoff.note}”)` : ''}`;
  }
  const now = s.ready ? 'every check passes; ready to sign off' : still;
  if (s.signoff) {
    return `Not signed off at revision ${currentRevision}: the sign-off of ${dateTimeText(s.signoff.created_at)} was at revision ${s.signoff.revision}; ${now}`;
  }
  return `Not signed off: ${now}`;
}

function groupTable(g: SheetPdfGroup, units: Units, deflections: boolean): PdfTable {
  const num = (v: number | null) => (v === null ? '—' : lengthText(v, units, false));
  const columns: PdfColumn[] = [
    { label: 'Pt', share: 0.45, bold: true },
    { label: 'Station', share: 1 },
    { label: `Edge width (${units === 'ft' ? 'ft-in' : 'm'})`, share: 1, bold: true },
    ...(units === 'ft' ? [{ label: 'Edge width (ft)', share: 0.85 }] : []),
    { label: `Level-bar reading (${units})`, share: 0.95, bold: true },
    { label: `Girder rod (${units})`, share: 0.85 },
    { label: `Form rod (${units})`, share: 0.85 },
    { label: `Extra on both (${units})`, share: 0.85 },
    { label: `Form target elev. (${units})`, share: 1 },
    ...(deflections
      ? [
          { label: `Deflection (${units})`, share: 0.85 },
          { label: `Screed grade (${units})`, share: 1 },
        ]
      : []),
    { label: 'Measured width', share: 1, blank: true },
    { label: 'Measured reading', share: 1, blank: true },
    { label: 'OK / initials', share: 0.85, blank: true },
  ];
  return {
    caption: `Span ${g.span} · ${g.girder} · ${g.side === 'left' ? 'left (LT)' : 'right (RT)'} overhang`,
    columns,
    rows: [...g.rows]
      .sort((a, b) => a.point - b.point)
      .map((r) => [
        String(r.point),
        stationText(r.station, units),
        r.edge_width_text.replace(/ m$/, ''),
        ...(units === 'ft' ? [num(r.edge_width)] : []),
        r.reading === null ? 'not surveyed' : num(r.reading),
        num(r.girder_rod),
        num(r.form_rod),
        num(r.extra_rod),
        num(r.form_target),
        ...(deflections ? [num(r.deflection ?? 0), num(r.screed_grade ?? null)] : []),
        '',
        '',
        '',
      ]),
  };
}

/** Lays out the field-sheet PDF (landscape, for the blank columns) and returns its bytes. */
export async function fieldSheetPdf(input: FieldSheetPdfInput): Promise<Buffer> {
  const { units } = input;
  const unitsText = units === 'm' ? 'metres, to 0.001 m' : 'feet, to 0.01 ft; edge widths also ft-in to 1/8 in';
  const sheet = startSheet({ ...input.meta, kind: 'Field sheet', unitsText }, input.paper, 'landscape');
  paragraph(
    sheet,
    `Edge width: girder centreline to deck edge, horizontal and square to the girder; measure it from a string line between the girder's end centres, not from the girder. Form target: elevation of the form's bottom outside edge, settlement allowance included. Level-bar reading: top of girder minus form target, shown only where the top of girder was surveyed. Base rod ${lengthText(input.baseRodLength, units)}.`,
    { size: 8.5, gap: 3 },
  );
  paragraph(sheet, input.rodDefinition, { size: 8.5, gap: input.deflectionDefinition ? 3 : 8 });
  if (input.deflectionDefinition) paragraph(sheet, input.deflectionDefinition, { size: 8.5, gap: 8 });
  cautionBox(sheet, input.caution);
  drawTable(sheet, {
    caption: `Sign-off by span (geometry revision ${input.currentRevision})`,
    columns: [
      { label: 'Span', share: 0.5, bold: true, align: 'left' },
      { label: 'Brackets', share: 0.6 },
      { label: 'Sign-off', share: 8, align: 'left' },
    ],
    rows: input.spans.map((s) => [String(s.span), String(s.brackets), signOffText(s, input.currentRevision)]),
  });
  for (const g of input.groups) drawTable(sheet, groupTable(g, units, Boolean(input.deflectionDefinition)));
  if (input.groups.length === 0) paragraph(sheet, 'This revision has no exterior girder points.', { size: 10 });
  return finishSheet(sheet);
}
