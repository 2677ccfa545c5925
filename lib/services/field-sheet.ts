/**
 * The field sheet: per span and exterior girder, the numbers a crew sets at each bracket and blank
 * columns for what the inspector measures. Built from the offset table of the bridge's latest revision.
 */
import { z } from 'zod';
import type { OffsetTable } from '@/lib/geometry';
import { ValidationError } from '@/lib/errors';
import { offsetsForBridge } from './offsets';
import { fieldSettingsOf } from './tolerances';
import { csvCell } from '@/lib/geometry';
import { lengthText, stationText, tapeLength, type Units } from '@/lib/units';

/** The caution printed on every field sheet (domain.md, "Cautions the product must carry"). */
export const SHEET_CAUTION =
  "Geometry only. Overhang brackets carry wet concrete, the finishing machine rail and workers at the deck edge: bracket capacity, spacing, tie-back and fall protection follow the contractor's engineered falsework design, the bracket maker's limits, the agency's specifications and local codes. The engineer of record and the agency decide. Check every number against the plans before use.";

/** Plain definition of the level-bar rods, printed on the sheet and in the e-mail. */
export const ROD_DEFINITION =
  'Level bar: a bar laid level across the overhang with a rod at each end. The girder rod stands on the top of the girder; the form rod reaches down to the bottom outside edge of the form. Form rod minus girder rod is the level-bar reading (top of girder minus form target). The girder rod is the base length; when the reading is negative the form rod would be shorter than the base (or negative), so both rods get the same extra length, shown.';

/** What the deflection and screed-grade columns mean, printed when the bridge has deflections (domain.md, "Dead-load deflection", "Screed grade"). */
export const DEFLECTION_DEFINITION =
  "Deflection: the dead-load deflection the girder will still undergo when the deck is poured (from the plans' deflection table); form targets and level-bar readings include it, so the forms are set that much high. Screed grade: top of deck over the girder plus the deflection, the grade the screed strikes before the pour so that the deck ends at grade.";

/**
 * Rod lengths of a level bar for one reading.
 * @param reading drop from girder top to form target (bridge units; positive when the form edge is lower).
 * @param baseRod the shortest rod (bridge units, > 0).
 * @returns girder rod and form rod (bridge units, both ≥ baseRod) and the extra length added to both
 *   (0 when the reading is zero or positive). formRod − girderRod = reading always.
 */
export function levelBarRods(reading: number, baseRod: number): { girderRod: number; formRod: number; extra: number } {
  const extra = reading < 0 ? -reading : 0;
  return { girderRod: baseRod + extra, formRod: baseRod + reading + extra, extra };
}

export type SheetRow = {
  point: number;
  fraction: number;
  station: number;
  /** Edge width (bridge units) and its display text (feet-inches to 1/8" for feet bridges). */
  edge_width: number;
  edge_width_text: string;
  edge_width_decimal_text: string;
  form_target: number;
  /** Dead-load deflection still to come at the girder point (positive down; 0 without a deflection table). */
  deflection: number;
  /** Top of deck over the girder plus the deflection: the grade the screed strikes before the pour. */
  screed_grade: number;
  top_of_girder: number | null;
  buildup: number | null;
  /** Level-bar reading (drop from girder top), null where the top of girder was not surveyed. */
  reading: number | null;
  girder_rod: number | null;
  form_rod: number | null;
  extra_rod: number | null;
};

export type SheetGroup = { span: number; girder: string; side: 'left' | 'right'; rows: SheetRow[] };

export type FieldSheet = {
  bridge: { id: number; name: string };
  units: Units;
  revision: number;
  base_rod_length: number;
  span: number | null;
  spans: number[];
  groups: SheetGroup[];
  /** The bridge has a deflection table: the sheet shows the deflection and screed-grade columns. */
  deflections?: boolean;
  caution: string;
  rod_definition: string;
};

/** A length without its unit, as the CSV and the sheet's decimal column show it. */
const decimal = (v: number, units: Units) => lengthText(v, units, false);

/**
 * Groups the exterior-girder rows of an offset table into field-sheet tables (pure). `span` limits
 * the sheet to one span; null gives every span.
 */
export function buildSheetGroups(table: OffsetTable, baseRod: number, span: number | null): SheetGroup[] {
  const groups = new Map<string, SheetGroup>();
  for (const p of table.points) {
    if (p.side === 'interior' || p.edge_width === null || p.form_target === null) continue;
    if (span !== null && p.span !== span) continue;
    const key = `${p.span}|${p.girder}`;
    let g = groups.get(key);
    if (!g) groups.set(key, (g = { span: p.span, girder: p.girder, side: p.side, rows: [] }));
    const rods = p.drop_from_girder_top === null ? null : levelBarRods(p.drop_from_girder_top, baseRod);
    g.rows.push({
      point: p.point,
      fraction: p.fraction,
      station: p.station,
      edge_width: p.edge_width,
      edge_width_text: tapeLength(p.edge_width, table.units),
      edge_width_decimal_text: lengthText(p.edge_width, table.units),
      form_target: p.form_target,
      deflection: p.deflection ?? 0,
      screed_grade: p.screed_grade ?? p.top_of_deck,
      top_of_girder: p.top_of_girder,
      buildup: p.buildup,
      reading: p.drop_from_girder_top,
      girder_rod: rods ? rods.girderRod : null,
      form_rod: rods ? rods.formRod : null,
      extra_rod: rods ? rods.extra : null,
    });
  }
  const out = [...groups.values()];
  for (const g of out) g.rows.sort((a, b) => a.point - b.point);
  // Left girder first within a span, as the sheet is read looking up-station.
  return out.sort((a, b) => a.span - b.span || (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1));
}

/**
 * The field sheet as CSV: two "# " lines, each one cell (bridge, revision, base rod; the caution), then a header row
 * and one row per bracket. Lengths in display units (0.01 ft or 0.001 m; widths also in feet-inches
 * to 1/8" for feet bridges); the measured columns are left blank for the field.
 */
export function fieldSheetCsv(sheet: FieldSheet): string {
  const u = sheet.units;
  const header = [
    'span',
    'girder',
    'side',
    'point',
    'station',
    ...(u === 'ft' ? ['edge_width_ft_in'] : []),
    `edge_width_${u}`,
    `level_bar_reading_${u}`,
    `girder_rod_${u}`,
    `form_rod_${u}`,
    `extra_rod_${u}`,
    `form_target_${u}`,
    ...(sheet.deflections ? [`deflection_${u}`, `screed_grade_${u}`] : []),
    `measured_edge_width_${u}`,
    `measured_reading_${u}`,
    'revision',
  ];
  const opt = (v: number | null) => (v === null ? '' : decimal(v, u));
  // The two leading lines are single cells (quoted when they hold commas) so spreadsheets keep them whole.
  const lines = [
    csvCell(
      `# Chordline field sheet: ${sheet.bridge.name.replace(/[\r\n]+/g, ' ')}; revision ${sheet.revision}; base rod ${decimal(sheet.base_rod_length, u)} ${u}${sheet.span ? `; span ${sheet.span}` : ''}`,
    ),
    csvCell(`# Caution: ${sheet.caution}`),
    header.join(','),
  ];
  for (const g of sheet.groups) {
    for (const r of g.rows) {
      lines.push(
        [
          String(g.span),
          g.girder,
          g.side,
          String(r.point),
          stationText(r.station, u),
          ...(u === 'ft' ? [tapeLength(r.edge_width, u)] : []),
          decimal(r.edge_width, u),
          opt(r.reading),
          opt(r.girder_rod),
          opt(r.form_rod),
          opt(r.extra_rod),
          decimal(r.form_target, u),
          ...(sheet.deflections ? [decimal(r.deflection, u), decimal(r.screed_grade, u)] : []),
          '',
          '',
          String(sheet.revision),
        ]
          .map(csvCell)
          .join(','),
      );
    }
  }
  return lines.join('\n') + '\n';
}

/** File-name-safe form of a bridge name. */
export function safeFileName(name: string): string {
  return (
    name
      .replace(/[^A-Za-z0-9._-]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 80) || 'bridge'
  );
}

/** The field sheet of a stored bridge's latest revision (all spans, or one: 400 for a span it lacks). */
export async function loadFieldSheet(bridgeId: string, span: number | null): Promise<FieldSheet> {
  const { bridge, table } = await offsetsForBridge(bridgeId);
  const spans = [...new Set(table.points.map((p) => p.span))].sort((a, b) => a - b);
  if (span !== null && !spans.includes(span)) {
    throw new ValidationError(`This bridge has no span ${span}.`, { span: [`Choose a span from ${spans[0]} to ${spans[spans.length - 1]}.`] });
  }
  const settings = fieldSettingsOf(bridge);
  return {
    bridge: { id: bridge.id, name: bridge.name },
    units: settings.units,
    revision: bridge.currentRevision,
    base_rod_length: settings.base_rod_length,
    span,
    spans,
    groups: buildSheetGroups(table, settings.base_rod_length, span),
    deflections: table.points.some((p) => p.deflection !== 0),
    caution: SHEET_CAUTION,
    rod_definition: ROD_DEFINITION,
  };
}

/** Query of the field-sheet CSV: `span` picks one span (1, 2, …); absent or empty means every span. */
export const fieldSheetQuerySchema = z.object({
  span: z
    .string()
    .regex(/^\d*$/, 'Give a whole span number, or leave it out for every span.')
    .optional()
    .transform((v) => (v ? Number(v) : null))
    .refine((n) => n === null || n > 0, 'Give a whole span number, or leave it out for every span.'),
});

/** CSV download of the sheet. */
export async function fieldSheetCsvForBridge(bridgeId: string, span: number | null): Promise<{ filename: string; csv: string }> {
  const sheet = await loadFieldSheet(bridgeId, span);
  return {
    filename: `${safeFileName(sheet.bridge.name)}-rev${sheet.revision}-field-sheet${span ? `-span${span}` : ''}.csv`,
    csv: fieldSheetCsv(sheet),
  };
}
