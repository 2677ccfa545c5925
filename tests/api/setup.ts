import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll } from 'vitest';

// Every API test file runs against its own real SQLite file in a fresh temp folder.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-api-'));
process.env.DATA_DIR = dir;
process.env.NEXTAUTH_SECRET = 'test-secret-for-api-tests-only';
process.env.NEXTAUTH_URL = 'http://localhost:3000';
process.env.CHORDLINE_NO_DEMO = '1';

afterAll(async () => {
  const { closeDb } = await import('@/lib/db/connection');
  await closeDb();
  if (!process.env.DATABASE_URL) fs.rmSync(dir, { recursive: true, force: true });
});
