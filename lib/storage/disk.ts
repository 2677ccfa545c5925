import crypto from 'node:crypto';
import fsp from 'node:fs/promises';
import path from 'node:path';
import { Readable } from 'node:stream';
import { dataDir } from '@/lib/config';
import { PRIVATE_DIR_MODE, PRIVATE_FILE_MODE } from '@/lib/db/private-files';
import { checkStoredName, type FileArea, type FileStore, type OpenedFile } from './types';

/** The folder of an area under DATA_DIR: uploads/ for the files, cache/thumbs/ for thumbnails (left out of backups). */
export function diskAreaDir(area: FileArea): string {
  return area === 'uploads' ? path.join(dataDir(), 'uploads') : path.join(dataDir(), 'cache', 'thumbs');
}

function fileOf(area: FileArea, name: string): string {
  checkStoredName(area, name);
  return path.join(diskAreaDir(area), name);
}

function missing(err: unknown): boolean {
  return (err as NodeJS.ErrnoException)?.code === 'ENOENT';
}

/** Files under DATA_DIR, private to the server's user (0700 folders, 0600 files). */
export const diskStore: FileStore = {
  kind: 'disk',
  describe: () => diskAreaDir('uploads'),

  async put(area, name, bytes) {
    const file = fileOf(area, name);
    await fsp.mkdir(path.dirname(file), { recursive: true, mode: PRIVATE_DIR_MODE });
    if (area === 'uploads') {
      // A generated name is never reused: refuse to overwrite rather than lose a file.
      await fsp.writeFile(file, bytes, { flag: 'wx', mode: PRIVATE_FILE_MODE });
      return;
    }
    // Thumbnails are written to a unique temporary name and renamed, so a concurrent reader never sees half a file.
    const tmp = `${file}.${process.pid}.${crypto.randomBytes(6).toString('hex')}.tmp`;
    try {
      await fsp.writeFile(tmp, bytes, { mode: PRIVATE_FILE_MODE });
      await fsp.rename(tmp, file);
    } catch (err) {
      await fsp.rm(tmp, { force: true }).catch(() => undefined);
      throw err;
    }
  },

  async read(area, name) {
    try {
      return await fsp.readFile(fileOf(area, name));
    } catch (err) {
      if (missing(err)) return null;
      throw err;
    }
  },

  async open(area, name): Promise<OpenedFile | null> {
    let handle: fsp.FileHandle;
    try {
      handle = await fsp.open(fileOf(area, name), 'r');
    } catch (err) {
      if (missing(err)) return null;
      throw err;
    }
    const { size } = await handle.stat();
    // The stream owns the handle from here and closes it at the end or when the reader cancels.
    const stream = handle.createReadStream();
    return { body: Readable.toWeb(stream) as ReadableStream<Uint8Array>, size };
  },

  async remove(area, name) {
    await fsp.rm(fileOf(area, name), { force: true });
  },
};
