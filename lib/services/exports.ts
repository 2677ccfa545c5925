/**
 * The designer's deliverables of a stored bridge's latest revision: the offset table and the field
 * sheet as PDF, the plan as DXF and the alignment and profile as LandXML 1.2. Loads what each needs
 * and hands it to the pure writers in lib/export.
 */
import { z } from 'zod';
import type { DownloadFile } from '@/lib/api/file-response';
import type { DisplayStyle } from '@/lib/geometry';
import { GeometryRevision, type Bridge } from '@/models';
import { dateTimeText } from '@/lib/units';
import { fieldSheetPdf } from '@/lib/export/field-sheet-pdf';
import { landXmlOut } from '@/lib/export/landxml-out';
import { offsetsPdf } from '@/lib/export/offsets-pdf';
import { paperFor, type Paper } from '@/lib/export/pdf-document';
import { planDxf } from '@/lib/export/plan-dxf';
import { planLines } from '@/lib/export/plan-lines';
import { getBridge, getRevisionDescription } from './bridges';
import { DEFLECTION_DEFINITION, loadFieldSheet, safeFileName, SHEET_CAUTION } from './field-sheet';
import { offsetsForBridge } from './offsets';
import { signOffOverview } from './signoff';

const STYLES = ['decimal-feet', 'feet-inches', 'metric'] as const;
const PAPERS = ['letter', 'a4'] as const;

const paperParam = z.enum(PAPERS, { error: 'paper must be letter or a4.' }).optional();
const spanParam = z
  .string()
  .regex(/^\d*$/, 'Give a whole span number, or leave it out for every span.')
  .optional()
  .transform((v) => (v ? Number(v) : null))
  .refine((n) => n === null || n > 0, 'Give a whole span number, or leave it out for every span.');

/** Query of the offsets PDF: `style` as on screen (decimal-feet when absent), `paper` (by units when absent). */
export const offsetsPdfQuerySchema = z.object({
  style: z
    .enum(STYLES, { error: `style must be one of ${STYLES.join(', ')}.` })
    .optional()
    .default('decimal-feet'),
  paper: paperParam,
});

/** Query of the field-sheet PDF: `span` (every span when absent), `paper` (by units when absent). */
export const fieldSheetPdfQuerySchema = z.object({ span: spanParam, paper: paperParam });

export type ExportFile = DownloadFile;

/** The structure number of a bridge row when the row carries one. */
function structureNumberOf(bridge: Bridge): string | null {
  const row = bridge.get({ plain: true }) as { structureNumber?: unknown; structure_number?: unknown };
  const v = row.structureNumber ?? row.structure_number;
  return typeof v === 'string' && v.trim() ? v.trim() : null;
}

async function revisionDate(bridge: Bridge): Promise<Date> {
  const row = await GeometryRevision.findOne({ where: { bridgeId: bridge.id, revision: bridge.currentRevision }, attributes: ['createdAt'] });
  return row?.createdAt ?? bridge.updatedAt;
}

async function sheetMeta(bridge: Bridge, now: Date) {
  return {
    bridgeName: bridge.name,
    structureNumber: structureNumberOf(bridge),
    revision: bridge.currentRevision,
    revisionDate: dateTimeText((await revisionDate(bridge)).toISOString()),
    printedAt: dateTimeText(now.toISOString()),
  };
}

const stem = (bridge: Bridge) => `${safeFileName(bridge.name)}-rev${bridge.currentRevision}`;

/** The offset table of the latest revision as PDF, lengths in `style`, on `paper` (letter for feet, A4 for metres by default). */
export async function offsetsPdfForBridge(id: string, query: { style: DisplayStyle; paper?: Paper }): Promise<ExportFile> {
  const { bridge, table } = await offsetsForBridge(id);
  const body = await offsetsPdf({
    meta: await sheetMeta(bridge, new Date()),
    table,
    style: query.style,
    paper: paperFor(table.units, query.paper),
    caution: SHEET_CAUTION,
  });
  return { filename: `${stem(bridge)}-offsets.pdf`, contentType: 'application/pdf', body };
}

/** The field sheet (one span or all) with each span's sign-off state, as PDF. */
export async function fieldSheetPdfForBridge(id: string, query: { span: number | null; paper?: Paper }): Promise<ExportFile> {
  const sheet = await loadFieldSheet(id, query.span);
  const { bridge } = await offsetsForBridge(id);
  const overview = await signOffOverview(id);
  const spans = overview.spans
    .filter((s) => query.span === null || s.span === query.span)
    .map((s) => ({ span: s.span, brackets: s.brackets, ready: s.ready, missing: s.missing.length, signoff: s.signoff }));
  const meta = await sheetMeta(bridge, new Date());
  const body = await fieldSheetPdf({
    meta: { ...meta, subtitle: query.span ? `Span ${query.span}` : `All spans (${sheet.spans.join(', ')})` },
    units: sheet.units,
    baseRodLength: sheet.base_rod_length,
    groups: sheet.groups,
    spans,
    currentRevision: overview.current_revision,
    paper: paperFor(sheet.units, query.paper),
    caution: sheet.caution,
    rodDefinition: sheet.rod_definition,
    deflectionDefinition: sheet.deflections ? DEFLECTION_DEFINITION : undefined,
  });
  return { filename: `${stem(bridge)}-field-sheet${query.span ? `-span${query.span}` : ''}.pdf`, contentType: 'application/pdf', body };
}

/** The plan of the latest revision as DXF in the bridge's own coordinates and unit. */
export async function planDxfForBridge(id: string): Promise<ExportFile> {
  const { bridge, table } = await offsetsForBridge(id);
  const description = await getRevisionDescription(bridge.id, bridge.currentRevision);
  const meta = await sheetMeta(bridge, new Date());
  const body = planDxf(planLines(description, table), meta);
  return { filename: `${stem(bridge)}-plan.dxf`, contentType: 'application/dxf', body };
}

/** The alignment and profile of the latest revision as LandXML 1.2. */
export async function alignmentXmlForBridge(id: string): Promise<ExportFile> {
  // The stored description is enough: the file is written even for a revision whose table cannot be computed.
  const bridge = await getBridge(id);
  const { description } = bridge;
  const body = landXmlOut({
    name: bridge.name,
    units: description.units,
    alignment: description.alignment,
    profile: description.profile,
    revision: bridge.revision,
    now: new Date(),
  });
  return { filename: `${safeFileName(bridge.name)}-rev${bridge.revision}-alignment.xml`, contentType: 'application/xml; charset=utf-8', body };
}
