/**
 * 3D view benchmark (not a test): `npm run bench:scene`.
 * Builds the app when needed (into .next-bench-scene), serves it on loopback with a fresh data folder
 * and the demo data, signs in as the demo engineer in headless Chromium with software WebGL
 * (SwiftShader), opens each demo bridge's 3D view and prints how long the first three frames took,
 * with the draw calls and triangles. The browser test checks the picture; only this prints times, which
 * depend on the machine and its load (run it on a quiet machine to compare).
 */
import os from 'node:os';
import { chromium } from 'playwright-core';
import { signIn } from '../e2e/browser';
import { startServedApp } from './served-app';

const distDir = process.env.BENCH_DIST_DIR || '.next-bench-scene';
const rounds = Number(process.env.BENCH_SCENE_ROUNDS ?? 2);

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
  const app = await startServedApp({ distDir, rebuild: process.env.BENCH_REBUILD === '1', label: 'chordline-bench-scene' });
  try {
    await measure(app.base);
  } finally {
    app.stop();
  }
}

main().catch((err) => {
  console.error(`[chordline] scene benchmark failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
