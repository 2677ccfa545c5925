import fs from 'node:fs';
import path from 'node:path';
import { Sequelize } from 'sequelize';
import sqlite3 from 'sqlite3';
import { Umzug, SequelizeStorage } from 'umzug';
import { dataDir, usesPostgres } from '@/lib/config';
import { initModels } from '@/models';
import { migrations } from '@/migrations';

/** Opens the store: PostgreSQL when DATABASE_URL says so, else the SQLite file in DATA_DIR. */
function openSequelize(): Sequelize {
  if (usesPostgres()) {
    return new Sequelize(process.env.DATABASE_URL as string, { dialect: 'postgres', logging: false });
  }
  const dir = dataDir();
  fs.mkdirSync(dir, { recursive: true });
  return new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqlite3,
    storage: path.join(dir, 'chordline.sqlite'),
    logging: false,
    // One connection: SQLite serialises writers anyway, and WAL lets readers go on meanwhile.
    pool: { max: 1, min: 0, idle: 10000 },
  });
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
    await sequelize.query('PRAGMA busy_timeout=5000;');
    await sequelize.query('PRAGMA foreign_keys=ON;');
  }
  await migrate(sequelize);
  return sequelize;
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
