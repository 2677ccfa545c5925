import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import * as attachments from '@/app/api/bridges/[id]/attachments/route';
import * as attachment from '@/app/api/attachments/[id]/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as audit from '@/app/api/bridges/[id]/audit/route';
import { Attachment } from '@/models';
import { neutraliseName } from '@/lib/uploads/store';
import { sniffType } from '@/lib/uploads/sniff';
import { call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge, engineRow, JPEG_START, multipartRequest, PNG_1X1 } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
let bridgeId: string;
const uploads = () => path.join(process.env.DATA_DIR as string, 'uploads');
const storedFiles = () => (fs.existsSync(uploads()) ? fs.readdirSync(uploads()) : []);

const upload = async (who: Role | null, file: { bytes: Uint8Array; name: string; type: string } | null, fields: Record<string, string> = {}, id = bridgeId) =>
  callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, who ? people[who].cookie : undefined, file, fields), { id });

beforeAll(async () => {
  people = await makeUsers();
  bridgeId = await demoBridge(people.engineer);
});

describe('POST /api/bridges/:id/attachments', () => {
  it('stores a PNG under a generated name and serves it back only to signed-in users, with safe headers', async () => {
    const res = await upload('inspector', { bytes: PNG_1X1, name: 'bracket 7.png', type: 'image/png' });
    expect(res.status, res.body.toString()).toBe(201);
    expect(res.json).toMatchObject({ name: 'bracket 7.png', content_type: 'image/png', size: PNG_1X1.byteLength });
    const row = await Attachment.findByPk(res.json.id);
    expect(row!.storedName).toMatch(/^[a-f0-9]{32}\.png$/);
    expect(fs.readFileSync(path.join(uploads(), row!.storedName)).equals(PNG_1X1)).toBe(true);

    const anon = await callRaw(attachment.GET, await anonymousGet(res.json.id), { id: String(res.json.id) });
    expect(anon.status).toBe(401);
    const got = await call(attachment.GET, { cookie: people.crew.cookie, params: { id: String(res.json.id) } });
    expect(got.status).toBe(200);
    const raw = await callRaw(attachment.GET, await signedGet(res.json.id, people.crew.cookie), { id: String(res.json.id) });
    expect(raw.body.equals(PNG_1X1)).toBe(true);
    expect(raw.headers.get('content-type')).toBe('image/png');
    expect(raw.headers.get('x-content-type-options')).toBe('nosniff');
    expect(raw.headers.get('content-disposition')).toMatch(/^inline; filename="bracket 7.png"/);
  });

  it('decides the type by the bytes: a JPEG named .txt is a JPEG; text named .jpg is refused with 415', async () => {
    const jpeg = await upload('inspector', { bytes: JPEG_START, name: 'IMG_0001.txt', type: 'text/plain' });
    expect(jpeg.status).toBe(201);
    expect(jpeg.json.content_type).toBe('image/jpeg');
    const before = { rows: await Attachment.count(), files: storedFiles().length };
    const fake = await upload('inspector', { bytes: Buffer.from('this is not a photo at all, just words'), name: 'photo.jpg', type: 'image/jpeg' });
    expect(fake.status).toBe(415);
    expect(fake.json.error).toMatch(/JPEG|PNG|PDF/);
    const html = await upload('inspector', { bytes: Buffer.from('<html><script>alert(1)</script></html>'), name: 'x.png', type: 'image/png' });
    expect(html.status).toBe(415);
    expect({ rows: await Attachment.count(), files: storedFiles().length }).toEqual(before);
  });

  it('accepts a PDF and serves it as a download', async () => {
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj <<>> endobj\ntrailer <<>>\n%%EOF\n');
    const res = await upload('inspector', { bytes: pdf, name: 'pour-plan.pdf', type: 'application/pdf' });
    expect(res.status).toBe(201);
    const raw = await callRaw(attachment.GET, await signedGet(res.json.id, people.crew.cookie), { id: String(res.json.id) });
    expect(raw.headers.get('content-type')).toBe('application/pdf');
    expect(raw.headers.get('content-disposition')).toMatch(/^attachment;/);
  });

  it('refuses 11 MB with 413 and stores nothing', async () => {
    const before = { rows: await Attachment.count(), files: storedFiles().length };
    const big = Buffer.alloc(11 * 1024 * 1024, 0);
    PNG_1X1.copy(big);
    const res = await upload('inspector', { bytes: big, name: 'huge.png', type: 'image/png' });
    expect(res.status).toBe(413);
    expect({ rows: await Attachment.count(), files: storedFiles().length }).toEqual(before);
  });

  it('neutralises path-like file names: only the last segment is kept, as text, never as a path', async () => {
    for (const [given, shown] of [
      ['../../../etc/passwd.png', 'passwd.png'],
      ['..\\..\\windows\\win.ini.png', 'win.ini.png'],
      ['/abs/path/.hidden.png', 'hidden.png'],
      ['../', 'upload'],
    ]) {
      const res = await upload('inspector', { bytes: PNG_1X1, name: given, type: 'image/png' });
      expect(res.status, given).toBe(201);
      expect(res.json.name).toBe(shown);
      const row = await Attachment.findByPk(res.json.id);
      expect(row!.storedName).toMatch(/^[a-f0-9]{32}\.png$/);
    }
    // Nothing was written outside the uploads folder.
    expect(fs.existsSync(path.join(process.env.DATA_DIR as string, '..', 'etc'))).toBe(false);
    expect(storedFiles().every((f) => /^[a-f0-9]{32}\.(png|jpg|webp|pdf)$/.test(f))).toBe(true);
    expect(neutraliseName('a\u0000b"c.png')).toBe('a_b_c.png');
  });

  it('attaches a photo to a check; the check history shows it; a check of another bridge is refused', async () => {
    const row = engineRow(1, 'G1', 2);
    const check = await call(checks.POST, {
      method: 'POST',
      cookie: people.inspector.cookie,
      params: { id: bridgeId },
      body: { span: 1, girder: 'G1', point: 2, measured_edge_width: row.edge_width },
    });
    const res = await upload('inspector', { bytes: PNG_1X1, name: 'g1-p2.png', type: 'image/png' }, { check_id: String(check.json.id), caption: 'tape at the string line' });
    expect(res.status).toBe(201);
    expect(res.json.check_id).toBe(check.json.id);
    const list = await call(checks.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    const shown = list.json.find((c: { id: number }) => c.id === check.json.id);
    expect(shown.photos).toEqual([{ id: res.json.id, name: 'g1-p2.png', content_type: 'image/png', url: `/api/attachments/${res.json.id}` }]);

    const other = await demoBridge(people.engineer);
    const before = await Attachment.count();
    const wrong = await upload('inspector', { bytes: PNG_1X1, name: 'x.png', type: 'image/png' }, { check_id: String(check.json.id) }, other);
    expect(wrong.status).toBe(400);
    expect(wrong.json.fields.check_id).toBeDefined();
    expect(await Attachment.count()).toBe(before);
  });

  it('crew cannot upload; a request without a file is a 400; every upload is in the audit log', async () => {
    expect((await upload('crew', { bytes: PNG_1X1, name: 'a.png', type: 'image/png' })).status).toBe(403);
    expect((await upload(null, { bytes: PNG_1X1, name: 'a.png', type: 'image/png' })).status).toBe(401);
    const none = await upload('inspector', null, { caption: 'no file' });
    expect(none.status).toBe(400);
    expect(none.json.fields.file).toBeDefined();
    const log = await call(audit.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    expect(log.json.filter((e: { action: string }) => e.action === 'attachment.create')).toHaveLength(await Attachment.count({ where: { bridgeId: Number(bridgeId) } }));
  });

  it('sniffs the four kinds by their signatures', () => {
    // Signatures from the format specifications named in lib/uploads/sniff.ts.
    expect(sniffType(PNG_1X1)?.contentType).toBe('image/png');
    expect(sniffType(JPEG_START)?.contentType).toBe('image/jpeg');
    expect(sniffType(Buffer.concat([Buffer.from('RIFF'), Buffer.from([1, 2, 3, 4]), Buffer.from('WEBPVP8 ')]))?.contentType).toBe('image/webp');
    expect(sniffType(Buffer.concat([Buffer.from('RIFF'), Buffer.from([1, 2, 3, 4]), Buffer.from('WAVEfmt ')]))).toBeNull();
    expect(sniffType(Buffer.from('%PDF-1.7'))?.contentType).toBe('application/pdf');
    expect(sniffType(Buffer.from([0xff, 0xd8]))).toBeNull();
  });
});

async function anonymousGet(id: number) {
  const { NextRequest } = await import('next/server');
  return new NextRequest(new URL(`/api/attachments/${id}`, 'http://localhost:3000'));
}

async function signedGet(id: number, cookie: string) {
  const { NextRequest } = await import('next/server');
  return new NextRequest(new URL(`/api/attachments/${id}`, 'http://localhost:3000'), { headers: { cookie } });
}
