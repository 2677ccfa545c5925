import fs from 'node:fs';
import path from 'node:path';
import { NextRequest } from 'next/server';
import { beforeAll, describe, expect, it } from 'vitest';
import * as landxml from '@/app/api/import/landxml/route';
import * as health from '@/app/api/health/route';
import * as revisionOne from '@/app/api/bridges/[id]/revisions/[revision]/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import { demoBridges } from '@/lib/demo/bridges';
import { parseBridge } from '@/lib/geometry';
import { createBridge, listBridges } from '@/lib/services/bridges';
import { makeUsers, call, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

const fixture = (name: string) => fs.readFileSync(path.resolve(__dirname, '../fixtures/landxml', name));

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
  await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: 'Existing bridge', description: demoBridges[0] });
});

/** POSTs a multipart upload to the import route the way a browser form does. */
async function upload(opts: { who?: Role; file?: Uint8Array | string; filename?: string; units?: string; type?: string; form?: FormData }) {
  let form = opts.form;
  if (!form) {
    form = new FormData();
    if (opts.file !== undefined)
      form.append('file', new Blob([typeof opts.file === 'string' ? opts.file : new Uint8Array(opts.file)], { type: opts.type ?? 'application/xml' }), opts.filename ?? 'alignment.xml');
    if (opts.units !== undefined) form.append('units', opts.units);
  }
  const headers: Record<string, string> = { origin: 'http://localhost:3000' };
  if (opts.who) headers.cookie = people[opts.who].cookie;
  const req = new NextRequest('http://localhost:3000/api/import/landxml', { method: 'POST', headers, body: form });
  const res = await landxml.POST(req, { params: Promise.resolve({}) });
  const text = await res.text();
  return { status: res.status, text, json: JSON.parse(text) };
}

describe('POST /api/import/landxml', () => {
  it('imports a LandXML 1.2 file into alignment and profile fragments, in both answer shapes', async () => {
    const res = await upload({ who: 'engineer', file: fixture('creek-road-ft.xml'), units: 'ft' });
    expect(res.status, res.text).toBe(200);
    expect(res.json.units).toBe('ft');
    expect(res.json.alignments).toHaveLength(1);
    const first = res.json.alignments[0];
    expect(first.name).toBe('Willowmere Creek Road CL');
    expect(res.json.alignment).toEqual(first.alignment);
    expect(res.json.profile).toEqual(first.profile);
    // The fixture's elements: line 250, arc R 800 cw 300, line 200, arc R 1200 ccw 150 (written in the file).
    const els = first.alignment.elements;
    expect(els.map((e: { type: string }) => e.type)).toEqual(['line', 'arc', 'line', 'arc']);
    expect(els[1].direction).toBe('right');
    expect(els[3].direction).toBe('left');
    expect(els[1].radius).toBeCloseTo(800, 6);
    expect(els[3].length).toBeCloseTo(150, 6);
    expect(first.profile.pvis).toHaveLength(4);
  });

  it('gives fragments that drop into a bridge description the engine accepts', async () => {
    const res = await upload({ who: 'engineer', file: fixture('creek-road-ft.xml') });
    const description = { ...demoBridges[0], alignment: res.json.alignment, profile: res.json.profile };
    const parsed = parseBridge(description);
    expect(parsed.ok, parsed.ok ? '' : parsed.message).toBe(true);
  });

  it('offers every alignment of a file that holds several', async () => {
    const res = await upload({ who: 'engineer', file: fixture('two-ramps-m.xml'), units: 'm' });
    expect(res.status).toBe(200);
    expect(res.json.alignments.map((a: { name: string }) => a.name)).toEqual(['Ramp A', 'Ramp K']);
  });

  it('refuses entity expansion within a second, and the server keeps answering', async () => {
    const before = await listBridges();
    const t0 = performance.now();
    const res = await upload({ who: 'engineer', file: fixture('entity-expansion.xml') });
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/DOCTYPE or ENTITY/);
    expect(res.json.fields.file).toBeDefined();
    const up = await call(health.GET);
    expect(up.status).toBe(200);
    expect(await listBridges()).toHaveLength(before.length);
  });

  it('imports clothoid spirals, and says why no profile came with them', async () => {
    const res = await upload({ who: 'engineer', file: fixture('spiral-ft.xml'), units: 'ft' });
    expect(res.status, res.text).toBe(200);
    // Written in the file: Spiral length 200, radiusStart INF, radiusEnd 1000, rot cw.
    expect(res.json.alignment.elements[1]).toEqual({ type: 'spiral', length: 200, radius_start: null, radius_end: 1000, direction: 'right' });
    expect(res.json.profile).toBeNull();
    expect(res.json.alignments[0].profile_left_out[0]).toMatch(/no design profile/);
  });

  it('decodes a Latin-1 file by its declaration and reads its circular vertical curves', async () => {
    const res = await upload({ who: 'engineer', file: fixture('bretelle-circ-m-latin1.xml'), units: 'm' });
    expect(res.status, res.text).toBe(200);
    expect(res.json.alignments[0].name).toBe('Bretelle Sud, échangeur Nord');
    expect(res.json.alignments[0].notes.join(' ')).toMatch(/CircCurve at station 2\+420\.000 .* differ by at most/);
  });

  it('answers 422 with a list of problems per alignment when none can be imported', async () => {
    const res = await upload({ who: 'engineer', file: fixture('several-problems-ft.xml') });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/"Ramp E" \(2 problems\), "Ramp F" \(4 problems\)/);
    expect(res.json.fields['alignments.0.name']).toEqual(['Ramp E']);
    expect(res.json.fields['alignments.0.problems']).toHaveLength(2);
    expect(res.json.fields['alignments.1.name']).toEqual(['Ramp F']);
    expect(res.json.fields['alignments.1.problems'][0]).toMatch(/Station equation at station 3\+45\.00/);
  });

  it('refuses a unit mismatch with the bridge (422)', async () => {
    const res = await upload({ who: 'engineer', file: fixture('creek-road-ft.xml'), units: 'm' });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(/in feet .* this bridge is in metres/);
  });

  it('refuses malformed XML (400) and a file with no alignment (422)', async () => {
    const bad = await upload({ who: 'engineer', file: '<LandXML><Units></LandXML>' });
    expect(bad.status).toBe(400);
    expect(bad.json.error).toMatch(/not well-formed XML/);
    const empty = await upload({ who: 'engineer', file: '<LandXML><Units><Imperial linearUnit="foot"/></Units></LandXML>' });
    expect(empty.status).toBe(422);
    expect(empty.json.error).toMatch(/no Alignment/);
  });

  it('answers 413 over 5 MB', async () => {
    const big = new Uint8Array(5 * 1024 * 1024 + 10).fill(0x20);
    big[0] = 0x3c;
    const res = await upload({ who: 'engineer', file: big });
    expect(res.status).toBe(413);
    expect(res.json.error).toMatch(/5 MB/);
  });

  it('answers 415 for a file that is not XML text', async () => {
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const res = await upload({ who: 'engineer', file: png, filename: 'photo.png', type: 'image/png' });
    expect(res.status).toBe(415);
  });

  it('answers 400 with fields for a missing file or a bad units field', async () => {
    const none = await upload({ who: 'engineer', units: 'ft' });
    expect(none.status).toBe(400);
    expect(none.json.fields.file).toBeDefined();
    const units = await upload({ who: 'engineer', file: fixture('creek-road-ft.xml'), units: 'yards' });
    expect(units.status).toBe(400);
    expect(units.json.fields.units).toBeDefined();
  });

  it('answers 400 to a JSON body', async () => {
    const res = await call(landxml.POST, { method: 'POST', cookie: people.engineer.cookie, body: { file: 'x' } });
    expect(res.status).toBe(400);
  });

  it('lets only engineers and admins import', async () => {
    expect((await upload({ file: fixture('creek-road-ft.xml') })).status).toBe(401);
    expect((await upload({ who: 'crew', file: fixture('creek-road-ft.xml') })).status).toBe(403);
    expect((await upload({ who: 'inspector', file: fixture('creek-road-ft.xml') })).status).toBe(403);
    expect((await upload({ who: 'admin', file: fixture('creek-road-ft.xml') })).status).toBe(200);
  });
});

// The editor and history pages read single revisions through this route; its tests sit here with the
// rest of the editor's API tests.

describe('GET /api/bridges/:id/revisions/:revision', () => {
  it('returns each stored revision with its own description, author and note', async () => {
    const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: 'Revision reader', description: demoBridges[0] });
    const changed = JSON.parse(JSON.stringify(demoBridges[0]));
    changed.girders[0].offsets[1] = -18.0;
    const saved = await call(revisions.POST, {
      method: 'POST',
      cookie: people.engineer.cookie,
      params: { id: String(id) },
      body: { base_revision: 1, description: changed, note: 'G1 moved at Pier 2' },
    });
    expect(saved.status).toBe(201);
    const one = await call(revisionOne.GET, { cookie: people.crew.cookie, params: { id: String(id), revision: '1' } });
    const two = await call(revisionOne.GET, { cookie: people.crew.cookie, params: { id: String(id), revision: '2' } });
    expect(one.status).toBe(200);
    expect(one.json.description.girders[0].offsets[1]).toBe(-18.2);
    expect(two.json.description.girders[0].offsets[1]).toBe(-18.0);
    expect(two.json).toMatchObject({ revision: 2, note: 'G1 moved at Pier 2', author: 'Test engineer' });
    expect(two.text).not.toMatch(/password|authorId/i);
  });

  it('answers 404 for a revision or bridge that does not exist', async () => {
    for (const params of [
      { id: '1', revision: '99' },
      { id: '1', revision: 'abc' },
      { id: '99999', revision: '1' },
    ]) {
      const res = await call(revisionOne.GET, { cookie: people.crew.cookie, params });
      expect(res.status).toBe(404);
      expect(res.json.error).toMatch(/does not exist|no bridge/);
    }
  });
});
