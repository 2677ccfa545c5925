import fs from 'node:fs/promises';
import path from 'node:path';
import nodemailer from 'nodemailer';
import { dataDir } from '@/lib/config';
import { db } from '@/lib/db/connection';
import { UpstreamError } from '@/lib/errors';
import { OutboxMessage } from '@/models';

/** An attachment: text (the field sheet CSV) or bytes (its PDF). */
export type MailAttachment = { filename: string; contentType: string; content: string | Buffer };

/** How the outbox keeps an attachment: text as is, bytes as base64 (`encoding`), with the size in bytes. */
function outboxAttachment(a: MailAttachment) {
  if (typeof a.content === 'string') return { ...a, size: Buffer.byteLength(a.content, 'utf8') };
  return { ...a, content: a.content.toString('base64'), encoding: 'base64', size: a.content.byteLength };
}

export type MailMessage = { to: string[]; subject: string; text: string; attachments: MailAttachment[] };

export type MailResult = { via: 'smtp' | 'outbox'; messageId: string; outboxId: number | null };

/** Sender address: MAIL_FROM when set, else a name at a reserved domain that never delivers anywhere. */
export function mailFrom(): string {
  return process.env.MAIL_FROM || 'Chordline <chordline@chordline.invalid>';
}

/** The SMTP server from SMTP_URL (smtp:// or smtps://), or null for the local outbox. */
export function smtpUrl(): string | null {
  const url = process.env.SMTP_URL?.trim();
  return url ? url : null;
}

function envelope(message: MailMessage) {
  return {
    from: mailFrom(),
    to: message.to,
    subject: message.subject,
    text: message.text,
    attachments: message.attachments.map((a) => ({
      filename: a.filename,
      contentType: a.contentType,
      content: a.content,
      contentTransferEncoding: 'base64' as const,
    })),
  };
}

/**
 * Sends through nodemailer: SMTP when SMTP_URL is set, otherwise the message is written in full by
 * nodemailer's stream transport and kept in the local outbox (a row in the database and an .eml file
 * under DATA_DIR/outbox). An SMTP failure becomes a 502 naming no server detail.
 */
export async function sendMail(message: MailMessage, userId: number | null): Promise<MailResult> {
  const url = smtpUrl();
  if (url) {
    const transport = nodemailer.createTransport(url);
    try {
      const info = await transport.sendMail(envelope(message));
      return { via: 'smtp', messageId: info.messageId, outboxId: null };
    } catch (err) {
      console.error('[chordline] SMTP send failed:', (err as Error).message);
      throw new UpstreamError('The mail server did not accept the message. Try again later, or tell your administrator.');
    } finally {
      transport.close();
    }
  }
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'unix' });
  const info = await transport.sendMail(envelope(message));
  const raw = (info.message as Buffer).toString('utf8');
  const sequelize = await db();
  const dir = path.join(dataDir(), 'outbox');
  await fs.mkdir(dir, { recursive: true });
  const row = await sequelize.transaction(async (transaction) => {
    const created = await OutboxMessage.create(
      {
        sender: mailFrom(),
        recipients: JSON.stringify(message.to),
        subject: message.subject,
        textBody: message.text,
        attachments: JSON.stringify(message.attachments.map(outboxAttachment)),
        raw,
        userId,
      },
      { transaction },
    );
    // Written inside the transaction: if the file cannot be written, the row is not kept either.
    await fs.writeFile(path.join(dir, `${String(created.id).padStart(6, '0')}.eml`), raw, { flag: 'wx' });
    return created;
  });
  return { via: 'outbox', messageId: info.messageId, outboxId: row.id };
}
