import { db } from '@/lib/db/connection';
import { OutboxMessage, User } from '@/models';

/** A kept attachment; `encoding` base64 means `content` holds the bytes (a PDF) in base64, else the text itself. */
export type OutboxAttachmentJson = { filename: string; content_type: string; size: number; content: string; encoding: 'text' | 'base64' };

export type OutboxJson = {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  attachments: OutboxAttachmentJson[];
  sent_by: string | null;
  created_at: string;
};

function parseList<T>(text: string): T[] {
  try {
    const v = JSON.parse(text);
    return Array.isArray(v) ? (v as T[]) : [];
  } catch {
    return [];
  }
}

/** Messages captured locally (no SMTP server configured), newest first. */
export async function listOutbox(limit = 100): Promise<OutboxJson[]> {
  await db();
  const rows = await OutboxMessage.findAll({ order: [['id', 'DESC']], limit });
  const userIds = [...new Set(rows.map((r) => r.userId).filter((v): v is number => v !== null))];
  const users = userIds.length ? await User.findAll({ where: { id: userIds }, attributes: ['id', 'name'] }) : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return rows.map((r) => ({
    id: r.id,
    from: r.sender,
    to: parseList<string>(r.recipients).filter((x) => typeof x === 'string'),
    subject: r.subject,
    text: r.textBody,
    attachments: parseList<{ filename: string; contentType: string; size: number; content: string; encoding?: string }>(r.attachments).map((a) => ({
      filename: String(a.filename),
      content_type: String(a.contentType),
      size: Number(a.size),
      content: String(a.content),
      encoding: a.encoding === 'base64' ? ('base64' as const) : ('text' as const),
    })),
    sent_by: r.userId !== null ? (names.get(r.userId) ?? null) : null,
    created_at: r.createdAt.toISOString(),
  }));
}
