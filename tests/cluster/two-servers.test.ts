import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { Jimp } from 'jimp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeS3, type FakeS3 } from '../support/fake-s3';
import { createTestDatabase, prepareDatabase, startAppServer, type AppServer, type TestDatabase } from './cluster-env';

// Two production app servers of one build behind an imagined reverse proxy, sharing one PostgreSQL
// database and one S3 bucket (s3rver) and nothing else: each has its own empty data folder. Requests go
// to each server directly with the headers the proxy would add (TRUST_PROXY=1) and, for writes, the
// Origin a browser sends. Runs in the e2e project so it serves the build its global setup just made.

const DIST_DIR = process.env.E2E_DIST_DIR || '.next-test';
const PUBLIC_HOST = 'chordline.test';
const PUBLIC_ORIGIN = `http://${PUBLIC_HOST}`;
const DEMO_PASSWORD = 'chordline-demo';

let database: TestDatabase;
let s3: FakeS3;
let a: AppServer;
let b: AppServer;

/** Headers a reverse proxy adds in front of either server; `client` is the browser's address. */
function viaProxy(client = '198.51.100.20'): Record<string, string> {
  return { 'x-forwarded-host': PUBLIC_HOST, 'x-forwarded-proto': 'http', 'x-forwarded-for': client };
}

function send(server: AppServer, route: string, init: { method?: string; cookie?: string; json?: unknown; body?: BodyInit; client?: string } = {}): Promise<Response> {
  const method = init.method ?? 'GET';
  const headers: Record<string, string> = viaProxy(init.client);
  if (method !== 'GET') headers.origin = PUBLIC_ORIGIN;
  if (init.cookie) headers.cookie = init.cookie;
  let body = init.body;
  if (init.json !== undefined) {
    headers['content-type'] = 'application/json';
    body = JSON.stringify(init.json);
  }
  return fetch(`${server.url}${route}`, { method, headers, body, redirect: 'manual' });
}

/** next-auth's credentials flow (api.md): the CSRF token, then the form post. Returns the answer and the session cookie, if any. */
async function signIn(server: AppServer, email: string, password = DEMO_PASSWORD, client?: string): Promise<{ status: number; cookie: string | null }> {
  const csrf = await send(server, '/api/auth/csrf', { client });
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const jar = csrf.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const res = await send(server, '/api/auth/callback/credentials', {
    method: 'POST',
    cookie: jar,
    client,
    body: new URLSearchParams({ csrfToken, email, password }),
  });
  const session = res.headers.getSetCookie().find((c) => c.startsWith('next-auth.session-token='));
  return { status: res.status, cookie: session ? session.split(';')[0] : null };
}

async function signedIn(server: AppServer, email: string): Promise<string> {
  const { cookie } = await signIn(server, email);
  if (!cookie) throw new Error(`${email} could not sign in on ${server.url}`);
  return cookie;
}

beforeAll(async () => {
  database = await createTestDatabase();
  s3 = await startFakeS3();
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...s3.env,
    DATABASE_URL: database.url,
    NEXTAUTH_URL: PUBLIC_ORIGIN,
    // Every server of one site needs the same secret (README: Running for a whole agency).
    NEXTAUTH_SECRET: crypto.randomBytes(32).toString('hex'),
    TRUST_PROXY: '1',
  };
  delete env.CHORDLINE_NO_DEMO;
  delete env.PG_ADMIN_URL;
  await prepareDatabase(env);
  [a, b] = await Promise.all([startAppServer(DIST_DIR, env), startAppServer(DIST_DIR, env)]);
}, 600_000);

afterAll(async () => {
  a?.stop();
  b?.stop();
  await s3?.stop();
  await database?.drop();
}, 120_000);

describe('two app servers on one PostgreSQL database and one bucket', () => {
  it('a session made on one works on the other; no session is refused on both', async () => {
    const cookie = await signedIn(a, 'crew@example.com');
    for (const server of [a, b]) {
      const list = await send(server, '/api/bridges', { cookie });
      expect(list.status, server.url).toBe(200);
      expect(((await list.json()) as unknown[]).length).toBeGreaterThan(0);
      expect((await send(server, '/api/bridges')).status).toBe(401);
    }
  });

  it('a check recorded on one is listed by the other', async () => {
    const inspector = await signedIn(a, 'inspector@example.com');
    const crewOnB = await signedIn(b, 'crew@example.com');
    const [bridge] = (await (await send(b, '/api/bridges', { cookie: crewOnB })).json()) as { id: number }[];
    const table = (await (await send(b, `/api/bridges/${bridge.id}/offsets`, { cookie: crewOnB })).json()) as {
      points: { span: number; girder: string; point: number; side: string; edge_width: number | null }[];
    };
    const row = table.points.find((p) => p.side !== 'interior' && p.edge_width !== null)!;
    const note = `cluster check ${crypto.randomBytes(4).toString('hex')}`;
    const made = await send(a, `/api/bridges/${bridge.id}/checks`, {
      method: 'POST',
      cookie: inspector,
      json: { span: row.span, girder: row.girder, point: row.point, measured_edge_width: row.edge_width, note },
    });
    expect(made.status, await made.clone().text()).toBe(201);
    const { id } = (await made.json()) as { id: number };
    const listed = (await (await send(b, `/api/bridges/${bridge.id}/checks`, { cookie: crewOnB })).json()) as { id: number; note: string; pass: boolean }[];
    expect(listed.find((c) => c.id === id)).toMatchObject({ note, pass: true });
  });

  it('a photo uploaded through one downloads, with its thumbnail, through the other; the files are in the bucket, not on either disk', async () => {
    const inspector = await signedIn(a, 'inspector@example.com');
    const crewOnB = await signedIn(b, 'crew@example.com');
    const [bridge] = (await (await send(a, '/api/bridges', { cookie: inspector })).json()) as { id: number }[];
    const photo = await new Jimp({ width: 640, height: 480, color: 0x6a8fb3ff }).getBuffer('image/jpeg');
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(photo)], { type: 'image/jpeg' }), 'deck-edge.jpg');
    form.append('caption', 'form edge at the bent');
    const before = await s3.keys('uploads/');
    const up = await send(a, `/api/bridges/${bridge.id}/attachments`, { method: 'POST', cookie: inspector, body: form });
    expect(up.status, await up.clone().text()).toBe(201);
    const { id, url, thumbnail_url } = (await up.json()) as { id: number; url: string; thumbnail_url: string };

    const full = await send(b, url, { cookie: crewOnB });
    expect(full.status).toBe(200);
    expect(full.headers.get('content-type')).toBe('image/jpeg');
    expect(full.headers.get('content-security-policy')).toBe("default-src 'none'; sandbox");
    expect(full.headers.get('content-disposition')).toMatch(/^inline; filename="deck-edge.jpg"/);
    expect(Buffer.from(await full.arrayBuffer()).equals(photo)).toBe(true);
    const thumb = await send(b, thumbnail_url, { cookie: crewOnB });
    expect(thumb.status).toBe(200);
    const small = await Jimp.fromBuffer(Buffer.from(await thumb.arrayBuffer()));
    expect([small.bitmap.width, small.bitmap.height]).toEqual([320, 240]);
    expect((await send(b, `/api/attachments/${id}`)).status).toBe(401);

    const added = (await s3.keys('uploads/')).filter((k) => !before.includes(k));
    expect(added).toHaveLength(1);
    expect((await s3.read(added[0]))!.equals(photo)).toBe(true);
    for (const server of [a, b]) expect(fs.existsSync(path.join(server.dataDir, 'uploads')), server.dataDir).toBe(false);
  });

  it('a role change made on one is enforced by the other within 5 s', async () => {
    const adminOnA = await signedIn(a, 'admin@example.com');
    const engineerOnB = await signedIn(b, 'engineer@example.com');
    const [bridge] = (await (await send(b, '/api/bridges', { cookie: engineerOnB })).json()) as { id: number; name: string }[];
    const rename = (cookie: string) => send(b, `/api/bridges/${bridge.id}`, { method: 'PATCH', cookie, json: { name: bridge.name } });
    // The engineer's account is now in server B's short account cache.
    expect((await rename(engineerOnB)).status).toBe(200);
    const users = (await (await send(a, '/api/admin/users', { cookie: adminOnA })).json()) as { id: number; email: string }[];
    const engineer = users.find((u) => u.email === 'engineer@example.com')!;
    const change = await send(a, `/api/admin/users/${engineer.id}`, { method: 'PATCH', cookie: adminOnA, json: { role: 'crew' } });
    expect(change.status, await change.clone().text()).toBe(200);
    const changedAt = Date.now();

    // Every request B starts more than 5 s after the change must be refused; ask until it is.
    for (;;) {
      const startedAt = Date.now();
      const res = await rename(engineerOnB);
      if (res.status !== 200) {
        // The role change ended the account's sessions (lib/services/users.ts): 401, sign in again.
        expect(res.status).toBe(401);
        break;
      }
      expect(startedAt - changedAt, 'B still let the old engineer session write more than 5 s after the role change').toBeLessThanOrEqual(5000);
      await new Promise((r) => setTimeout(r, 200));
    }
    // Signed in again on B, the account has the new role and may no longer write.
    const crewNow = await signedIn(b, 'engineer@example.com');
    expect((await rename(crewNow)).status).toBe(403);
  });

  it('the sign-in throttle counts failures made on both servers together', async () => {
    // lib/auth/throttle.ts: more than MAX_CLIENT_FAILURES (20) failures from one address in 15 minutes
    // and that address must wait. Ten wrong passwords through each server (each for an unknown
    // address of its own, so no account is slowed) reach it only if both count in one place.
    const client = '203.0.113.77';
    for (let i = 0; i < 20; i++) {
      const server = i % 2 === 0 ? a : b;
      const attempt = await signIn(server, `nobody-${i}@example.com`, 'not-the-password', client);
      expect(attempt.status, `attempt ${i + 1} on ${server.url}`).not.toBe(429);
      expect(attempt.cookie).toBeNull();
    }
    for (const server of [a, b]) {
      const refused = await signIn(server, 'crew@example.com', DEMO_PASSWORD, client);
      expect(refused.status, server.url).toBe(429);
      expect(refused.cookie).toBeNull();
    }
    // Another address still signs in.
    expect((await signIn(b, 'crew@example.com', DEMO_PASSWORD, '203.0.113.78')).cookie).not.toBeNull();
  });
});
