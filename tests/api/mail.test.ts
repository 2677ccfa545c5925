import fs from 'node:fs';
import path from 'node:path';
import { createRequire } from 'node:module';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as sendSheet from '@/app/api/bridges/[id]/send-sheet/route';
import * as sheetCsv from '@/app/api/bridges/[id]/field-sheet.csv/route';
import * as outbox from '@/app/api/admin/outbox/route';
import * as audit from '@/app/api/bridges/[id]/audit/route';
import { OutboxMessage } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
let bridgeId: string;

const send = (who: Role, body: unknown, id = bridgeId) => call(sendSheet.POST, { method: 'POST', cookie: people[who].cookie, params: { id }, body });
const csvOf = async (span?: number) =>
  (await call(sheetCsv.GET, { cookie: people.crew.cookie, params: { id: bridgeId }, path: `/api/bridges/${bridgeId}/field-sheet.csv${span ? `?span=${span}` : ''}` })).text;

/** Splits a MIME message (RFC 2046 multipart) into its parts' headers and decoded bodies. */
function mimeParts(raw: string): { headers: string; body: string }[] {
  const boundary = /boundary="?([^";\r\n]+)"?/i.exec(raw)?.[1];
  if (!boundary) return [];
  return raw
    .split(`--${boundary}`)
    .slice(1, -1)
    .map((part) => {
      const [headers, ...rest] = part.replace(/^\r?\n/, '').split(/\r?\n\r?\n/);
      const body = rest.join('\n\n');
      const decoded = /content-transfer-encoding:\s*base64/i.test(headers) ? Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8') : body;
      return { headers, body: decoded };
    });
}

beforeAll(async () => {
  delete process.env.SMTP_URL;
  people = await makeUsers();
  bridgeId = await demoBridge(people.engineer);
});

describe('POST /api/bridges/:id/send-sheet without an SMTP server (local outbox)', () => {
  it('captures the message with the CSV attached; the admin lists it', async () => {
    const res = await send('inspector', { to: ['site.office@example.com', 'crew.lead@example.com'], span: 1 });
    expect(res.status, res.text).toBe(202);
    expect(res.json.via).toBe('outbox');
    const list = await call(outbox.GET, { cookie: people.admin.cookie });
    expect(list.status).toBe(200);
    const msg = list.json.find((m: { id: number }) => m.id === res.json.outbox_id);
    expect(msg.to).toEqual(['site.office@example.com', 'crew.lead@example.com']);
    expect(msg.subject).toMatch(/Field sheet/);
    expect(msg.subject).toMatch(/span 1/);
    expect(msg.text).toMatch(/CAUTION: Geometry only/);
    expect(msg.attachments).toHaveLength(2);
    expect(msg.attachments[0].filename).toMatch(/-rev1-field-sheet-span1\.csv$/);
    // The attachment is the same sheet the CSV route serves.
    expect(msg.attachments[0].content).toBe(await csvOf(1));
    // And the full message is on disk in the outbox folder, its attachment decoding to the same CSV.
    const eml = path.join(process.env.DATA_DIR as string, 'outbox', `${String(res.json.outbox_id).padStart(6, '0')}.eml`);
    const raw = fs.readFileSync(eml, 'utf8');
    const csvPart = mimeParts(raw).find((p) => /text\/csv/i.test(p.headers));
    expect(csvPart?.body).toBe(await csvOf(1));
  });

  it('attaches the field sheet as PDF too: span 1 only, its revision and every bracket', async () => {
    const res = await send('inspector', { to: ['site.office@example.com'], span: 1 });
    expect(res.status, res.text).toBe(202);
    const raw = fs.readFileSync(path.join(process.env.DATA_DIR as string, 'outbox', `${String(res.json.outbox_id).padStart(6, '0')}.eml`), 'utf8');
    // The PDF part of the MIME message (RFC 2046), base64 decoded to its bytes.
    const part = mimeParts(raw).find((p) => /application\/pdf/i.test(p.headers));
    expect(part?.headers).toMatch(/-rev1-field-sheet-span1\.pdf/);
    const body = raw
      .split(/application\/pdf/i)[1]
      .split(/\r?\n\r?\n/)[1]
      .split(/\r?\n--/)[0];
    const bytes = Buffer.from(body.replace(/\s+/g, ''), 'base64');
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // pdf-parse (pdf.js): an independent reader of the attached file.
    const { PDFParse } = await import('pdf-parse');
    const parser = new PDFParse({ data: new Uint8Array(bytes) });
    const text = (await parser.getText()).text;
    await parser.destroy();
    expect(text).toContain('Revision 1');
    expect(text).toContain('Span 1 · G1');
    expect(text).not.toContain('Span 2 · G1');
    // Every bracket of span 1 is a row starting with its point and station, as on the sheet page.
    const csvRows = (await csvOf(1))
      .trim()
      .split('\n')
      .slice(3)
      .map((l) => l.split(','));
    for (const r of csvRows) expect(text).toContain(`${r[3]} ${r[4]} `);
  });

  it('serves the sheet CSV for one span or all; a span that is not a whole number or does not exist is a 400', async () => {
    const get = (query: string) => call(sheetCsv.GET, { cookie: people.crew.cookie, params: { id: bridgeId }, path: `/api/bridges/${bridgeId}/field-sheet.csv${query}` });
    const all = await get('');
    const one = await get('?span=2');
    expect(all.status).toBe(200);
    expect(one.status).toBe(200);
    expect(one.text.length).toBeLessThan(all.text.length);
    expect((await get('?span=')).text).toBe(all.text);
    for (const bad of ['?span=two', '?span=0', '?span=1.5', '?span=-1', '?span=99']) {
      const res = await get(bad);
      expect(res.status, bad).toBe(400);
      expect(res.json.fields.span, bad).toBeDefined();
    }
  });

  it('refuses a bad address with 400 and sends nothing', async () => {
    const before = await OutboxMessage.count();
    for (const to of [['not-an-address'], [], 'someone@example.com', ['ok@example.com', 'bad@']]) {
      const res = await send('inspector', { to });
      expect(res.status, JSON.stringify(to)).toBe(400);
      expect(Object.keys(res.json.fields).some((k) => k.startsWith('to'))).toBe(true);
    }
    const span = await send('inspector', { to: ['ok@example.com'], span: 7 });
    expect(span.status).toBe(400);
    expect(span.json.fields.span).toBeDefined();
    expect(await OutboxMessage.count()).toBe(before);
  });

  it('crew and engineers cannot send; only admins read the outbox; each send is audited', async () => {
    expect((await send('crew', { to: ['a@example.com'] })).status).toBe(403);
    expect((await send('engineer', { to: ['a@example.com'] })).status).toBe(403);
    expect((await call(outbox.GET, { cookie: people.inspector.cookie })).status).toBe(403);
    expect((await call(outbox.GET, {})).status).toBe(401);
    const log = await call(audit.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    expect(log.json.filter((e: { action: string }) => e.action === 'sheet.send')).toHaveLength(await OutboxMessage.count());
  });
});

describe('POST /api/bridges/:id/send-sheet through a real SMTP exchange', () => {
  type Received = { from: string; to: string[]; raw: string };
  const received: Received[] = [];
  let server: { listen: (port: number, host: string, cb: () => void) => void; close: (cb: () => void) => void; server: { address(): AddressInfo } };

  beforeAll(async () => {
    // smtp-server (nodemailer project) on loopback: no TLS, no auth, the message read to the end.
    const { SMTPServer } = createRequire(import.meta.url)('smtp-server');
    server = new SMTPServer({
      disabledCommands: ['STARTTLS', 'AUTH'],
      logger: false,
      onData(stream: NodeJS.ReadableStream, session: { envelope: { mailFrom: { address: string }; rcptTo: { address: string }[] } }, callback: () => void) {
        const chunks: Buffer[] = [];
        stream.on('data', (c: Buffer) => chunks.push(c));
        stream.on('end', () => {
          received.push({ from: session.envelope.mailFrom.address, to: session.envelope.rcptTo.map((r) => r.address), raw: Buffer.concat(chunks).toString('utf8') });
          callback();
        });
      },
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    process.env.SMTP_URL = `smtp://127.0.0.1:${server.server.address().port}`;
  });

  afterAll(async () => {
    delete process.env.SMTP_URL;
    await new Promise<void>((resolve) => server.close(resolve));
  });

  it('delivers to the recipients with the subject and the CSV attached, and keeps nothing in the outbox', async () => {
    const before = await OutboxMessage.count();
    const res = await send('inspector', { to: ['inspector.two@example.com'] });
    expect(res.status, res.text).toBe(202);
    expect(res.json.via).toBe('smtp');
    expect(received).toHaveLength(1);
    expect(received[0].to).toEqual(['inspector.two@example.com']);
    expect(received[0].raw).toMatch(/^Subject: Field sheet: Field test \d+ \(revision 1\)/m);
    const parts = mimeParts(received[0].raw);
    const csv = parts.find((p) => /text\/csv/i.test(p.headers));
    expect(csv?.headers).toMatch(/filename="?Field-test-\d+-rev1-field-sheet\.csv/);
    expect(csv?.body).toBe(await csvOf());
    expect(parts.find((p) => /text\/plain/i.test(p.headers))?.body).toMatch(/Span 3, G5/);
    expect(await OutboxMessage.count()).toBe(before);
  });

  it('answers 502 without server detail when the mail server is unreachable', async () => {
    process.env.SMTP_URL = 'smtp://127.0.0.1:9';
    const res = await send('inspector', { to: ['x@example.com'] });
    expect(res.status).toBe(502);
    expect(res.json.error).not.toMatch(/127\.0\.0\.1|ECONNREFUSED/);
    process.env.SMTP_URL = `smtp://127.0.0.1:${server.server.address().port}`;
  });
});
