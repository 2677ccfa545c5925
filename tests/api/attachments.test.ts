import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as attachments from '@/app/api/bridges/[id]/attachments/route';
import * as attachment from '@/app/api/attachments/[id]/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as audit from '@/app/api/bridges/[id]/audit/route';
import { Attachment } from '@/models';
import { neutraliseName } from '@/lib/uploads/store';
import { sniffType } from '@/lib/uploads/sniff';
import { makeThumbnail } from '@/lib/uploads/thumbnail';
import * as bridgeRoute from '@/app/api/bridges/[id]/route';
import { Jimp } from 'jimp';
import { call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge, engineRow, JPEG_START, multipartRequest, PNG_1X1 } from './field-helpers';
import type { Role } from '@/lib/auth/roles';
import { FILE_BACKENDS, useFileBackend, type FileProbe } from '../support/file-backends';

let people: Record<Role, TestUser>;
let bridgeId: string;
let probe: FileProbe;
const storedFiles = () => probe.names('uploads');

const upload = async (who: Role | null, file: { bytes: Uint8Array; name: string; type: string } | null, fields: Record<string, string> = {}, id = bridgeId) =>
  callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, who ? people[who].cookie : undefined, file, fields), { id });

beforeAll(async () => {
  people = await makeUsers();
  bridgeId = await demoBridge(people.engineer);
});

// The same upload, thumbnail, download and delete tests run with the files on the local disk and in
// object storage (a fake S3 server, s3rver from the npm registry, started here on a loopback port).
// Uploads make their thumbnail while the uploader waits (a worker thread per decode): give the busy
// machine room.
describe.each(FILE_BACKENDS)('attachments stored on %s', { timeout: 120_000 }, (backend) => {
  let stop: () => Promise<void>;
  beforeAll(async () => {
    ({ probe, stop } = await useFileBackend(backend));
  });
  afterAll(async () => {
    await stop();
  });

  describe('POST /api/bridges/:id/attachments', () => {
    it('stores a PNG under a generated name and serves it back only to signed-in users, with safe headers', async () => {
      const res = await upload('inspector', { bytes: PNG_1X1, name: 'bracket 7.png', type: 'image/png' });
      expect(res.status, res.body.toString()).toBe(201);
      expect(res.json).toMatchObject({ name: 'bracket 7.png', content_type: 'image/png', size: PNG_1X1.byteLength });
      const row = await Attachment.findByPk(res.json.id);
      expect(row!.storedName).toMatch(/^[a-f0-9]{32}\.png$/);
      expect((await probe.read('uploads', row!.storedName))?.equals(PNG_1X1)).toBe(true);
      // In object storage nothing lands on this server's disk.
      const onDisk = path.join(process.env.DATA_DIR as string, 'uploads', row!.storedName);
      expect(fs.existsSync(onDisk)).toBe(backend === 'disk');

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
      const before = { rows: await Attachment.count(), files: (await storedFiles()).length };
      const fake = await upload('inspector', { bytes: Buffer.from('this is not a photo at all, just words'), name: 'photo.jpg', type: 'image/jpeg' });
      expect(fake.status).toBe(415);
      expect(fake.json.error).toMatch(/JPEG|PNG|PDF/);
      const html = await upload('inspector', { bytes: Buffer.from('<html><script>alert(1)</script></html>'), name: 'x.png', type: 'image/png' });
      expect(html.status).toBe(415);
      expect({ rows: await Attachment.count(), files: (await storedFiles()).length }).toEqual(before);
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
      const before = { rows: await Attachment.count(), files: (await storedFiles()).length };
      const big = Buffer.alloc(11 * 1024 * 1024, 0);
      PNG_1X1.copy(big);
      const res = await upload('inspector', { bytes: big, name: 'huge.png', type: 'image/png' });
      expect(res.status).toBe(413);
      expect({ rows: await Attachment.count(), files: (await storedFiles()).length }).toEqual(before);
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
      expect((await storedFiles()).every((f) => /^[a-f0-9]{32}\.(png|jpg|webp|pdf)$/.test(f))).toBe(true);
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
      expect(shown.photos).toEqual([
        { id: res.json.id, name: 'g1-p2.png', content_type: 'image/png', url: `/api/attachments/${res.json.id}`, thumbnail_url: `/api/attachments/${res.json.id}?size=thumb` },
      ]);

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
  });

  describe('GET /api/attachments/:id?size=thumb', () => {
    const get = async (id: number, query = '') => {
      const { NextRequest } = await import('next/server');
      const req = new NextRequest(new URL(`/api/attachments/${id}${query}`, 'http://localhost:3000'), { headers: { cookie: people.crew.cookie } });
      return callRaw(attachment.GET, req, { id: String(id) });
    };

    it('serves a photo as a small upright JPEG, made at upload and kept in the cache, not in the uploads', async () => {
      // A 1600 × 1200 photo whose EXIF orientation is 6 ("rotate 90° clockwise to view"; EXIF 2.32,
      // tag 0x0112): shown upright it is 1200 wide by 1600 high, so its thumbnail is 240 × 320.
      const photo = withExifOrientation(await new Jimp({ width: 1600, height: 1200, color: 0x4080c0ff }).getBuffer('image/jpeg'), 6);
      const res = await upload('inspector', { bytes: photo, name: 'deck edge.jpg', type: 'image/jpeg' });
      expect(res.status).toBe(201);
      expect(res.json.thumbnail_url).toBe(`/api/attachments/${res.json.id}?size=thumb`);
      const made = await probe.names('thumbs');
      expect(made).toContain(`${(await Attachment.findByPk(res.json.id))!.storedName.slice(0, 32)}.jpg`);

      const thumb = await get(res.json.id, '?size=thumb');
      expect(thumb.status).toBe(200);
      expect(thumb.headers.get('content-type')).toBe('image/jpeg');
      expect(thumb.body.byteLength).toBeLessThan(photo.byteLength / 4);
      const seen = await Jimp.fromBuffer(thumb.body);
      expect([seen.bitmap.width, seen.bitmap.height]).toEqual([240, 320]);
      // The full size is still the photo itself, byte for byte.
      expect((await get(res.json.id, '?size=full')).body.equals(photo)).toBe(true);
      expect((await get(res.json.id)).body.equals(photo)).toBe(true);
    });

    it('makes a missing thumbnail again on request; a tiny photo is never enlarged', async () => {
      const res = await upload('inspector', { bytes: PNG_1X1, name: 'dot.png', type: 'image/png' });
      await probe.clear('thumbs');
      const thumb = await get(res.json.id, '?size=thumb');
      expect(thumb.status).toBe(200);
      const seen = await Jimp.fromBuffer(thumb.body);
      expect([seen.bitmap.width, seen.bitmap.height]).toEqual([1, 1]);
      expect(await probe.names('thumbs')).toHaveLength(1);
      // Several lists opening at once, with the cache gone: every answer is the same whole thumbnail.
      await probe.clear('thumbs');
      const all = await Promise.all(Array.from({ length: 6 }, () => get(res.json.id, '?size=thumb')));
      expect(all.map((r) => r.status)).toEqual([200, 200, 200, 200, 200, 200]);
      for (const r of all) expect(r.body.equals(thumb.body)).toBe(true);
      const kept = await probe.names('thumbs');
      expect(kept).toHaveLength(1);
      expect((await probe.read('thumbs', kept[0]))!.equals(thumb.body)).toBe(true);
    });

    it('never decodes a photo whose header claims more pixels than any camera: the upload is refused (422)', async () => {
      // A PNG whose IHDR (PNG spec §11.2.2) claims 40000 × 40000 pixels: 6.4 GB once decoded.
      const bomb = Buffer.from(PNG_1X1);
      bomb.writeUInt32BE(40000, 16);
      bomb.writeUInt32BE(40000, 20);
      bomb.writeUInt32BE(zlib.crc32(bomb.subarray(12, 29)), 29); // the chunk's CRC over type and data (§5.3)
      await expect(makeThumbnail(bomb)).rejects.toThrow(/too large to decode/);
      const before = { rows: await Attachment.count(), files: (await storedFiles()).length };
      const res = await upload('inspector', { bytes: bomb, name: 'huge.png', type: 'image/png' });
      expect(res.status).toBe(422);
      expect(res.json.error).toMatch(/40000 × 40000 pixels/);
      expect({ rows: await Attachment.count(), files: (await storedFiles()).length }).toEqual(before);
    });

    it('serves a photo it cannot decode as itself; a PDF has no thumbnail (400); an unknown size is a 400', async () => {
      const damaged = await upload('inspector', { bytes: JPEG_START, name: 'cut-off.jpg', type: 'image/jpeg' });
      const raw = await get(damaged.json.id, '?size=thumb');
      expect(raw.status).toBe(200);
      expect(raw.body.equals(JPEG_START)).toBe(true);
      expect(raw.headers.get('content-type')).toBe('image/jpeg');

      const pdf = await upload('inspector', { bytes: Buffer.from('%PDF-1.4\n%%EOF\n'), name: 'plan.pdf', type: 'application/pdf' });
      expect(pdf.json.thumbnail_url).toBeNull();
      const noThumb = await get(pdf.json.id, '?size=thumb');
      expect(noThumb.status).toBe(400);
      expect(noThumb.json.fields.size).toBeDefined();
      const odd = await get(pdf.json.id, '?size=huge');
      expect(odd.status).toBe(400);
      expect(odd.json.fields.size).toEqual(['size must be full or thumb.']);
    });
  });

  describe('DELETE /api/bridges/:id', () => {
    it("removes the bridge's uploads and thumbnails from the store; a download of them is then a 404", async () => {
      const id = await demoBridge(people.engineer);
      const up = await upload('inspector', { bytes: PNG_1X1, name: 'p.png', type: 'image/png' }, {}, id);
      expect(up.status).toBe(201);
      const stored = (await Attachment.findByPk(up.json.id))!.storedName;
      const thumbName = stored.replace(/\.\w+$/, '.jpg');
      expect(await probe.names('uploads')).toContain(stored);
      expect(await probe.names('thumbs')).toContain(thumbName);
      const del = await call(bridgeRoute.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id } });
      expect(del.status).toBe(200);
      expect(await probe.names('uploads')).not.toContain(stored);
      expect(await probe.names('thumbs')).not.toContain(thumbName);
      expect((await call(attachment.GET, { cookie: people.crew.cookie, params: { id: String(up.json.id) } })).status).toBe(404);
    });

    it('answers 404 with a clear message when a file has gone missing from the store', async () => {
      const up = await upload('inspector', { bytes: Buffer.from('%PDF-1.4\n%%EOF\n'), name: 'lost.pdf', type: 'application/pdf' });
      await probe.clear('uploads');
      const got = await call(attachment.GET, { cookie: people.crew.cookie, params: { id: String(up.json.id) } });
      expect(got.status).toBe(404);
      expect(got.json.error).toMatch(/missing/);
    });
  });
});

describe('file types', () => {
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

/** The JPEG with an APP1 EXIF segment holding one IFD0 entry: Orientation (0x0112, SHORT) = `value`. */
function withExifOrientation(jpeg: Buffer, value: number): Buffer {
  // EXIF 2.32 / TIFF 6.0 layout: "Exif\0\0", big-endian TIFF header, IFD0 at offset 8 with one entry.
  const tiff = Buffer.from([0x4d, 0x4d, 0x00, 0x2a, 0x00, 0x00, 0x00, 0x08, 0x00, 0x01, 0x01, 0x12, 0x00, 0x03, 0x00, 0x00, 0x00, 0x01, 0x00, value, 0x00, 0x00, 0x00, 0x00, 0x00, 0x00]);
  const payload = Buffer.concat([Buffer.from('Exif\0\0', 'latin1'), tiff]);
  const length = Buffer.alloc(2);
  length.writeUInt16BE(payload.length + 2);
  return Buffer.concat([jpeg.subarray(0, 2), Buffer.from([0xff, 0xe1]), length, payload, jpeg.subarray(2)]);
}

async function anonymousGet(id: number) {
  const { NextRequest } = await import('next/server');
  return new NextRequest(new URL(`/api/attachments/${id}`, 'http://localhost:3000'));
}

async function signedGet(id: number, cookie: string) {
  const { NextRequest } = await import('next/server');
  return new NextRequest(new URL(`/api/attachments/${id}`, 'http://localhost:3000'), { headers: { cookie } });
}
