import { z } from 'zod';
import { invalidFields, NotFoundError, UnsupportedTypeError, ValidationError } from '@/lib/errors';
import type { SessionUser } from '@/lib/auth/session';
import { db } from '@/lib/db/connection';
import { filePart, readMultipart } from '@/lib/uploads/multipart';
import { sniffType } from '@/lib/uploads/sniff';
import { neutraliseName, openUpload, readUpload, removeUpload, saveUpload } from '@/lib/uploads/store';
import { thumbnailOf } from '@/lib/uploads/thumbnail';
import { photoPixelProblem } from '@/lib/uploads/pixels';
import { HttpError as PhotoLimitError } from '@/lib/api/errors';
import { Attachment, FieldCheck, User } from '@/models';
import { attachmentUrls } from './attachment-urls';
import { cleanText } from '@/lib/text/clean';
import { audit } from './audit';
import { markFieldActivity } from './bridge-status';
import { requireBridge } from './require-bridge';

export type AttachmentJson = {
  id: number;
  bridge_id: number;
  check_id: number | null;
  name: string;
  content_type: string;
  size: number;
  caption: string;
  url: string;
  thumbnail_url: string | null;
  by: string | null;
  created_at: string;
  /** The key the phone gave the photo in its offline store; null for a photo sent directly. */
  client_key: string | null;
};

function toJson(a: Attachment, by: string | null): AttachmentJson {
  return {
    id: a.id,
    bridge_id: a.bridgeId,
    check_id: a.checkId,
    name: a.originalName,
    content_type: a.contentType,
    size: a.size,
    caption: a.caption,
    ...attachmentUrls(a.id, a.contentType),
    by,
    created_at: a.createdAt.toISOString(),
    client_key: a.clientKey ?? null,
  };
}

/** The text fields sent beside the file. */
const uploadFieldsSchema = z.object({
  check_id: z.string().trim().regex(/^\d+$/, 'check_id must be the number of a check of this bridge.').transform(Number).optional(),
  caption: z.string().transform(cleanText).pipe(z.string().max(300, 'Keep the caption under 300 characters.')).optional().default(''),
  client_key: z
    .string()
    .regex(/^[A-Za-z0-9_-]{8,64}$/, 'client_key must be 8 to 64 letters, digits, - or _.')
    .optional(),
});

/** The attachment already stored under this client key, for a resend whose first answer was lost. */
async function findReplay(bridgeId: number, clientKey: string | undefined): Promise<AttachmentJson | null> {
  if (!clientKey) return null;
  const a = await Attachment.findOne({ where: { bridgeId, clientKey }, include: [{ model: User, as: 'user', attributes: ['name'] }] });
  return a ? toJson(a, (a as Attachment & { user?: User | null }).user?.name ?? null) : null;
}

/**
 * Stores a photo (JPEG, PNG, WebP) or a PDF for a bridge, optionally for one of its checks. The type
 * comes from the bytes (415 otherwise), the size limit is 10 MB (413), the stored name is generated and
 * the user's name is kept only as neutralised text. A `client_key` field (8-64 of A-Z a-z 0-9 - _) makes
 * a resend return the attachment already stored under it (`replayed: true`) instead of a second copy.
 */
export async function uploadAttachment(user: SessionUser, bridgeId: string, req: Request): Promise<AttachmentJson & { replayed: boolean }> {
  const bridge = await requireBridge(bridgeId);
  const form = await readMultipart(req);
  const file = filePart(form);
  const text = (k: string) => {
    const v = form.get(k);
    return typeof v === 'string' && v !== '' ? v : undefined;
  };
  const fields = uploadFieldsSchema.safeParse({ check_id: text('check_id'), caption: text('caption'), client_key: text('client_key') });
  if (!fields.success) throw invalidFields(fields.error);
  const replay = await findReplay(bridge.id, fields.data.client_key);
  if (replay) return { ...replay, replayed: true };
  const bytes = new Uint8Array(await file.arrayBuffer());
  const type = sniffType(bytes);
  if (!type) {
    throw new UnsupportedTypeError('Only photos (JPEG, PNG or WebP) and PDF files can be attached; this file is none of those, whatever its name says.', {
      file: ['Choose a JPEG, PNG or WebP photo, or a PDF.'],
    });
  }
  const pixels = photoPixelProblem(bytes, type.contentType);
  if (pixels) throw new PhotoLimitError(422, pixels, { file: [pixels] });
  if (fields.data.check_id !== undefined) {
    const check = await FieldCheck.findOne({ where: { id: fields.data.check_id, bridgeId: bridge.id } });
    if (!check) throw new ValidationError('That check does not belong to this bridge.', { check_id: ['Choose a check of this bridge.'] });
  }
  const storedName = await saveUpload(bytes, type.ext);
  const sequelize = await db();
  try {
    const row = await sequelize.transaction(async (transaction) => {
      const a = await Attachment.create(
        {
          bridgeId: bridge.id,
          checkId: fields.data.check_id ?? null,
          userId: user.id,
          storedName,
          originalName: neutraliseName(file.name || 'upload'),
          contentType: type.contentType,
          size: bytes.byteLength,
          caption: fields.data.caption,
          clientKey: fields.data.client_key ?? null,
        },
        { transaction },
      );
      await audit(user.id, 'attachment.create', 'bridge', bridge.id, { attachment: a.id, check: a.checkId, name: a.originalName, content_type: a.contentType, size: a.size }, transaction);
      await markFieldActivity(bridge.id, transaction);
      return a;
    });
    // Make the thumbnail now, while the uploader waits anyway, so lists never wait for it. Best
    // effort: a photo that cannot be decoded serves as its own thumbnail.
    if (type.contentType.startsWith('image/')) await thumbnailOf(storedName, async () => Buffer.from(bytes)).catch(() => null);
    return { ...toJson(row, user.name), replayed: false };
  } catch (err) {
    await removeUpload(storedName);
    // Two sends of one photo raced past the first look-up: the unique key let one through.
    const raced = (err as Error).name === 'SequelizeUniqueConstraintError' ? await findReplay(bridge.id, fields.data.client_key) : null;
    if (raced) return { ...raced, replayed: true };
    throw err;
  }
}

/** Every attachment of a bridge, newest first. */
export async function listAttachments(bridgeId: string): Promise<AttachmentJson[]> {
  const bridge = await requireBridge(bridgeId);
  const rows = await Attachment.findAll({
    where: { bridgeId: bridge.id },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
  });
  return rows.map((a) => toJson(a, (a as Attachment & { user?: User | null }).user?.name ?? null));
}

/** RFC 6266 Content-Disposition with an ASCII fallback and the UTF-8 name. */
export function contentDisposition(kind: 'inline' | 'attachment', name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\]/g, '_');
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

/** Query of GET /api/attachments/:id: `size=thumb` asks for a photo's small JPEG. */
export const attachmentQuerySchema = z.object({
  size: z.enum(['full', 'thumb'], { error: 'size must be full or thumb.' }).optional().default('full'),
});

/**
 * The stored file as a response, streamed from the file store (disk or bucket): the sniffed content type, nosniff, images inline and PDFs as a
 * download, a sandboxing CSP, private caching. With size "thumb", a photo's thumbnail (a JPEG at
 * most 320 px on its longer side) or, when none can be made, the photo itself; PDFs have none (400).
 */
export async function attachmentResponse(id: string, size: 'full' | 'thumb' = 'full'): Promise<Response> {
  await db();
  const n = Number(id);
  const a = Number.isInteger(n) && n > 0 ? await Attachment.findByPk(n) : null;
  if (!a) throw new NotFoundError('There is no attachment with that id.');
  const image = a.contentType.startsWith('image/');
  if (size === 'thumb' && !image) throw new ValidationError('Only photos have thumbnails; ask for the file itself.', { size: ['Leave size out for a PDF.'] });
  const gone = () => new NotFoundError('The file of this attachment is missing from the server.');
  const original = async () => {
    const bytes = await readUpload(a.storedName);
    if (!bytes) throw gone();
    return bytes;
  };
  const thumb = size === 'thumb' ? await thumbnailOf(a.storedName, original) : null;
  // The full file is streamed from the store (disk or bucket), never read whole into memory.
  const file = thumb ? { body: new Uint8Array(thumb), size: thumb.byteLength } : await openUpload(a.storedName);
  if (!file) throw gone();
  return new Response(file.body, {
    status: 200,
    headers: {
      'Content-Type': thumb ? 'image/jpeg' : a.contentType,
      'Content-Length': String(file.size),
      'X-Content-Type-Options': 'nosniff',
      'Content-Disposition': contentDisposition(image ? 'inline' : 'attachment', a.originalName),
      'Content-Security-Policy': "default-src 'none'; sandbox",
      // Never kept by the browser: a photo must not stay readable after sign-out.
      'Cache-Control': 'no-store',
    },
  });
}
