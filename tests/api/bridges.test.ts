import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import * as bridges from '@/app/api/bridges/route';
import * as bridge from '@/app/api/bridges/[id]/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import { Bridge, GeometryRevision } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

async function counts() {
  return { bridges: await Bridge.count(), revisions: await GeometryRevision.count() };
}

beforeAll(async () => {
  people = await makeUsers();
});

describe('POST /api/bridges', () => {
  it('creates a bridge with revision 1 and lists it', async () => {
    const created = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Heron Flats Viaduct', description: demoBridges[0] } });
    expect(created.status).toBe(201);
    expect(created.json).toMatchObject({ name: 'Heron Flats Viaduct', revision: 1 });
    const list = await call(bridges.GET, { cookie: people.crew.cookie });
    expect(list.json.map((b: { id: number }) => b.id)).toContain(created.json.id);
    const one = await call(bridge.GET, { cookie: people.crew.cookie, params: { id: String(created.json.id) } });
    expect(one.json.description.girders).toEqual(demoBridges[0].girders);
  });

  it('refuses a missing name with 400 and a field error, writing nothing', async () => {
    const before = await counts();
    const res = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { description: demoBridges[0] } });
    expect(res.status).toBe(400);
    expect(res.json.fields.name?.length).toBeGreaterThan(0);
    expect(typeof res.json.error).toBe('string');
    expect(await counts()).toEqual(before);
  });

  it('refuses a description that breaks the schema with 400 naming the field, writing nothing', async () => {
    const before = await counts();
    const broken = { ...demoBridges[0], units: 'furlongs' };
    const res = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Broken', description: broken } });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.fields)).toContain('description.units');
    expect(await counts()).toEqual(before);
  });

  it('refuses geometry that cannot be built with 422, writing nothing', async () => {
    const before = await counts();
    const base = demoBridges[0];
    // A girder pushed out past the left deck edge: no overhang is left to form.
    const girders = base.girders.map((g, i) => (i === 0 ? { ...g, offsets: g.offsets.map(() => base.deck.left_edge_offset - 1) } : g));
    const res = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Off the deck', description: { ...base, girders } } });
    expect(res.status).toBe(422);
    expect(res.json.error).toMatch(new RegExp(base.girders[0].name));
    expect(await counts()).toEqual(before);
  });

  it('refuses malformed JSON with 400 and an oversize body with 413', async () => {
    const bad = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, rawBody: '{"name": ' });
    expect(bad.status).toBe(400);
    const big = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, rawBody: JSON.stringify({ name: 'x'.repeat(3 * 1024 * 1024) }) });
    expect(big.status).toBe(413);
  });
});

describe('revisions', () => {
  it('adds revisions on the latest base and answers 409 on a stale one, writing nothing', async () => {
    const created = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Stale test', description: demoBridges[1] } });
    const id = String(created.json.id);
    const first = await call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: demoBridges[1], note: 'first edit' } });
    expect(first.status).toBe(201);
    expect(first.json.revision).toBe(2);
    const before = await counts();
    const stale = await call(revisions.POST, { method: 'POST', cookie: people.admin.cookie, params: { id }, body: { base_revision: 1, description: demoBridges[1], note: 'late edit' } });
    expect(stale.status).toBe(409);
    expect(stale.json.error).toMatch(/reload/i);
    expect(await counts()).toEqual(before);
    const history = await call(revisions.GET, { cookie: people.crew.cookie, params: { id } });
    expect(history.json.map((r: { revision: number }) => r.revision)).toEqual([2, 1]);
    expect(history.json[0]).toMatchObject({ note: 'first edit', author: 'Test engineer' });
  });

  it('of several saves on the same base exactly one wins', async () => {
    const created = await call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name: 'Race', description: demoBridges[1] } });
    const id = String(created.json.id);
    const results = await Promise.all(
      Array.from({ length: 12 }, (_, i) =>
        call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: demoBridges[1], note: `save ${i}` } }),
      ),
    );
    const statuses = results.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(11);
    expect(await GeometryRevision.count({ where: { bridgeId: Number(id) } })).toBe(2);
  });

  it('answers 404 for a bridge that does not exist', async () => {
    const res = await call(bridge.GET, { cookie: people.crew.cookie, params: { id: '99999' } });
    expect(res.status).toBe(404);
    const junk = await call(bridge.GET, { cookie: people.crew.cookie, params: { id: '../etc' } });
    expect(junk.status).toBe(404);
  });
});
