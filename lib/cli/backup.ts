/** `npm run backup`: a consistent copy of the SQLite database and the uploads under DATA_DIR/backups. */
import { db, closeDb } from '@/lib/db/connection';
import { backupSqlite, uploadsBackupNote } from '@/lib/backup/backup';

async function main() {
  const target = await backupSqlite(await db());
  await closeDb();
  console.log(`[chordline] backup written to ${target}`);
  const note = uploadsBackupNote();
  if (note) console.log(`[chordline] ${note}`);
}

main().catch((err) => {
  console.error(`[chordline] backup failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
