import { db } from '@/lib/db/connection';
import { OutboxMessage, User } from '@/models';

export type OutboxAttachmentJson = { filename: string; content_type: string; size: number; content: string };

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
    attachments: parseList<{ filename: string; contentType: string; size: number; content: string }>(r.attachments).map((a) => ({
      filename: String(a.filename),
      content_type: String(a.contentType),
      size: Number(a.size),
      content: String(a.content),
    })),
    sent_by: r.userId !== null ? (names.get(r.userId) ?? null) : null,
    created_at: r.createdAt.toISOString(),
  }));
}
