import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import crypto from 'node:crypto';
import { afterAll, beforeAll } from 'vitest';

// Every API test file runs against its own real database: a SQLite file in a fresh temp folder, or,
// when PG_ADMIN_URL names a PostgreSQL server, a fresh database created on it for this file.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-api-'));
process.env.DATA_DIR = dir;
process.env.NEXTAUTH_SECRET = 'test-secret-for-api-tests-only';
process.env.NEXTAUTH_URL = 'http://localhost:3000';
process.env.CHORDLINE_NO_DEMO = '1';

const adminUrl = process.env.PG_ADMIN_URL;
const pgDatabase = `chordline_test_${crypto.randomBytes(6).toString('hex')}`;

async function pgAdmin(sql: string): Promise<void> {
  const { Client } = await import('pg');
  const client = new Client({ connectionString: adminUrl });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

if (adminUrl) {
  const url = new URL(adminUrl);
  url.pathname = `/${pgDatabase}`;
  process.env.DATABASE_URL = url.toString();
}

beforeAll(async () => {
  if (adminUrl) await pgAdmin(`CREATE DATABASE ${pgDatabase}`);
});

afterAll(async () => {
  const { closeDb } = await import('@/lib/db/connection');
  await closeDb();
  if (adminUrl) await pgAdmin(`DROP DATABASE IF EXISTS ${pgDatabase}`);
  fs.rmSync(dir, { recursive: true, force: true });
});
