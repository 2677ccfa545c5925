import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import { freePort } from '../support/free-port';

export const ROOT = path.resolve(__dirname, '../..');

/** A PostgreSQL database of its own for the cluster test, and how to drop it (and the server, when this test started one). */
export type TestDatabase = { url: string; drop(): Promise<void> };

async function admin(adminUrl: string, sql: string): Promise<void> {
  const client = new Client({ connectionString: adminUrl });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/**
 * A fresh database on the PostgreSQL server PG_ADMIN_URL names; without it, a throwaway server started
 * through .ci/start-postgres (the script CI uses; it installs Debian's postgresql when missing, which
 * needs root as in CI), stopped again by `drop`.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  let adminUrl = process.env.PG_ADMIN_URL;
  let ctlFile: string | null = null;
  if (!adminUrl) {
    ctlFile = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-cluster-pg-')), 'ctl');
    adminUrl = execFileSync('bash', [path.join(ROOT, '.ci/start-postgres')], { env: { ...process.env, PG_DATA_FILE: ctlFile }, encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] }).trim();
  }
  const name = `chordline_cluster_${crypto.randomBytes(6).toString('hex')}`;
  await admin(adminUrl, `CREATE DATABASE ${name}`);
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    async drop() {
      if (ctlFile) {
        const ctl = fs.readFileSync(ctlFile, 'utf8').trim();
        const stop = `${ctl} -m fast stop`;
        if (process.getuid?.() === 0) execFileSync('su', ['postgres', '-s', '/bin/sh', '-c', stop], { stdio: 'ignore' });
        else execFileSync('sh', ['-c', stop], { stdio: 'ignore' });
        fs.rmSync(path.dirname(ctlFile), { recursive: true, force: true });
        const dataDir = ctl.split(' -D ')[1];
        if (dataDir?.startsWith(path.join(os.tmpdir(), 'chordline-pg-'))) fs.rmSync(dataDir, { recursive: true, force: true });
      } else {
        await admin(adminUrl, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      }
    },
  };
}

/** One running production app server (`next start` of an existing build) with its own data folder. */
export type AppServer = { url: string; dataDir: string; child: ChildProcess; stop(): void };

async function waitForHealth(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`The server did not answer ${url}/api/health in time`);
}

/**
 * Runs migrations and the demo seed once, as an operator does before starting the servers. Spawned,
 * not run synchronously: the demo photo goes to the fake S3 server, which runs in this process.
 */
export async function prepareDatabase(env: NodeJS.ProcessEnv): Promise<void> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-cluster-prepare-'));
  try {
    const child = spawn('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: ROOT, env: { ...env, DATA_DIR: dataDir }, stdio: ['ignore', 'inherit', 'inherit'] });
    const code = await new Promise<number | null>((resolve, reject) => {
      child.once('exit', resolve);
      child.once('error', reject);
    });
    if (code !== 0) throw new Error(`lib/cli/prepare.ts exited with code ${code}`);
  } finally {
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

/** Starts `next start` on a free loopback port with the given settings and a fresh data folder of its own. */
export async function startAppServer(distDir: string, env: NodeJS.ProcessEnv): Promise<AppServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-cluster-app-'));
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: ROOT,
    env: { ...env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' },
    stdio: ['ignore', 'inherit', 'inherit'],
    detached: true,
  });
  const stop = () => {
    try {
      process.kill(-child.pid!, 'SIGTERM');
    } catch {
      // Already gone.
    }
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForHealth(url, child, 120_000);
  } catch (err) {
    stop();
    throw err;
  }
  return { url, dataDir, child, stop };
}
