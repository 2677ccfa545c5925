import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startSmtpCapture } from './smtp-capture';
import { freePort } from '../support/free-port';

declare module 'vitest' {
  interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
    /** Where the test SMTP server writes each message the app sends (see smtp-capture.ts). */
    mailDir: string;
  }
}

const root = path.resolve(__dirname, '../..');
const distDir = process.env.E2E_DIST_DIR || '.next-test';

async function waitForHealth(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`The server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {}
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`The server did not answer ${url}/api/health in time`);
}

/**
 * Builds the production app into its own folder, prepares a fresh data folder with the demo data and
 * serves it on a free loopback port for the browser tests.
 */
export default async function setup(project: TestProject) {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-e2e-'));
  const env = { ...process.env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' };
  delete (env as Record<string, string | undefined>).CHORDLINE_NO_DEMO;
  // E2E_REUSE_BUILD=1 (never in CI) serves an earlier build of the same folder, for quick reruns while working.
  const reuse = process.env.E2E_REUSE_BUILD === '1' && !process.env.CI && fs.existsSync(path.join(root, distDir, 'BUILD_ID'));
  if (!reuse) execFileSync('npx', ['next', 'build'], { cwd: root, env, stdio: 'inherit' });
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio: 'inherit' });
  const mail = await startSmtpCapture();
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: { ...env, NEXTAUTH_URL: baseUrl, SMTP_URL: mail.url },
    stdio: ['ignore', 'inherit', 'inherit'],
    detached: true,
  });
  await waitForHealth(baseUrl, child, 60000);
  project.provide('baseUrl', baseUrl);
  project.provide('dataDir', dataDir);
  project.provide('mailDir', mail.dir);
  return async () => {
    try {
      process.kill(-child.pid!, 'SIGTERM');
    } catch {}
    await mail.close();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
}
