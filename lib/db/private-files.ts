import fs from 'node:fs';
import path from 'node:path';

/** Mode of folders under DATA_DIR: the server's own user only (rwx------). */
export const PRIVATE_DIR_MODE = 0o700;
/** Mode of files under DATA_DIR: the server's own user only (rw-------). */
export const PRIVATE_FILE_MODE = 0o600;

/**
 * Makes the data folder private to the server's user (0700) and creates or tightens the SQLite file
 * to 0600 before SQLite opens it; SQLite gives its -wal and -shm files the database file's mode.
 * Existing files from before are tightened too. Errors on filesystems without modes are ignored.
 */
export function preparePrivateStore(dir: string, sqliteFile: string): void {
  fs.mkdirSync(/*turbopackIgnore: true*/ dir, { recursive: true, mode: PRIVATE_DIR_MODE });
  tighten(dir, PRIVATE_DIR_MODE);
  fs.closeSync(fs.openSync(/*turbopackIgnore: true*/ sqliteFile, 'a', PRIVATE_FILE_MODE));
  for (const suffix of ['', '-wal', '-shm']) {
    if (fs.existsSync(/*turbopackIgnore: true*/ sqliteFile + suffix)) tighten(sqliteFile + suffix, PRIVATE_FILE_MODE);
  }
  for (const sub of ['uploads', 'cache', path.join('cache', 'thumbs'), 'outbox']) {
    const p = path.join(/*turbopackIgnore: true*/ dir, sub);
    if (fs.existsSync(/*turbopackIgnore: true*/ p)) tighten(p, PRIVATE_DIR_MODE);
  }
}

function tighten(p: string, mode: number): void {
  try {
    fs.chmodSync(/*turbopackIgnore: true*/ p, mode);
  } catch {
    // A filesystem without Unix modes: nothing to tighten.
  }
}
