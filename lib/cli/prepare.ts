/**
 * Run before the server starts: creates the data folder and the session secret, applies pending
 * migrations and, on an empty database, adds the demo data (unless CHORDLINE_NO_DEMO=1 or --no-demo).
 */
import { db, closeDb } from '@/lib/db/connection';
import { authSecret } from '@/lib/auth/secret';
import { dataDir, demoSeedEnabled, usesPostgres } from '@/lib/config';
import { seedDemo } from '@/migrations/demo-seed';

async function main() {
  const noDemo = process.argv.includes('--no-demo') || !demoSeedEnabled();
  authSecret();
  const sequelize = await db();
  console.log(`[chordline] database ready (${usesPostgres() ? 'PostgreSQL' : `SQLite in ${dataDir()}`})`);
  if (!noDemo && (await seedDemo(sequelize))) {
    console.log('[chordline] empty database: added the demo accounts and demo bridges (change the demo passwords!)');
  }
  await closeDb();
}

main().catch((err) => {
  console.error(`[chordline] could not prepare the database: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
