import { Attachment } from '@/models';
import { removeUpload } from '@/lib/uploads/store';
import { removeThumbnail } from '@/lib/uploads/thumbnail';

/** The stored file names of every attachment of a bridge (read before the bridge is deleted). */
export async function bridgeFiles(bridgeId: number): Promise<string[]> {
  const rows = await Attachment.findAll({ where: { bridgeId }, attributes: ['storedName'] });
  return rows.map((a) => a.storedName);
}

/** Removes stored uploads and their cached thumbnails from the file store (disk or bucket); a file already gone is no error. */
export async function removeStoredFiles(storedNames: string[]): Promise<void> {
  for (const name of storedNames) {
    await removeUpload(name);
    await removeThumbnail(name);
  }
}
