import { z } from 'zod';
import { Op } from 'sequelize';
import { AuditEvent } from '@/models';
import { HttpError } from '@/lib/api/errors';
import type { SessionUser } from '@/lib/auth/session';
import { db } from '@/lib/db/connection';
import { sendMail, type MailResult } from '@/lib/mail/send';
import { audit } from './audit';
import { fieldSheetCsv, loadFieldSheet, safeFileName, type FieldSheet } from './field-sheet';
import { fieldSheetPdfForBridge } from './exports';
import { lengthText, tapeAndDecimalLength } from '@/lib/units';

/** Body of POST /api/bridges/:id/send-sheet. */
export const sendSheetSchema = z.object({
  to: z
    .array(z.email({ error: 'This is not an e-mail address.' }).max(254), { error: 'Give the recipients as a list of e-mail addresses.' })
    .min(1, 'Give at least one e-mail address.')
    .max(10, 'Send to at most 10 addresses at a time.'),
  span: z.number({ error: 'Span must be a span number (1, 2, …).' }).int('Span must be a whole number.').positive('Span numbers start at 1.').nullable().optional(),
});

/** Plain-text summary for the e-mail body: what the sheet covers, the rods rule and the caution. */
export function sheetSummary(sheet: FieldSheet, sender: string): string {
  const u = sheet.units;
  const len = (v: number) => lengthText(v, u);
  const lines = [
    `Field sheet for ${sheet.bridge.name}, computed from geometry revision ${sheet.revision}.`,
    sheet.span ? `Span ${sheet.span}.` : `All spans (${sheet.spans.join(', ')}).`,
    `Sent by ${sender} from Chordline.`,
    '',
  ];
  for (const g of sheet.groups) {
    const widths = g.rows.map((r) => r.edge_width);
    const surveyed = g.rows.filter((r) => r.reading !== null).length;
    lines.push(
      `Span ${g.span}, ${g.girder} (${g.side} overhang): ${g.rows.length} brackets, edge width ${tapeAndDecimalLength(Math.min(...widths), u)} to ${tapeAndDecimalLength(Math.max(...widths), u)}; level-bar readings at ${surveyed} surveyed ${surveyed === 1 ? 'point' : 'points'}.`,
    );
  }
  lines.push(
    '',
    `The attached PDF is the printable sheet, with each span's sign-off. The attached CSV lists every bracket: station, edge width, level-bar reading and rods, form target, and blank columns for the measurements. Base rod length ${len(sheet.base_rod_length)}.`,
    sheet.rod_definition,
    '',
    `CAUTION: ${sheet.caution}`,
  );
  return lines.join('\n') + '\n';
}

/** Most recipients one person may send field sheets to within an hour, counted over every app server. */
export const SHEET_RECIPIENTS_PER_HOUR = 30;

/** 429 when this send would take the sender over {@link SHEET_RECIPIENTS_PER_HOUR} in the last hour. */
async function checkSendRate(userId: number, recipients: number): Promise<void> {
  await db();
  const since = new Date(Date.now() - 60 * 60 * 1000);
  const sent = await AuditEvent.findAll({ where: { userId, action: 'sheet.send', createdAt: { [Op.gte]: since } }, attributes: ['detail'] });
  const count = sent.reduce((n, e) => {
    try {
      const to = (JSON.parse(e.detail ?? '{}') as { to?: unknown }).to;
      return n + (Array.isArray(to) ? to.length : 1);
    } catch {
      return n + 1;
    }
  }, 0);
  if (count + recipients > SHEET_RECIPIENTS_PER_HOUR) {
    throw new HttpError(429, `You have sent field sheets to ${count} recipients in the last hour; the limit is ${SHEET_RECIPIENTS_PER_HOUR} an hour. Try again later.`);
  }
}

/** Sends the field sheet (CSV and PDF attached, summary in the body) and records it in the audit log. */
export async function sendSheet(
  user: SessionUser,
  bridgeId: string,
  input: z.infer<typeof sendSheetSchema>,
): Promise<{ via: MailResult['via']; to: string[]; subject: string; outbox_id: number | null }> {
  const span = input.span ?? null;
  const sheet = await loadFieldSheet(bridgeId, span);
  const to = [...new Set(input.to.map((a) => a.trim()))];
  await checkSendRate(user.id, to.length);
  const subject = `Field sheet: ${sheet.bridge.name.replace(/[\r\n]+/g, ' ')}${span ? `, span ${span}` : ''} (revision ${sheet.revision})`;
  const filename = `${safeFileName(sheet.bridge.name)}-rev${sheet.revision}-field-sheet${span ? `-span${span}` : ''}.csv`;
  // The same PDF the field-sheet.pdf route serves (paper by the bridge's units).
  const pdf = await fieldSheetPdfForBridge(bridgeId, { span });
  const attachments = [
    { filename, contentType: 'text/csv; charset=utf-8', content: fieldSheetCsv(sheet) },
    { filename: pdf.filename, contentType: pdf.contentType, content: pdf.body },
  ];
  const result = await sendMail({ to, subject, text: sheetSummary(sheet, user.name), attachments }, user.id);
  await db();
  await audit(user.id, 'sheet.send', 'bridge', sheet.bridge.id, { to, span, revision: sheet.revision, via: result.via, outbox: result.outboxId });
  return { via: result.via, to, subject, outbox_id: result.outboxId };
}
