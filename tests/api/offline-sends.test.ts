import { beforeAll, describe, expect, it } from 'vitest';
import * as attachments from '@/app/api/bridges/[id]/attachments/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import { demoBridges } from '@/lib/demo/bridges';
import { Attachment, FieldCheck } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import { callRaw, demoBridge, engineRow, multipartRequest, PNG_1X1 } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

// What a phone that kept a bridge offline sends when the connection returns: checks carrying the
// revision they were measured against, photos carrying their own client key.

let people: Record<Role, TestUser>;

const postCheck = (body: unknown, id: string) => call(checks.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body });

beforeAll(async () => {
  people = await makeUsers();
});

describe('a check measured against a revision that changed while the phone was offline', () => {
  it('is judged against the revision the phone showed and keeps that revision', async () => {
    const id = await demoBridge(people.engineer);
    const wider = structuredClone(demoBridges[0]);
    wider.deck.right_edge_offset += 0.5;
    const rev = await call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: wider, note: 'wider deck' } });
    expect(rev.status).toBe(201);
    // The engine's own row of revision 1 is the reference (the phone showed these targets).
    const old = engineRow(1, 'G5', 4);
    const res = await postCheck({ span: 1, girder: 'G5', point: 4, measured_edge_width: old.edge_width, revision: 1, client_key: 'offline-check-0001' }, id);
    expect(res.status, res.text).toBe(201);
    expect(res.json.revision).toBe(1);
    expect(res.json.computed_edge_width).toBeCloseTo(old.edge_width!, 9);
    expect(res.json.width_deviation).toBeCloseTo(0, 9);
    expect(res.json.pass).toBe(true);
    // Without a revision the same measurement is judged against revision 2, about half a foot narrower.
    const now = await postCheck({ span: 1, girder: 'G5', point: 4, measured_edge_width: old.edge_width }, id);
    expect(now.json.revision).toBe(2);
    expect(now.json.pass).toBe(false);
    // A resend of the first gives the first back, once.
    const again = await postCheck({ span: 1, girder: 'G5', point: 4, measured_edge_width: old.edge_width, revision: 1, client_key: 'offline-check-0001' }, id);
    expect(again.status).toBe(200);
    expect(again.json.id).toBe(res.json.id);
    expect(await FieldCheck.count({ where: { bridgeId: Number(id), clientKey: 'offline-check-0001' } })).toBe(1);
  });

  it('refuses a revision the bridge does not have yet, writing nothing', async () => {
    const id = await demoBridge(people.engineer);
    const row = engineRow(1, 'G1', 0);
    const res = await postCheck({ span: 1, girder: 'G1', point: 0, measured_edge_width: row.edge_width, revision: 5 }, id);
    expect(res.status).toBe(400);
    expect(res.json.fields.revision).toBeDefined();
    const bad = await postCheck({ span: 1, girder: 'G1', point: 0, measured_edge_width: row.edge_width, revision: 0 }, id);
    expect(bad.status).toBe(400);
    expect(await FieldCheck.count({ where: { bridgeId: Number(id) } })).toBe(0);
  });
});

describe('a photo sent again with its client key', () => {
  it('is stored once; the resend answers 200 with the first attachment', async () => {
    const id = await demoBridge(people.engineer);
    const send = async (fields: Record<string, string>) =>
      callRaw(attachments.POST, await multipartRequest(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: PNG_1X1, name: 'edge.png', type: 'image/png' }, fields), { id });
    const first = await send({ client_key: 'offline-photo-0001' });
    expect(first.status, first.body.toString()).toBe(201);
    const second = await send({ client_key: 'offline-photo-0001' });
    expect(second.status).toBe(200);
    expect(second.json.id).toBe(first.json.id);
    expect(await Attachment.count({ where: { bridgeId: Number(id) } })).toBe(1);
    // Another key is another photo; a malformed key is refused by name.
    expect((await send({ client_key: 'offline-photo-0002' })).status).toBe(201);
    const bad = await send({ client_key: 'no spaces!' });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.client_key).toBeDefined();
    expect(await Attachment.count({ where: { bridgeId: Number(id) } })).toBe(2);
  });
});
