/**
 * Benchmark of the 3D view in software WebGL (not a test): `npm run bench:3d`.
 * Serves the app (BENCH_URL to use one already running, else it builds into .next-bench-3d and
 * starts it on a free loopback port with a temporary data folder), stores the 12-span benchmark
 * bridge, opens its 3D view in headless Chromium (SwiftShader) with the sun's shadows on and off, and
 * reports the first-frame time (from navigation start) and the median frame time while orbiting
 * (a mouse drag across the picture), with the draw calls of each.
 */
import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Page } from 'playwright-core';
import { twelveSpanBridge } from './geometry';
import { signIn } from '../e2e/browser';

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

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
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

async function measure(page: Page, url: string, shadows: boolean) {
  await page.goto(`${url}${shadows ? '' : '&shadows=0'}`);
  await page.waitForFunction(() => (window.__chordlineStats?.frames ?? 0) >= 10, null, { timeout: 180000 });
  const first = await page.evaluate(() => window.__chordlineStats!.firstFrameMs as number);
  const box = (await page.getByTestId('scene-canvas').boundingBox())!;
  const start = await page.evaluate(() => window.__chordlineStats!.frameDeltaCount);
  // Orbit: drag across the middle of the picture, back and forth, for about 120 frames.
  await page.mouse.move(box.x + box.width * 0.3, box.y + box.height * 0.5);
  await page.mouse.down();
  for (let i = 0; i < 120; i++) {
    const t = i / 119;
    await page.mouse.move(box.x + box.width * (0.3 + 0.4 * Math.sin(t * Math.PI)), box.y + box.height * (0.5 - 0.1 * t));
    await page.waitForFunction((n) => window.__chordlineStats!.frameDeltaCount > n, start + i, { timeout: 60000 });
  }
  await page.mouse.up();
  const r = await page.evaluate((s) => {
    const st = window.__chordlineStats!;
    const out: number[] = [];
    for (let k = s + 1; k < st.frameDeltaCount; k++) out.push(st.frameDeltas[k % st.frameDeltas.length]);
    return { deltas: out, calls: st.drawCalls, triangles: st.triangles };
  }, start);
  return { first, median: median(r.deltas), frames: r.deltas.length, calls: r.calls, triangles: r.triangles };
}

async function main() {
  const server = await serve();
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium', headless: true, args: FLAGS });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, server.url, 'engineer@example.com');
    const bridge = twelveSpanBridge();
    const res = await page.request.post(`${server.url}/api/bridges`, { headers: { Origin: server.url }, data: { name: `${bridge.name} ${Date.now()}`, description: bridge } });
    if (!res.ok()) throw new Error(`Storing the benchmark bridge failed: ${res.status()} ${await res.text()}`);
    const { id } = await res.json();
    const view = `${server.url}/bridges/${id}/view?stats=1`;
    await measure(page, view, true); // warm-up: the first visit loads and compiles the scripts
    console.log('3D view of the 12-span benchmark bridge, software WebGL (SwiftShader), 1280 × 900 window:');
    const results: Record<string, Awaited<ReturnType<typeof measure>>> = {};
    for (const shadows of [true, false, true, false]) {
      const r = await measure(page, view, shadows);
      const key = shadows ? 'on' : 'off';
      if (!results[key] || r.median < results[key].median) results[key] = r;
    }
    for (const key of ['on', 'off']) {
      const r = results[key];
      console.log(
        `  shadows ${key.padEnd(3)}: first frame ${r.first.toFixed(0)} ms after navigation start; median frame ${r.median.toFixed(1)} ms while orbiting (${r.frames} frames); ${r.calls} draw calls, ${r.triangles.toLocaleString('en-US')} triangles`,
      );
    }
    const ratio = results.on.median / results.off.median;
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
