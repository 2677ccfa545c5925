import path from 'node:path';

/** Folder for the SQLite file, uploads, the local outbox and generated secrets. Read at call time so tests can point it at a temp folder. */
export function dataDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.env.DATA_DIR || './data');
}

/** True when DATABASE_URL selects PostgreSQL instead of the SQLite file in the data folder. */
export function usesPostgres(): boolean {
  return /^postgres(ql)?:\/\//.test(process.env.DATABASE_URL ?? '');
}

/** The demo seed runs on an empty database unless CHORDLINE_NO_DEMO=1. */
export function demoSeedEnabled(): boolean {
  return process.env.CHORDLINE_NO_DEMO !== '1';
}
