import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { db, closeDb } from '@/lib/db/connection';
import { backupSqlite, restoreSqlite, uploadsBackupNote, UPLOADS_NOTE_FILE } from '@/lib/backup/backup';
import { createBridge, listBridges, renameBridge } from '@/lib/services/bridges';
import { demoBridges } from '@/lib/demo/bridges';
import { makeUsers } from './helpers';
import { useFileBackend } from '../support/file-backends';

const onPostgres = Boolean(process.env.DATABASE_URL);

describe('backup and restore', () => {
  it('round trips the database and the uploads (SQLite) or points to pg_dump (PostgreSQL)', async () => {
    if (onPostgres) {
      await expect(backupSqlite(await db())).rejects.toThrow(/pg_dump/);
      return;
    }
    const people = await makeUsers();
    const actor = { id: people.engineer.id, email: people.engineer.email, name: 'Test engineer', role: 'engineer' as const };
    const { id } = await createBridge(actor, { name: 'Before backup', description: demoBridges[0] });
    const uploads = path.join(process.env.DATA_DIR as string, 'uploads');
    fs.mkdirSync(uploads, { recursive: true });
    fs.writeFileSync(path.join(uploads, 'photo-1.bin'), 'first photo bytes');

    const target = await backupSqlite(await db());
    expect(fs.existsSync(path.join(target, 'chordline.sqlite'))).toBe(true);

    // Change everything after the backup: rename, add a bridge, replace the upload.
    await renameBridge(actor, String(id), 'After backup');
    await createBridge(actor, { name: 'Added later', description: demoBridges[1] });
    fs.writeFileSync(path.join(uploads, 'photo-1.bin'), 'changed');
    await closeDb();

    const { previous } = restoreSqlite(target);
    const names = (await listBridges()).map((b) => b.name);
    expect(names).toEqual(['Before backup']);
    expect(fs.readFileSync(path.join(uploads, 'photo-1.bin'), 'utf8')).toBe('first photo bytes');
    // The replaced state is kept, so a restore can be undone.
    expect(fs.existsSync(path.join(previous, 'chordline.sqlite'))).toBe(true);
    expect(fs.readFileSync(path.join(previous, 'uploads', 'photo-1.bin'), 'utf8')).toBe('changed');
  });

  it('with uploads in object storage, copies the database and leaves a note naming the bucket instead of the uploads', async () => {
    expect(uploadsBackupNote()).toBeNull();
    const { stop } = await useFileBackend('s3');
    try {
      expect(uploadsBackupNote()).toMatch(/bucket chordline-test at http:\/\/127\.0\.0\.1:\d+.*versioning/);
      if (!onPostgres) {
        // The folder of uploads on disk is left from the test above; in object storage mode it is not what counts.
        const target = await backupSqlite(await db());
        expect(fs.existsSync(path.join(target, 'chordline.sqlite'))).toBe(true);
        expect(fs.existsSync(path.join(target, 'uploads'))).toBe(false);
        expect(fs.readFileSync(path.join(target, UPLOADS_NOTE_FILE), 'utf8')).toMatch(/not copied here/);
      }
    } finally {
      await stop();
    }
    expect(uploadsBackupNote()).toBeNull();
  });

  it('refuses a file that is not a SQLite database', () => {
    const bogus = path.join(process.env.DATA_DIR as string, 'not-a-db.sqlite');
    fs.writeFileSync(bogus, 'hello');
    expect(() => restoreSqlite(bogus)).toThrow(/not a SQLite database/);
  });
});
