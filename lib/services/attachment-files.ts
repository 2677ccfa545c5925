import fs from 'node:fs/promises';
import path from 'node:path';
import { Attachment } from '@/models';
import { removeUpload } from '@/lib/uploads/store';
import { thumbsDir } from '@/lib/uploads/thumbnail';

/** The stored file names of every attachment of a bridge (read before the bridge is deleted). */
export async function bridgeFiles(bridgeId: number): Promise<string[]> {
  const rows = await Attachment.findAll({ where: { bridgeId }, attributes: ['storedName'] });
  return rows.map((a) => a.storedName);
}

/** Removes stored uploads and their cached thumbnails from disk; a file already gone is no error. */
export async function removeStoredFiles(storedNames: string[]): Promise<void> {
  for (const name of storedNames) {
    await removeUpload(name);
    const m = /^([a-f0-9]{32})\./.exec(name);
    if (m) await fs.rm(path.join(thumbsDir(), `${m[1]}.jpg`), { force: true });
  }
}
