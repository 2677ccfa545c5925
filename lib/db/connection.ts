import path from 'node:path';
import { Sequelize, Transaction } from 'sequelize';
import sqlite3 from 'sqlite3';
import { Umzug, SequelizeStorage } from 'umzug';
import { dataDir, usesPostgres } from '@/lib/config';
import { initModels } from '@/models';
import { migrations } from '@/migrations';
import { preparePrivateStore } from './private-files';

/** Opens the store: PostgreSQL when DATABASE_URL says so, else the SQLite file in DATA_DIR. */
function openSequelize(): Sequelize {
  if (usesPostgres()) {
    return new Sequelize(process.env.DATABASE_URL as string, { dialect: 'postgres', logging: false });
  }
  const dir = dataDir();
  const storage = path.join(dir, 'chordline.sqlite');
  // The store is readable by the server's user only (0700 folder, 0600 files).
  preparePrivateStore(dir, storage);
  return new Sequelize({
    dialect: 'sqlite',
    dialectModule: { ...sqlite3, Database: PatientDatabase },
    storage,
    logging: false,
    // Sequelize opens a separate SQLite connection per transaction. IMMEDIATE takes the write lock at
    // BEGIN, so a transaction that reads and then writes never fails halfway on a lock upgrade; it
    // waits its turn instead (busy timeout below).
    transactionType: Transaction.TYPES.IMMEDIATE,
  });
}

/** Milliseconds a connection waits for another writer before SQLite reports the database busy. */
const BUSY_TIMEOUT_MS = 5000;

/** sqlite3's Database with a busy timeout on every connection, including each transaction's own. */
class PatientDatabase extends sqlite3.Database {
  constructor(filename: string, mode?: number, callback?: (err: Error | null) => void) {
    super(filename, mode as number, (err: Error | null) => {
      if (!err) this.configure('busyTimeout', BUSY_TIMEOUT_MS);
      callback?.(err);
    });
  }
}

/** Applies every pending migration. Safe to call repeatedly and from several processes. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const umzug = new Umzug({
    migrations: migrations.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
  const done = await umzug.up();
  return done.map((m) => m.name);
}

async function connect(): Promise<Sequelize> {
  const sequelize = openSequelize();
  if (sequelize.getDialect() === 'sqlite') {
    await sequelize.query('PRAGMA journal_mode=WAL;');
    await sequelize.query('PRAGMA foreign_keys=ON;');
  }
  await migrate(sequelize);
  if (sequelize.getDialect() === 'sqlite') serialiseTransactions(sequelize);
  return sequelize;
}

/**
 * SQLite has one writer at a time, and sqlite3 waits for a lock on one of libuv's few worker threads:
 * a dozen transactions waiting at once would take every thread and starve the one holding the lock.
 * So this process runs its managed transactions one after another (waiting costs no thread), and the
 * busy timeout only covers other processes (the backup command, a second server).
 */
function serialiseTransactions(sequelize: Sequelize): void {
  const original = sequelize.transaction.bind(sequelize) as (...args: unknown[]) => Promise<unknown>;
  let tail: Promise<unknown> = Promise.resolve();
  (sequelize as unknown as { transaction: (...args: unknown[]) => Promise<unknown> }).transaction = (...args: unknown[]) => {
    const managed = args.some((a) => typeof a === 'function');
    if (!managed) return original(...args);
    const run = tail.then(() => original(...args));
    tail = run.catch(() => undefined);
    return run;
  };
}

const holder = globalThis as unknown as { __chordlineDb?: { key: string; ready: Promise<Sequelize> } };

// The connection is shared process-wide, but the server bundles each carry their own copy of the
// model classes, so every copy of this module binds its own models to the shared connection.
let boundTo: Sequelize | null = null;

function bind(sequelize: Sequelize): Sequelize {
  if (boundTo !== sequelize) {
    initModels(sequelize);
    boundTo = sequelize;
  }
  return sequelize;
}

/**
 * The shared connection, migrated and with models bound. Keyed by the store location so a test that
 * points DATA_DIR elsewhere gets a fresh connection.
 */
export function db(): Promise<Sequelize> {
  const key = usesPostgres() ? (process.env.DATABASE_URL as string) : dataDir();
  if (!holder.__chordlineDb || holder.__chordlineDb.key !== key) {
    const ready = connect();
    holder.__chordlineDb = { key, ready };
    ready.catch(() => {
      if (holder.__chordlineDb?.ready === ready) holder.__chordlineDb = undefined;
    });
  }
  return holder.__chordlineDb.ready.then(bind);
}

/** Closes the shared connection (CLI and tests). */
export async function closeDb(): Promise<void> {
  const current = holder.__chordlineDb;
  holder.__chordlineDb = undefined;
  boundTo = null;
  if (current) await (await current.ready).close();
}
