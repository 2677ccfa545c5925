import fs from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { dataDir } from '@/lib/config';
import { fileStore } from '@/lib/storage';

export const DB_FILE = 'chordline.sqlite';

function stamp(date: Date): string {
  return date.toISOString().replace(/[-:]/g, '').replace('T', '-').slice(0, 15);
}

/** Name of the note a backup folder holds instead of the uploads when they live in a bucket. */
export const UPLOADS_NOTE_FILE = 'UPLOADS-IN-OBJECT-STORAGE.txt';

/**
 * What a backup does with the photos and PDFs: null when they are on disk (copied with the database);
 * when they live in object storage (S3_BUCKET), the sentence the backup and restore commands print and
 * leave beside the database copy. The bucket is backed up by its own means, as an agency's storage
 * team runs it: versioning on, so a restored database finds every file it names (stored names are
 * never reused or overwritten), and noncurrent versions kept at least as long as database backups.
 */
export function uploadsBackupNote(): string | null {
  const store = fileStore();
  if (store.kind === 'disk') return null;
  return (
    `Photos and PDFs are in object storage (${store.describe()}) and are not copied here: back the bucket up by its own means ` +
    '(keep versioning on and noncurrent versions at least as long as these backups, or replicate it), so a restored database finds every file it names.'
  );
}

/**
 * Writes a consistent copy of the SQLite database (VACUUM INTO takes a snapshot while the app keeps
 * running) and a copy of the uploads to DATA_DIR/backups/chordline-<UTC stamp>/. Returns that folder.
 * With object storage the uploads stay in the bucket and the folder holds {@link UPLOADS_NOTE_FILE}.
 */
export async function backupSqlite(sequelize: Sequelize, now = new Date()): Promise<string> {
  if (sequelize.getDialect() !== 'sqlite') {
    throw new Error('npm run backup copies the SQLite store; for PostgreSQL use pg_dump.');
  }
  const root = path.join(dataDir(), 'backups');
  let target = path.join(root, `chordline-${stamp(now)}`);
  for (let n = 2; fs.existsSync(target); n++) target = path.join(root, `chordline-${stamp(now)}-${n}`);
  fs.mkdirSync(target, { recursive: true });
  const dbCopy = path.join(target, DB_FILE);
  await sequelize.query('VACUUM INTO ?', { replacements: [dbCopy] });
  const note = uploadsBackupNote();
  if (note) {
    fs.writeFileSync(path.join(target, UPLOADS_NOTE_FILE), `${note}\n`);
    return target;
  }
  const uploads = path.join(dataDir(), 'uploads');
  if (fs.existsSync(uploads)) fs.cpSync(uploads, path.join(target, 'uploads'), { recursive: true });
  return target;
}

/**
 * Restores a backup made by {@link backupSqlite}: `source` is the backup folder or its database file.
 * The current database and uploads are first moved aside to DATA_DIR/backups/replaced-<stamp>/, so a
 * restore can itself be undone. Run it with the server stopped.
 */
export function restoreSqlite(source: string, now = new Date()): { restoredFrom: string; previous: string } {
  const resolved = path.resolve(source);
  const folder = fs.existsSync(resolved) && fs.statSync(resolved).isDirectory() ? resolved : path.dirname(resolved);
  const dbCopy = fs.existsSync(resolved) && fs.statSync(resolved).isFile() ? resolved : path.join(folder, DB_FILE);
  if (!fs.existsSync(dbCopy)) throw new Error(`No backup database at ${dbCopy}.`);
  const header = Buffer.alloc(16);
  const fd = fs.openSync(dbCopy, 'r');
  fs.readSync(fd, header, 0, 16, 0);
  fs.closeSync(fd);
  if (header.toString('latin1') !== 'SQLite format 3\u0000') throw new Error(`${dbCopy} is not a SQLite database.`);

  const dir = dataDir();
  const previous = path.join(dir, 'backups', `replaced-${stamp(now)}`);
  fs.mkdirSync(previous, { recursive: true });
  for (const suffix of ['', '-wal', '-shm']) {
    const live = path.join(dir, DB_FILE + suffix);
    if (fs.existsSync(live)) fs.renameSync(live, path.join(previous, DB_FILE + suffix));
  }
  const uploads = path.join(dir, 'uploads');
  if (fs.existsSync(uploads)) fs.renameSync(uploads, path.join(previous, 'uploads'));

  fs.copyFileSync(dbCopy, path.join(dir, DB_FILE));
  const savedUploads = path.join(folder, 'uploads');
  if (fs.existsSync(savedUploads)) fs.cpSync(savedUploads, uploads, { recursive: true });
  return { restoredFrom: dbCopy, previous };
}
