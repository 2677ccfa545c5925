/**
 * The production app served on loopback for a benchmark or an outside check (not a test): builds
 * `distDir` when it has no build yet (or when asked), prepares a fresh data folder with the demo
 * accounts and bridges, starts `next start` on a free port with NEXTAUTH_URL set to its own address,
 * and waits until /api/health answers. `stop()` ends the server's process group and removes the data.
 */
import { spawn, execFileSync, type StdioOptions } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from '../support/free-port';
import { csrfJar } from '../support/csrf-jar';

const root = path.resolve(__dirname, '../..');

export type ServedApp = {
  /** The app's origin, e.g. http://127.0.0.1:41234 (send it as Origin on writes). */
  base: string;
  /** The fresh data folder the server uses (DATA_DIR). */
  dataDir: string;
  /** Stops the server and removes the data folder; safe to call twice. */
  stop: () => void;
};

export type ServeOptions = {
  /** Build folder (NEXT_DIST_DIR). */
  distDir: string;
  /** Rebuild even when the folder holds a build. */
  rebuild?: boolean;
  /** Prefix of the temporary data folder's name. */
  label?: string;
  /** Longest wait for the first health answer, ms. */
  startTimeoutMs?: number;
  /** Print the build's and the preparation's output (default: yes). */
  verbose?: boolean;
  /** File the server's own output goes to (default: none). */
  serverLog?: string;
  /** Extra environment for the server (e.g. COMPUTE_WORKERS). */
  env?: Record<string, string>;
};

/** Waits until `url` answers 2xx, polling every 250 ms; throws after `ms`. */
export async function waitFor(url: string, ms: number): Promise<void> {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {}
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no answer from ${url}`);
}

/** Builds when needed, prepares fresh demo data and serves the app; see the file's comment. */
export async function startServedApp(opts: ServeOptions): Promise<ServedApp> {
  const stdio: StdioOptions = opts.verbose === false ? 'ignore' : 'inherit';
  if (opts.rebuild || !fs.existsSync(path.join(root, opts.distDir, 'BUILD_ID'))) {
    execFileSync('npx', ['next', 'build'], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: opts.distDir, NEXT_TELEMETRY_DISABLED: '1' }, stdio });
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), `${opts.label ?? 'chordline-served'}-`));
  const env: NodeJS.ProcessEnv = { ...process.env, ...opts.env, DATA_DIR: dataDir, NEXT_DIST_DIR: opts.distDir, NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1' };
  delete env.CHORDLINE_NO_DEMO;
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const out = opts.serverLog ? fs.openSync(opts.serverLog, 'a') : 'ignore';
  const server = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], { cwd: root, env: { ...env, NEXTAUTH_URL: base }, stdio: ['ignore', out, out], detached: true });
  if (typeof out === 'number') fs.closeSync(out);
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    try {
      process.kill(-server.pid!, 'SIGTERM');
    } catch {}
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitFor(`${base}/api/health`, opts.startTimeoutMs ?? 120_000);
  } catch (err) {
    stop();
    throw err;
  }
  return { base, dataDir, stop };
}

/**
 * Signs in through next-auth's credentials flow (with the demo password unless given) and returns the
 * session cookie as `name=value`.
 */
export async function signInCookie(base: string, email: string, password = 'chordline-demo'): Promise<string> {
  const { csrfToken, jar } = await csrfJar(base);
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar, origin: base },
    body: new URLSearchParams({ csrfToken, email, password }),
  });
  const session = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.includes('session-token'));
  if (!session) throw new Error(`sign-in failed for ${email}`);
  return session;
}
