/**
 * 3D view benchmark (not a test): `npm run bench:scene`.
 * Builds the app when needed (into .next-bench-scene), serves it on loopback with a fresh data folder
 * and the demo data, signs in as the demo engineer in headless Chromium with software WebGL
 * (SwiftShader), opens each demo bridge's 3D view and prints how long the first three frames took,
 * with the draw calls and triangles. The browser test checks the picture; only this prints times, which
 * depend on the machine and its load (run it on a quiet machine to compare).
 */
import { spawn, execFileSync } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { signIn } from '../e2e/browser';

const root = path.resolve(__dirname, '../..');
const distDir = process.env.BENCH_DIST_DIR || '.next-bench-scene';
const rounds = Number(process.env.BENCH_SCENE_ROUNDS ?? 2);

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

/** Opens each bridge's view `rounds` times and prints the time to three drawn frames. */
async function measure(base: string): Promise<void> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--use-angle=swiftshader',
      '--enable-unsafe-swiftshader',
      '--ignore-gpu-blocklist',
    ],
  });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    await signIn(page, base, 'engineer@example.com');
    const body = await (await page.request.get(`${base}/api/bridges`)).json();
    const bridges: Array<{ id: number; name: string }> = Array.isArray(body) ? body : body.bridges;
    console.log(`\n3D view benchmark: ${bridges.length} demo bridges, ${rounds} rounds, ${os.cpus().length} cores, load ${os.loadavg()[0].toFixed(1)}`);
    for (let r = 1; r <= rounds; r++) {
      for (const b of bridges) {
        const started = Date.now();
        await page.goto(`${base}/bridges/${b.id}/view?stats=1`);
        await page.waitForFunction(() => Number(document.querySelector('[data-testid=render-stats]')?.getAttribute('data-frames') ?? 0) >= 3, null, { timeout: 600_000 });
        const ms = Date.now() - started;
        const s = await page.evaluate(() => {
          const el = document.querySelector('[data-testid=render-stats]') as HTMLElement;
          return { calls: Number(el.dataset.drawCalls), triangles: Number(el.dataset.triangles) };
        });
        console.log(`round ${r}  ${b.name.padEnd(40)} first 3 frames ${String(ms).padStart(6)} ms   ${s.calls} draw calls   ${s.triangles} triangles`);
      }
    }
  } finally {
    await browser.close();
  }
}

async function main() {
  if (!fs.existsSync(path.join(root, distDir, 'BUILD_ID')) || process.env.BENCH_REBUILD === '1') {
    execFileSync('npx', ['next', 'build'], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' }, stdio: 'inherit' });
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-bench-scene-'));
  const env = { ...process.env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NODE_ENV: 'production' as const, NEXT_TELEMETRY_DISABLED: '1' };
  delete (env as Record<string, string | undefined>).CHORDLINE_NO_DEMO;
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio: 'inherit' });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], { cwd: root, env: { ...env, NEXTAUTH_URL: base }, stdio: 'ignore', detached: true });
  try {
    await waitFor(`${base}/api/health`, 120_000);
    await measure(base);
  } finally {
    try {
      process.kill(-server.pid!, 'SIGTERM');
    } catch {}
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(`[chordline] scene benchmark failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
