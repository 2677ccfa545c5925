/** `npm run restore -- <backup folder or its chordline.sqlite>`: run with the server stopped. */
import { restoreSqlite, uploadsBackupNote } from '@/lib/backup/backup';

const source = process.argv[2];
if (!source) {
  console.error('Usage: npm run restore -- <backup folder or its chordline.sqlite>');
  process.exit(1);
}
try {
  const { restoredFrom, previous } = restoreSqlite(source);
  console.log(`[chordline] restored ${restoredFrom}; the replaced database and uploads are in ${previous}`);
  const note = uploadsBackupNote();
  if (note) console.log(`[chordline] only the database was restored. ${note}`);
} catch (err) {
  console.error(`[chordline] restore failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
}
