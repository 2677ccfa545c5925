import crypto from 'node:crypto';
import fs from 'node:fs/promises';
import path from 'node:path';
import { dataDir } from '@/lib/config';
import { PRIVATE_DIR_MODE, PRIVATE_FILE_MODE } from '@/lib/db/private-files';

/** Folder of stored uploads: DATA_DIR/uploads. */
export function uploadsDir(): string {
  return path.join(dataDir(), 'uploads');
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

/** Writes the bytes under a generated name (32 hex digits + extension) and returns that name. */
export async function saveUpload(bytes: Uint8Array, ext: string): Promise<string> {
  const dir = uploadsDir();
  await fs.mkdir(dir, { recursive: true, mode: PRIVATE_DIR_MODE });
  const name = `${crypto.randomBytes(16).toString('hex')}.${ext}`;
  await fs.writeFile(path.join(dir, name), bytes, { flag: 'wx', mode: PRIVATE_FILE_MODE });
  return name;
}

/** Reads a stored upload by its generated name; refuses any name this module did not generate. */
export async function readUpload(storedName: string): Promise<Buffer> {
  if (!STORED.test(storedName)) throw new Error('Not a stored upload name');
  return fs.readFile(path.join(uploadsDir(), storedName));
}

/** Removes a stored upload (used when the database write after it fails). */
export async function removeUpload(storedName: string): Promise<void> {
  if (!STORED.test(storedName)) return;
  await fs.rm(path.join(uploadsDir(), storedName), { force: true });
}
