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
import os from 'node:os';
import autocannon from 'autocannon';
import { signInCookie, startServedApp } from './served-app';
import { variedBridge } from './load-bridge';

const distDir = process.env.LOADTEST_DIST_DIR || '.next-loadtest';
const seconds = Number(process.env.LOADTEST_SECONDS ?? 15);
const connections = Number(process.env.LOADTEST_CONNECTIONS ?? 8);

/** The machine's load average, 1, 5 and 15 minutes (the figure `uptime` shows). */
const loadNow = () =>
  os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(', ');
const workers = process.env.COMPUTE_WORKERS ? `COMPUTE_WORKERS=${process.env.COMPUTE_WORKERS}` : 'default compute workers';

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
  const app = await startServedApp({ distDir, rebuild: process.env.LOADTEST_REBUILD === '1', label: 'chordline-load', startTimeoutMs: 60_000 });
  const base = app.base;
  try {
    const cookie = await signInCookie(base, 'engineer@example.com');
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
    const loadBefore = loadNow();
    const healthRuns: autocannon.Result[] = [];
    const computeRuns: autocannon.Result[] = [];
    for (let r = 0; r < rounds; r++) {
      healthRuns.push(await run({ url: `${base}/api/health`, duration: seconds / rounds, connections }));
      computeRuns.push(await run({ url: base, requests: computeRequests, duration: seconds / rounds, connections }));
    }
    const health = combine(healthRuns);
    const compute = combine(computeRuns);
    console.log(`\nLoad benchmark: ${connections} connections, ${seconds} s per route in ${rounds} alternating rounds, ${os.cpus().length} cores, ${workers}`);
    console.log(`load average before ${loadBefore}, after ${loadNow()} (1, 5, 15 min)`);
    console.log(`compute bodies: ${sent} different held-out bridges (40th points, geometry varied per request)`);
    line('GET  /api/health', health);
    line('POST /api/compute', compute);
    const ratio = compute.rps / health.rps;
    const clean = health.errors + compute.errors + health.non2xx + compute.non2xx + health.timeouts + compute.timeouts === 0;
    console.log(`compute / health = ${ratio.toFixed(2)} (target ≥ 0.50)   ${clean ? 'no errors' : 'ERRORS SEEN'}`);
    process.exitCode = ratio >= 0.5 && clean ? 0 : 1;
  } finally {
    app.stop();
  }
}

main().catch((err) => {
  console.error(`[chordline] load benchmark failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
