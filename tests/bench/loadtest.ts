/**
 * Load benchmark (not a test): `npm run loadtest`.
 * Builds the app when needed, serves the production server on loopback with a fresh data folder, signs
 * in as the demo engineer, then drives GET /api/health (the framework's floor) and POST /api/compute
 * in the same run, and prints requests per second, p50/p99 latency, errors and the compute/health
 * ratio. Target: compute ≥ 0.5 × health, no errors, no non-2xx.
 *
 * The compute body is a held-out bridge (not one of the demo bridges the tests use): the three-span
 * demo layout at 40th points (points_per_span 40), whose curve radius, deck edges and girder offsets
 * differ slightly in every request, so no cache of any kind can stand in for the engine's work.
 */
import { spawn, execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import net from 'node:net';
import autocannon from 'autocannon';
import { demoBridges } from '../../lib/demo/bridges';

const root = path.resolve(__dirname, '../..');
const distDir = process.env.LOADTEST_DIST_DIR || '.next-loadtest';
const seconds = Number(process.env.LOADTEST_SECONDS ?? 15);
const connections = Number(process.env.LOADTEST_CONNECTIONS ?? 8);

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

async function waitFor(url: string, ms: number) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    try {
      if ((await fetch(url)).ok) return;
    } catch {}
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no answer from ${url}`);
}

/** Signs in through next-auth's credentials flow and returns the session cookie. */
async function signIn(base: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const csrfCookie = (csrfRes.headers.getSetCookie?.() ?? []).map((c) => c.split(';')[0]).join('; ');
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: csrfCookie, origin: base },
    body: new URLSearchParams({ csrfToken, email: 'engineer@example.com', password: 'chordline-demo' }),
  });
  const session = (res.headers.getSetCookie?.() ?? []).map((c) => c.split(';')[0]).find((c) => c.includes('session-token'));
  if (!session) throw new Error('sign-in failed');
  return session;
}

/**
 * The n-th request's bridge: 40th points, and a curve radius, deck edge offsets and girder offsets
 * moved by a few thousandths of a foot that change with n, so every body computes a different table.
 */
export function variedBridge(n: number): string {
  const b = structuredClone(demoBridges[0]) as (typeof demoBridges)[0];
  const nudge = ((n * 7919) % 1000) / 1000; // 0 … 0.999, a different value each request
  b.name = `Held-out load bridge ${n}`;
  b.points_per_span = 40;
  b.alignment.elements = b.alignment.elements.map((e) => (e.type === 'arc' ? { ...e, radius: e.radius + nudge * 5 } : e));
  b.deck = { ...b.deck, left_edge_offset: b.deck.left_edge_offset - nudge * 0.01, right_edge_offset: b.deck.right_edge_offset + nudge * 0.01 };
  b.girders = b.girders.map((g) => ({ ...g, offsets: g.offsets.map((o, i) => o + (i % 2 ? 1 : -1) * nudge * 0.004) }));
  return JSON.stringify(b);
}

function run(opts: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => autocannon(opts, (err, result) => (err ? reject(err) : resolve(result))));
}

type Combined = { rps: number; p50: number; p99: number; errors: number; non2xx: number; timeouts: number };

/** Rounds added up: requests over seconds; p50 the median of the rounds', p99 the worst round's. */
function combine(runs: autocannon.Result[]): Combined {
  const total = runs.reduce((n, r) => n + r.requests.total, 0);
  const secs = runs.reduce((n, r) => n + r.duration, 0);
  const p50s = runs.map((r) => r.latency.p50).sort((a, b) => a - b);
  return {
    rps: total / secs,
    p50: p50s[Math.floor(p50s.length / 2)],
    p99: Math.max(...runs.map((r) => r.latency.p99)),
    errors: runs.reduce((n, r) => n + r.errors, 0),
    non2xx: runs.reduce((n, r) => n + r.non2xx, 0),
    timeouts: runs.reduce((n, r) => n + r.timeouts, 0),
  };
}

function line(name: string, r: Combined) {
  console.log(
    `${name.padEnd(22)} ${r.rps.toFixed(0).padStart(7)} req/s   p50 ${String(r.p50).padStart(4)} ms   p99 ${String(r.p99).padStart(4)} ms   errors ${r.errors}   non-2xx ${r.non2xx}   timeouts ${r.timeouts}`,
  );
}

async function main() {
  if (!fs.existsSync(path.join(root, distDir, 'BUILD_ID')) || process.env.LOADTEST_REBUILD === '1') {
    execFileSync('npx', ['next', 'build'], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' }, stdio: 'inherit' });
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-load-'));
  const env = { ...process.env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NODE_ENV: 'production' as const, NEXT_TELEMETRY_DISABLED: '1' };
  delete (env as Record<string, string | undefined>).CHORDLINE_NO_DEMO;
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio: 'inherit' });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    cwd: root,
    env: { ...env, NEXTAUTH_URL: base },
    stdio: 'ignore',
    detached: true,
  });
  try {
    await waitFor(`${base}/api/health`, 60000);
    const cookie = await signIn(base);
    let sent = 0;
    const headers = { cookie, 'content-type': 'application/json', origin: base };
    // Every compute request gets its own bridge (autocannon calls setupRequest before each request).
    const computeRequests: autocannon.Request[] = [{ method: 'POST', path: '/api/compute', headers, setupRequest: (req) => ({ ...req, body: variedBridge(sent++) }) }];
    // Warm both routes so neither pays first-request compilation of its chunks or worker start-up.
    await run({ url: `${base}/api/health`, duration: 2, connections });
    await run({ url: base, requests: computeRequests, duration: 3, connections });
    // Alternate the two routes in short rounds so a drift in machine load (other work on a shared
    // 2-core box) falls on both alike, then add the rounds up.
    const rounds = Number(process.env.LOADTEST_ROUNDS ?? 3);
    const healthRuns: autocannon.Result[] = [];
    const computeRuns: autocannon.Result[] = [];
    for (let r = 0; r < rounds; r++) {
      healthRuns.push(await run({ url: `${base}/api/health`, duration: seconds / rounds, connections }));
      computeRuns.push(await run({ url: base, requests: computeRequests, duration: seconds / rounds, connections }));
    }
    const health = combine(healthRuns);
    const compute = combine(computeRuns);
    console.log(`\nLoad benchmark: ${connections} connections, ${seconds} s per route in ${rounds} alternating rounds, ${os.cpus().length} cores`);
    console.log(`compute bodies: ${sent} different held-out bridges (40th points, geometry varied per request)`);
    line('GET  /api/health', health);
    line('POST /api/compute', compute);
    const ratio = compute.rps / health.rps;
    const clean = health.errors + compute.errors + health.non2xx + compute.non2xx + health.timeouts + compute.timeouts === 0;
    console.log(`compute / health = ${ratio.toFixed(2)} (target ≥ 0.50)   ${clean ? 'no errors' : 'ERRORS SEEN'}`);
    process.exitCode = ratio >= 0.5 && clean ? 0 : 1;
  } finally {
    try {
      process.kill(-server.pid!, 'SIGTERM');
    } catch {}
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(`[chordline] load benchmark failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
