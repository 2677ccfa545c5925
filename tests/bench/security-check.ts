/**
 * Outside check of issue 11 (not a test: it times things): `npx tsx tests/bench/security-check.ts`.
 * Serves the production build (SECURITY_DIST_DIR, default .next-loadtest; built when missing) on
 * loopback with fresh demo data, repeats the reported attacks over HTTP and prints each answer's
 * status, then times /api/health while the heaviest allowed compute and a large photo run.
 */
import { spawn, execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import net from 'node:net';
import zlib from 'node:zlib';
import { demoBridges } from '../../lib/demo/bridges';

const root = path.resolve(__dirname, '../..');
const distDir = process.env.SECURITY_DIST_DIR || '.next-loadtest';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

async function signIn(base: string, email: string): Promise<string> {
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const jar = csrfRes.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const res = await fetch(`${base}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: jar, origin: base },
    body: new URLSearchParams({ csrfToken, email, password: 'chordline-demo' }),
  });
  const session = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.includes('session-token'));
  if (!session) throw new Error(`sign-in failed for ${email}`);
  return session;
}

function png(w: number, h: number): Buffer {
  const chunk = (type: string, data: Buffer) => {
    const len = Buffer.alloc(4);
    len.writeUInt32BE(data.length);
    const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
    const crc = Buffer.alloc(4);
    crc.writeUInt32BE(zlib.crc32(body));
    return Buffer.concat([len, body, crc]);
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr.set([8, 2, 0, 0, 0], 8);
  // Rows of zero bytes: tiny compressed, w × h × 3 bytes once decoded.
  const raw = Buffer.alloc((w * 3 + 1) * h);
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', zlib.deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

async function timedHealth(base: string): Promise<number> {
  const t = performance.now();
  await (await fetch(`${base}/api/health`)).text();
  return performance.now() - t;
}

async function main() {
  if (!fs.existsSync(path.join(root, distDir, 'BUILD_ID'))) {
    execFileSync('npx', ['next', 'build'], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: '1' }, stdio: 'inherit' });
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'chordline-sec-'));
  const env = { ...process.env, DATA_DIR: dataDir, NEXT_DIST_DIR: distDir, NODE_ENV: 'production' as const, NEXT_TELEMETRY_DISABLED: '1' };
  delete (env as Record<string, string | undefined>).CHORDLINE_NO_DEMO;
  execFileSync('npx', ['tsx', 'lib/cli/prepare.ts'], { cwd: root, env, stdio: 'ignore' });
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const server = spawn('npx', ['next', 'start', '-p', String(port), '-H', '127.0.0.1'], { cwd: root, env: { ...env, NEXTAUTH_URL: base }, stdio: 'ignore', detached: true });
  const line = (what: string, got: number | string | boolean, want: number | string | boolean) => console.log(`${String(got) === String(want) ? 'ok  ' : 'FAIL'} ${what}: ${got} (want ${want})`);
  try {
    for (
      let i = 0;
      i < 240 &&
      !(await fetch(`${base}/api/health`)
        .then((r) => r.ok)
        .catch(() => false));
      i++
    )
      await new Promise((r) => setTimeout(r, 250));
    const admin = await signIn(base, 'admin@example.com');
    const crew = await signIn(base, 'crew@example.com');
    const engineer = await signIn(base, 'engineer@example.com');
    const inspector = await signIn(base, 'inspector@example.com');
    const planted = JSON.stringify({ email: 'planted@test.invalid', name: 'P', role: 'admin', password: 'planted-password-1' });
    const post = (url: string, cookie: string, body: BodyInit, headers: Record<string, string>) =>
      fetch(`${base}${url}`, { method: 'POST', redirect: 'manual', headers: { cookie, ...headers }, body });
    line('text/plain JSON to /api/admin/users from another port', (await post('/api/admin/users', admin, planted, { 'content-type': 'text/plain', origin: 'http://127.0.0.1:3100' })).status, 403);
    line('text/plain JSON to /api/admin/users from the app itself', (await post('/api/admin/users', admin, planted, { 'content-type': 'text/plain', origin: base })).status, 415);
    const before = await fetch(`${base}/api/bridges`, { headers: { cookie: crew } });
    const signOutCsrf = await fetch(`${base}/api/auth/csrf`, { headers: { cookie: crew } });
    const token = ((await signOutCsrf.json()) as { csrfToken: string }).csrfToken;
    const jar = [crew, ...signOutCsrf.headers.getSetCookie().map((c) => c.split(';')[0])].join('; ');
    await post('/api/auth/signout', jar, new URLSearchParams({ csrfToken: token }), { 'content-type': 'application/x-www-form-urlencoded', origin: base });
    line('saved cookie before sign-out', before.status, 200);
    line('saved cookie after sign-out', (await fetch(`${base}/api/bridges`, { headers: { cookie: crew } })).status, 401);
    const redirect = await fetch(`${base}/signin?callbackUrl=/%09/evil.example:3100/x`, { headers: { cookie: engineer }, redirect: 'manual' });
    line('signed-in open redirect goes to', new URL(redirect.headers.get('location') ?? '/none', base).origin, base);
    const page = await fetch(`${base}/bridges/1`, { redirect: 'manual' });
    line('signed-out /bridges/1 leaks the name', /Marlow Creek/.test(await page.text()), false);
    line(
      'points_per_span 10000 with interior=1',
      (await post('/api/compute?interior=1', engineer, JSON.stringify({ ...demoBridges[0], points_per_span: 10000 }), { 'content-type': 'application/json', origin: base })).status,
      422,
    );
    line('GET /api/bridges/%E0%A4%A', (await fetch(`${base}/api/bridges/%E0%A4%A`, { headers: { cookie: engineer } })).status, 400);
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(png(7999, 7999))], { type: 'image/png' }), 'huge.png');
    line('7999 × 7999 PNG', (await post('/api/bridges/1/attachments', inspector, form, { origin: base })).status, 422);

    // Health while the heaviest allowed compute (interior rows, 250,000 girder points) and a 49-megapixel photo run.
    const bents = Array.from({ length: 8 }, (_, i) => ({ name: `B${i + 1}`, station: 1200 + i * 35, skew_deg: 0 }));
    const girders = Array.from({ length: 40 }, (_, i) => ({ name: `G${i + 1}`, layout: 'chord', offsets: bents.map(() => -18 + i * 0.9) }));
    const heavy = JSON.stringify({ ...demoBridges[0], bents, girders, points_per_span: 200, chord_spaces: 200, top_of_girder: [] });
    const photo = new FormData();
    photo.append('file', new Blob([new Uint8Array(png(7000, 7000))], { type: 'image/png' }), 'big.png');
    let done = 0;
    const work = [
      post('/api/compute?interior=1', engineer, heavy, { 'content-type': 'application/json', origin: base }).then(async (r) => (await r.arrayBuffer(), done++, r.status)),
      post('/api/bridges/1/attachments', inspector, photo, { origin: base }).then(async (r) => (await r.arrayBuffer(), done++, r.status)),
    ];
    const times: number[] = [];
    while (done < 2) {
      times.push(await timedHealth(base));
      await new Promise((r) => setTimeout(r, 50));
    }
    const statuses = await Promise.all(work);
    times.sort((a, b) => a - b);
    console.log(
      `heavy compute ${statuses[0]}, 49 MP photo ${statuses[1]}; /api/health during them: ${times.length} answers, median ${times[Math.floor(times.length / 2)].toFixed(0)} ms, slowest ${times[times.length - 1].toFixed(0)} ms (want < 200)`,
    );
  } finally {
    try {
      process.kill(-server.pid!, 'SIGTERM');
    } catch {}
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(`[chordline] security check failed: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
