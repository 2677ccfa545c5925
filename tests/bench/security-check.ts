/**
 * Outside check of issue 11 (not a test: it times things): `npx tsx tests/bench/security-check.ts`.
 * Serves the production build (SECURITY_DIST_DIR, default .next-loadtest; built when missing) on
 * loopback with fresh demo data, repeats the reported attacks over HTTP and prints each answer's
 * status, then times /api/health during a burst of sign-ins and while the heaviest allowed compute and a
 * large photo run.
 */
import http from 'node:http';
import os from 'node:os';
import zlib from 'node:zlib';
import { demoBridges } from '../../lib/demo/bridges';
import { signInCookie as signIn, startServedApp } from './served-app';
import { csrfJar } from '../support/csrf-jar';

const distDir = process.env.SECURITY_DIST_DIR || '.next-loadtest';

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

/** A multipart body and its Content-Type for one file field named "file". */
async function multipart(bytes: Buffer, type: string, name: string): Promise<{ body: Buffer; type: string }> {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)], { type }), name);
  const encoded = new Response(form);
  return { body: Buffer.from(await encoded.arrayBuffer()), type: encoded.headers.get('content-type')! };
}

/**
 * Uploads on a connection of its own (never a pooled keep-alive one the server may have closed while
 * the large test file was being built, which fetch reports as EPIPE) and reads the answer as soon as
 * it comes. A server that refuses before reading the whole body (413 on the declared length) may close
 * the connection while the body is still being written: that refusal is the answer, and a write error
 * after it is expected. Only a closed connection with no answer at all is reported as such.
 */
function upload(base: string, path: string, cookie: string, file: { body: Buffer; type: string }): Promise<{ status: number | string; early: boolean }> {
  return new Promise((resolve) => {
    const url = new URL(path, base);
    let answered = false;
    let written = false;
    const req = http.request(
      { host: url.hostname, port: url.port, path: url.pathname, method: 'POST', agent: false, headers: { cookie, origin: base, 'content-type': file.type, 'content-length': file.body.length } },
      (res) => {
        answered = true;
        res.resume();
        res.on('end', () => resolve({ status: res.statusCode ?? 0, early: !written }));
        res.on('error', () => resolve({ status: res.statusCode ?? 0, early: !written }));
      },
    );
    req.on('error', (err: NodeJS.ErrnoException) => {
      if (!answered) resolve({ status: `connection closed with no answer (${err.code ?? err.message})`, early: !written });
    });
    let offset = 0;
    const writeMore = () => {
      while (offset < file.body.length) {
        const more = req.write(file.body.subarray(offset, offset + 64 * 1024));
        offset += 64 * 1024;
        if (!more) return void req.once('drain', writeMore);
      }
      written = true;
      req.end();
    };
    writeMore();
  });
}

async function timedHealth(base: string): Promise<number> {
  const t = performance.now();
  await (await fetch(`${base}/api/health`)).text();
  return performance.now() - t;
}

/** Health answer times, one request every 50 ms, until every piece of work has settled; sorted. */
async function healthWhile(base: string, work: Promise<unknown>[]): Promise<number[]> {
  let done = false;
  const all = Promise.allSettled(work).then(() => (done = true));
  const times: number[] = [];
  while (!done) {
    times.push(await timedHealth(base));
    await new Promise((r) => setTimeout(r, 50));
  }
  await all;
  return times.sort((a, b) => a - b);
}

function healthLine(when: string, times: number[]) {
  const slowest = times[times.length - 1];
  const load = os
    .loadavg()
    .map((l) => l.toFixed(2))
    .join(', ');
  console.log(
    `${slowest < 200 ? 'ok  ' : 'SLOW'} /api/health ${when}: ${times.length} answers, median ${times[Math.floor(times.length / 2)].toFixed(0)} ms, 90th percentile ${times[Math.floor(times.length * 0.9)].toFixed(0)} ms, slowest ${slowest.toFixed(0)} ms (want < 200); load average ${load}`,
  );
}

async function main() {
  const app = await startServedApp({ distDir, label: 'chordline-sec', verbose: false });
  const base = app.base;
  const line = (what: string, got: number | string | boolean, want: number | string | boolean) => console.log(`${String(got) === String(want) ? 'ok  ' : 'FAIL'} ${what}: ${got} (want ${want})`);
  try {
    // The large test files are built first: building them takes seconds on a busy machine.
    const bomb = await multipart(png(7999, 7999), 'image/png', 'huge.png');
    const photo = await multipart(png(7000, 7000), 'image/png', 'big.png');
    const oversize = await multipart(Buffer.concat([Buffer.from('%PDF-1.7\n'), Buffer.alloc(11 * 1024 * 1024)]), 'application/pdf', 'eleven-mb.pdf');
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
    line('7999 × 7999 PNG', (await upload(base, '/api/bridges/1/attachments', inspector, bomb)).status, 422);
    const big = await upload(base, '/api/bridges/1/attachments', inspector, oversize);
    line(`11 MB file${big.early ? ' (refused before the whole body was sent)' : ''}`, big.status, 413);

    // 25 wrong passwords for 25 addresses from one client that names a new X-Forwarded-For each time:
    // without TRUST_PROXY the server counts the connection's own address, so the client is stopped.
    let lastSignIn = 0;
    const spray = async () => {
      for (let i = 0; i < 25; i++) {
        const { csrfToken, jar } = await csrfJar(base);
        const res = await post('/api/auth/callback/credentials', jar, new URLSearchParams({ csrfToken, email: `spray-${i}@example.com`, password: 'guess' }), {
          'content-type': 'application/x-www-form-urlencoded',
          origin: base,
          'x-forwarded-for': `203.0.113.${i + 1}`,
        });
        lastSignIn = res.status;
      }
    };
    const duringSignIns = await healthWhile(base, [spray()]);
    line('25th sign-in with a made-up X-Forwarded-For each time', lastSignIn, 429);
    healthLine('during the 25 sign-ins', duringSignIns);

    // Health while the heaviest allowed compute (interior rows, 250,000 girder points) and a 49-megapixel photo run.
    const bents = Array.from({ length: 8 }, (_, i) => ({ name: `B${i + 1}`, station: 1200 + i * 35, skew_deg: 0 }));
    const girders = Array.from({ length: 40 }, (_, i) => ({ name: `G${i + 1}`, layout: 'chord', offsets: bents.map(() => -18 + i * 0.9) }));
    const heavy = JSON.stringify({ ...demoBridges[0], bents, girders, points_per_span: 200, chord_spaces: 200, top_of_girder: [] });
    const statuses: number[] = [];
    const times = await healthWhile(base, [
      post('/api/compute?interior=1', engineer, heavy, { 'content-type': 'application/json', origin: base }).then(async (r) => (await r.arrayBuffer(), (statuses[0] = r.status))),
      upload(base, '/api/bridges/1/attachments', inspector, photo).then((r) => (statuses[1] = Number(r.status))),
    ]);
    line('heaviest allowed compute (interior rows, 40 girders, 200 points per span)', statuses[0], 200);
    line('49 MP photo', statuses[1], 201);
    healthLine('during them', times);
  } finally {
    app.stop();
  }
}

main().catch((err) => {
  const cause = err instanceof Error && err.cause instanceof Error ? ` (${err.cause.message})` : '';
  console.error(`[chordline] security check failed: ${err instanceof Error ? err.message : String(err)}${cause}`);
  process.exit(1);
});
