/**
 * Benchmark of the 3D view in software WebGL (not a test): `npm run bench:3d`.
 * Serves the app (BENCH_URL to use one already running, else it builds into .next-bench-3d unless
 * that folder holds a build (BENCH_DIST_DIR to name another) and starts it on a free loopback port
 * with a temporary data folder), stores the 12-span benchmark bridge, opens its 3D view in headless
 * Chromium (SwiftShader) with the sun's shadows on and off, alternating, and reports for each the
 * first-frame time (from navigation start) and the median frame time while orbiting (a mouse drag
 * across the picture, one step per drawn frame), with the draw calls, and the ratio of the two
 * medians (budget: shadows at most 1.5x). BENCH_FRAMES (default 40) sets the frames per orbit,
 * BENCH_ROUNDS (default 2) how many times each is measured; the best median of each is kept. Every
 * run is printed as it ends, with the machine's load, so a slow machine still leaves figures.
 */
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { twelveSpanBridge } from './geometry';
import { signIn } from '../e2e/browser';
import { freePort } from '../support/free-port';

const root = path.resolve(__dirname, '../..');
const FLAGS = [
  '--no-sandbox',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--use-angle=swiftshader',
  '--enable-unsafe-swiftshader',
  '--ignore-gpu-blocklist',
];

function median(v: number[]): number {
  const s = [...v].sort((a, b) => a - b);
  return s.length ? (s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2) : NaN;
}

async function serve(): Promise<{ url: string; stop: () => void }> {
  if (process.env.BENCH_URL) return { url: process.env.BENCH_URL, stop: () => undefined };
  const distDir = process.env.BENCH_DIST_DIR || '.next-bench-3d';
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-bench-3d-'));
  const env = { ...process.env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' };
  if (!fs.existsSync(path.join(root, distDir, 'BUILD_ID'))) execFileSync('npx', ['next', 'build'], { cwd: root, env, stdio: 'inherit' });
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio: 'inherit' });
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const child: ChildProcess = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], { cwd: root, env: { ...env, NEXTAUTH_URL: url }, stdio: 'ignore', detached: true });
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {}
    await new Promise((r) => setTimeout(r, 300));
  }
  return {
    url,
    stop: () => {
      try {
        process.kill(-child.pid!, 'SIGTERM');
      } catch {}
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

const FRAMES = Math.max(10, Number(process.env.BENCH_FRAMES) || 40);
const ROUNDS = Math.max(1, Number(process.env.BENCH_ROUNDS) || 2);
/** Software WebGL on a busy 2-core machine: a frame can take seconds. */
const WAIT = 300000;

function load(): string {
  return os
    .loadavg()
    .map((v) => v.toFixed(2))
    .join(', ');
}

async function measure(page: Page, url: string, shadows: boolean, frames: number) {
  await page.goto(`${url}${shadows ? '' : '&shadows=0'}`, { timeout: WAIT });
  // Past the first frames (programs compiled, the static shadow map drawn), then orbit.
  await page.waitForFunction(() => (window.__chordlineStats?.frames ?? 0) >= 5, null, { timeout: WAIT, polling: 100 });
  const first = await page.evaluate(() => window.__chordlineStats!.firstFrameMs as number);
  const box = (await page.getByTestId('scene-canvas').boundingBox())!;
  const start = await page.evaluate(() => window.__chordlineStats!.frameDeltaCount);
  // Orbit: drag across the middle of the picture and back, one step per drawn frame.
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.5);
  await page.mouse.down();
  for (let i = 0; i < frames; i++) {
    const t = i / (frames - 1);
    await page.mouse.move(box.x + box.width * (0.3 + 0.4 * Math.sin(t * Math.PI)), box.y + box.height * (0.5 - 0.1 * t));
    await page.waitForFunction((n) => window.__chordlineStats!.frameDeltaCount > n, start + i + 1, { timeout: WAIT, polling: 50 });
  }
  await page.mouse.up();
  const r = await page.evaluate((s) => {
    const st = window.__chordlineStats!;
    const out: number[] = [];
    // Deltas of the frames drawn while orbiting (the first one after the drag began onwards).
    for (let k = s + 1; k < st.frameDeltaCount; k++) out.push(st.frameDeltas[k % st.frameDeltas.length]);
    return { deltas: out, calls: st.drawCalls, peak: st.peakDrawCalls ?? st.drawCalls, triangles: st.triangles };
  }, start);
  return { first, median: median(r.deltas), frames: r.deltas.length, calls: r.calls, peak: r.peak, triangles: r.triangles };
}

async function main() {
  const server = await serve();
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', headless: true, args: FLAGS });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    page.setDefaultTimeout(WAIT);
    await signIn(page, server.url, 'engineer@example.com');
    const bridge = twelveSpanBridge();
    const res = await page.request.post(`${server.url}/api/bridges`, { headers: { Origin: server.url }, data: { name: `${bridge.name} ${Date.now()}`, description: bridge } });
    if (!res.ok()) throw new Error(`Storing the benchmark bridge failed: ${res.status()} ${await res.text()}`);
    const { id } = await res.json();
    const view = `${server.url}/bridges/${id}/view?stats=1`;
    console.log(`3D view of the 12-span benchmark bridge, software WebGL (SwiftShader), 1280 × 900 window, ${FRAMES} frames per orbit, ${ROUNDS} rounds; load average at start ${load()}`);
    await measure(page, view, true, 10); // warm-up: the first visit loads and compiles the scripts
    const results: Record<string, Awaited<ReturnType<typeof measure>>> = {};
    for (let round = 0; round < ROUNDS; round++)
      for (const shadows of round % 2 ? [false, true] : [true, false]) {
        const r = await measure(page, view, shadows, FRAMES);
        const key = shadows ? 'on' : 'off';
        console.log(
          `  round ${round + 1}, shadows ${key.padEnd(3)}: first frame ${r.first.toFixed(0)} ms after navigation start; median frame ${r.median.toFixed(1)} ms while orbiting (${r.frames} frames); ${r.calls} draw calls per frame (${r.peak} in the frame that drew the shadow map), ${r.triangles.toLocaleString('en-US')} triangles; load ${load()}`,
        );
        if (!results[key] || r.median < results[key].median) results[key] = r;
      }
    const ratio = results.on.median / results.off.median;
    console.log(`  best medians: shadows on ${results.on.median.toFixed(1)} ms, off ${results.off.median.toFixed(1)} ms per frame`);
    console.log(`  shadows cost ${ratio.toFixed(2)}× the frame time without them (budget 1.5×: ${ratio <= 1.5 ? 'met' : 'MISSED'})`);
  } finally {
    await browser.close();
    server.stop();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
