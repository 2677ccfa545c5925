import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as tolerances from '@/app/api/bridges/[id]/tolerances/route';
import * as audit from '@/app/api/bridges/[id]/audit/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as bridgeRoute from '@/app/api/bridges/[id]/route';
import { FieldCheck } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge, engineRow } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
let bridgeId: string;

// Tolerances (common practice): ±1/4 inch on the edge width, ±0.01 ft on the level-bar reading.
const QUARTER_INCH_FT = 0.25 / 12;

const post = (who: Role | null, body: unknown, id = bridgeId) => call(checks.POST, { method: 'POST', cookie: who ? people[who].cookie : undefined, params: { id }, body });

beforeAll(async () => {
  people = await makeUsers();
  bridgeId = await demoBridge(people.engineer);
});

describe('POST /api/bridges/:id/checks', () => {
  it('passes an edge width 0.001 ft off the computed value and reports the deviation', async () => {
    const row = engineRow(1, 'G1', 7);
    const res = await post('inspector', { span: 1, girder: 'G1', point: 7, measured_edge_width: row.edge_width! + 0.001 });
    expect(res.status, res.text).toBe(201);
    expect(res.json.width_pass).toBe(true);
    expect(res.json.pass).toBe(true);
    expect(res.json.width_deviation).toBeCloseTo(0.001, 9);
    expect(res.json.computed_edge_width).toBeCloseTo(row.edge_width!, 9);
    expect(res.json.width_tolerance).toBeCloseTo(QUARTER_INCH_FT, 12);
    expect(res.json.revision).toBe(1);
    expect(res.json.reading_pass).toBeNull();
  });

  it('fails an edge width 6 inches off', async () => {
    const row = engineRow(2, 'G5', 3);
    const res = await post('inspector', { span: 2, girder: 'G5', point: 3, measured_edge_width: row.edge_width! - 0.5 });
    expect(res.status).toBe(201);
    expect(res.json.width_pass).toBe(false);
    expect(res.json.pass).toBe(false);
    expect(res.json.width_deviation).toBeCloseTo(-0.5, 9);
  });

  it('checks a level-bar reading where the top of girder was surveyed (pass at 0.005 ft, fail at 0.02 ft)', async () => {
    const row = engineRow(1, 'G5', 10);
    expect(row.drop_from_girder_top).not.toBeNull();
    const good = await post('inspector', { span: 1, girder: 'G5', point: 10, measured_drop_from_girder_top: row.drop_from_girder_top! + 0.005 });
    expect(good.status).toBe(201);
    expect(good.json.reading_pass).toBe(true);
    expect(good.json.reading_deviation).toBeCloseTo(0.005, 9);
    expect(good.json.width_pass).toBeNull();
    const bad = await post('inspector', {
      span: 1,
      girder: 'G5',
      point: 10,
      measured_edge_width: row.edge_width!,
      measured_drop_from_girder_top: row.drop_from_girder_top! - 0.02,
    });
    expect(bad.json.width_pass).toBe(true);
    expect(bad.json.reading_pass).toBe(false);
    expect(bad.json.pass).toBe(false);
  });

  it('says clearly that a reading cannot be checked where the top of girder was not surveyed, and writes nothing', async () => {
    expect(engineRow(1, 'G1', 5).drop_from_girder_top).toBeNull();
    const before = await FieldCheck.count();
    const res = await post('inspector', { span: 1, girder: 'G1', point: 5, measured_edge_width: 4, measured_drop_from_girder_top: 0.3 });
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/not surveyed/i);
    expect(res.json.fields.measured_drop_from_girder_top[0]).toMatch(/survey/i);
    expect(await FieldCheck.count()).toBe(before);
  });

  it('refuses nonsense with 400 and field errors, writing nothing', async () => {
    const before = await FieldCheck.count();
    const cases: [unknown, string][] = [
      [{ span: 9, girder: 'G1', point: 0, measured_edge_width: 4 }, 'span'],
      [{ span: 1, girder: 'G9', point: 0, measured_edge_width: 4 }, 'girder'],
      [{ span: 1, girder: 'G3', point: 0, measured_edge_width: 4 }, 'girder'],
      [{ span: 1, girder: 'G1', point: 99, measured_edge_width: 4 }, 'point'],
      [{ span: 1, girder: 'G1', point: 2, measured_edge_width: '4.25' }, 'measured_edge_width'],
      [{ span: 1, girder: 'G1', point: 2, measured_edge_width: -4 }, 'measured_edge_width'],
      [{ span: 1, girder: 'G1', point: 2 }, 'measured_edge_width'],
      [{ span: 'one', girder: 'G1', point: 2, measured_edge_width: 4 }, 'span'],
      [{ span: 1, girder: 'G1', point: 1.5, measured_edge_width: 4 }, 'point'],
    ];
    for (const [body, field] of cases) {
      const res = await post('inspector', body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.json.fields ?? {}), JSON.stringify(body)).toContain(field);
    }
    const interior = await post('inspector', { span: 1, girder: 'G3', point: 0, measured_edge_width: 4 });
    expect(interior.json.error).toMatch(/interior/i);
    const malformed = await call(checks.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id: bridgeId }, rawBody: '{"span": 1,' });
    expect(malformed.status).toBe(400);
    expect(await FieldCheck.count()).toBe(before);
  });

  it('lets crew and engineers read but not record; admin records', async () => {
    const before = await FieldCheck.count();
    const body = { span: 1, girder: 'G1', point: 1, measured_edge_width: 4 };
    expect((await post(null, body)).status).toBe(401);
    expect((await post('crew', body)).status).toBe(403);
    expect((await post('engineer', body)).status).toBe(403);
    expect(await FieldCheck.count()).toBe(before);
    expect((await post('admin', body)).status).toBe(201);
    expect((await call(checks.GET, { cookie: people.crew.cookie, params: { id: bridgeId } })).status).toBe(200);
    expect((await call(checks.GET, { params: { id: bridgeId } })).status).toBe(401);
  });

  it('404s for a bridge that does not exist', async () => {
    expect((await post('inspector', { span: 1, girder: 'G1', point: 1, measured_edge_width: 4 }, '999999')).status).toBe(404);
    expect((await call(checks.GET, { cookie: people.crew.cookie, params: { id: 'abc' } })).status).toBe(404);
  });
});

describe('corrections and history', () => {
  it('keeps both checks; the correction supersedes the first; newest first', async () => {
    const row = engineRow(3, 'G1', 12);
    const first = await post('inspector', { span: 3, girder: 'G1', point: 12, measured_edge_width: row.edge_width! + 0.1, note: 'tape sagged' });
    const second = await post('inspector', { span: 3, girder: 'G1', point: 12, measured_edge_width: row.edge_width! + 0.002, note: 're-measured' });
    expect(first.json.pass).toBe(false);
    expect(second.json.pass).toBe(true);
    expect(second.json.supersedes_id).toBe(first.json.id);
    const list = await call(checks.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    const ids = list.json.map((c: { id: number }) => c.id);
    expect(ids).toEqual([...ids].sort((a: number, b: number) => b - a));
    const old = list.json.find((c: { id: number }) => c.id === first.json.id);
    expect(old.superseded_by).toBe(second.json.id);
    expect(old.note).toBe('tape sagged');
    expect(list.json.find((c: { id: number }) => c.id === second.json.id).superseded_by).toBeNull();
  });

  it('stores the revision the computed values came from', async () => {
    const id = await demoBridge(people.engineer);
    const changed = structuredClone(demoBridges[0]);
    changed.deck.right_edge_offset += 0.5;
    const rev = await call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: changed, note: 'wider deck' } });
    expect(rev.status).toBe(201);
    const row = engineRow(1, 'G5', 4, changed);
    const res = await post('inspector', { span: 1, girder: 'G5', point: 4, measured_edge_width: row.edge_width! }, id);
    expect(res.json.revision).toBe(2);
    expect(res.json.width_deviation).toBeCloseTo(0, 9);
    // Against revision 1 the same measurement is about 0.5 ft too wide, so the table used is revision 2's.
    expect(engineRow(1, 'G5', 4).edge_width! - row.edge_width!).toBeLessThan(-0.4);
  });

  it('records every check in the audit log', async () => {
    const log = await call(audit.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    expect(log.status).toBe(200);
    const count = await FieldCheck.count({ where: { bridgeId: Number(bridgeId) } });
    expect(log.json.filter((e: { action: string }) => e.action === 'check.create')).toHaveLength(count);
  });
});

describe('tolerances per bridge', () => {
  it('defaults to 1/4 inch and 0.01 ft on a feet bridge and 6 mm and 3 mm on a metric one', async () => {
    const ft = await call(tolerances.GET, { cookie: people.crew.cookie, params: { id: bridgeId } });
    expect(ft.json.width_tolerance).toBeCloseTo(QUARTER_INCH_FT, 12);
    expect(ft.json.reading_tolerance).toBeCloseTo(0.01, 12);
    expect(ft.json.base_rod_length).toBeCloseTo(0.5, 12);
    const metricId = await demoBridge(people.engineer, { ...demoBridges[0], units: 'm' });
    const m = await call(tolerances.GET, { cookie: people.crew.cookie, params: { id: metricId } });
    expect(m.json.width_tolerance).toBeCloseTo(0.006, 12);
    expect(m.json.reading_tolerance).toBeCloseTo(0.003, 12);
    expect(m.json.base_rod_length).toBeCloseTo(0.15, 12);
  });

  it('an engineer tightens the width tolerance and the next check uses it; an inspector cannot', async () => {
    const id = await demoBridge(people.engineer);
    expect((await call(tolerances.PATCH, { method: 'PATCH', cookie: people.inspector.cookie, params: { id }, body: { width_tolerance: 0.0005 } })).status).toBe(403);
    const bad = await call(tolerances.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id }, body: { width_tolerance: -1 } });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.width_tolerance).toBeDefined();
    const set = await call(tolerances.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id }, body: { width_tolerance: 0.0005 } });
    expect(set.status).toBe(200);
    expect(set.json.is_default.width_tolerance).toBe(false);
    const row = engineRow(1, 'G1', 7);
    const res = await post('inspector', { span: 1, girder: 'G1', point: 7, measured_edge_width: row.edge_width! + 0.001 }, id);
    expect(res.json.width_pass).toBe(false);
    const reset = await call(tolerances.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id }, body: { width_tolerance: null } });
    expect(reset.json.width_tolerance).toBeCloseTo(QUARTER_INCH_FT, 12);
    expect(reset.json.is_default.width_tolerance).toBe(true);
  });
});

describe('deleting a bridge', () => {
  it('takes its checks with it (the field tables cascade with the bridge)', async () => {
    const id = await demoBridge(people.engineer);
    const row = engineRow(1, 'G1', 0);
    expect((await post('inspector', { span: 1, girder: 'G1', point: 0, measured_edge_width: row.edge_width! }, id)).status).toBe(201);
    expect((await post('inspector', { span: 1, girder: 'G1', point: 0, measured_edge_width: row.edge_width! }, id)).status).toBe(201);
    const res = await call(bridgeRoute.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id } });
    expect(res.status, res.text).toBeLessThan(300);
    expect(await FieldCheck.count({ where: { bridgeId: Number(id) } })).toBe(0);
  });
});

describe('a resend of the same measurement', () => {
  it('is recorded once: the second send answers 200 with the first check', async () => {
    const row = engineRow(3, 'G1', 4);
    const body = { span: 3, girder: 'G1', point: 4, measured_edge_width: row.edge_width! + 0.003, client_key: 'field-entry-7f3a9c21' };
    const before = await FieldCheck.count();
    const first = await post('inspector', body);
    expect(first.status).toBe(201);
    const again = await post('inspector', body);
    expect(again.status).toBe(200);
    expect(again.json.id).toBe(first.json.id);
    expect(again.json.replayed).toBe(true);
    const raced = await Promise.all([post('inspector', { ...body, client_key: 'field-entry-race-01' }), post('inspector', { ...body, client_key: 'field-entry-race-01' })]);
    expect(raced.map((r) => r.status).sort()).toEqual([200, 201]);
    expect(await FieldCheck.count()).toBe(before + 2);
  });

  it('refuses a malformed key with 400 and writes nothing', async () => {
    const before = await FieldCheck.count();
    const res = await post('inspector', { span: 1, girder: 'G1', point: 1, measured_edge_width: 3, client_key: '../../x' });
    expect(res.status).toBe(400);
    expect(Object.keys(res.json.fields)).toContain('client_key');
    expect(await FieldCheck.count()).toBe(before);
  });
});
