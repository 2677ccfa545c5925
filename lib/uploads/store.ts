import crypto from 'node:crypto';
import { fileStore, type OpenedFile } from '@/lib/storage';
import { diskAreaDir } from '@/lib/storage/disk';

/** Folder of stored uploads when they stay on disk: DATA_DIR/uploads. */
export function uploadsDir(): string {
  return diskAreaDir('uploads');
}

const STORED = /^[a-f0-9]{32}\.(jpg|png|webp|pdf)$/;

/**
 * The user's file name made harmless for display: the last path segment only (both slash kinds), no
 * control, bidirectional-override or quote characters, no leading dots, at most 200 characters;
 * "upload" when nothing is left.
 * The result is never used to build a path.
 */
export function neutraliseName(name: string): string {
  const last =
    name
      .split(/[\\/]+/)
      .filter(Boolean)
      .pop() ?? '';
  const clean = last
    .normalize('NFC')
    .replace(/[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069"<>|:*?]+/g, '_')
    .replace(/^\.+/, '')
    .replace(/\.{2,}/g, '.')
    .trim()
    .slice(0, 200);
  return clean || 'upload';
}

const CONTENT_TYPES: Record<string, string> = { jpg: 'image/jpeg', png: 'image/png', webp: 'image/webp', pdf: 'application/pdf' };

/** Writes the bytes under a generated name (32 hex digits + extension) to the file store and returns that name. */
export async function saveUpload(bytes: Uint8Array, ext: string): Promise<string> {
  const name = `${crypto.randomBytes(16).toString('hex')}.${ext}`;
  await fileStore().put('uploads', name, bytes, CONTENT_TYPES[ext] ?? 'application/octet-stream');
  return name;
}

/** Reads a stored upload whole by its generated name; refuses any name this module did not generate; null when it is gone. */
export async function readUpload(storedName: string): Promise<Buffer | null> {
  if (!STORED.test(storedName)) throw new Error('Not a stored upload name');
  return fileStore().read('uploads', storedName);
}

/** Opens a stored upload as a stream with its length (for downloads); null when it is gone. */
export async function openUpload(storedName: string): Promise<OpenedFile | null> {
  if (!STORED.test(storedName)) throw new Error('Not a stored upload name');
  return fileStore().open('uploads', storedName);
}

/** Removes a stored upload (when the database write after it fails, or its attachment goes). */
export async function removeUpload(storedName: string): Promise<void> {
  if (!STORED.test(storedName)) return;
  await fileStore().remove('uploads', storedName);
}
