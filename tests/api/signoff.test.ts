import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable } from '@/lib/geometry';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as signoffs from '@/app/api/bridges/[id]/signoffs/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as audit from '@/app/api/bridges/[id]/audit/route';
import { SignOff } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

const table = computeOffsetTable(demoBridges[0]);
// The brackets of span 1: every girder point of both exterior girders (G1 left, G5 right in the demo).
const span1 = table.points.filter((p) => p.span === 1 && p.side !== 'interior');

const record = (id: string, body: unknown) => call(checks.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body });
const signOff = (id: string, body: unknown, who: Role = 'inspector') => call(signoffs.POST, { method: 'POST', cookie: people[who].cookie, params: { id }, body });

/** Records a passing check (within a few thousandths) at every bracket of span 1, readings where surveyed. */
async function checkWholeSpan(id: string, rows = span1) {
  for (const p of rows) {
    const res = await record(id, {
      span: p.span,
      girder: p.girder,
      point: p.point,
      measured_edge_width: p.edge_width! + 0.003,
      ...(p.drop_from_girder_top !== null ? { measured_drop_from_girder_top: p.drop_from_girder_top - 0.004 } : {}),
    });
    expect(res.status).toBe(201);
    expect(res.json.pass).toBe(true);
  }
}

beforeAll(async () => {
  people = await makeUsers();
});

describe('sign-off of a span', () => {
  it('has both exterior girders and surveyed points to check in span 1', () => {
    expect(new Set(span1.map((p) => p.girder))).toEqual(new Set(['G1', 'G5']));
    expect(span1.filter((p) => p.drop_from_girder_top !== null).length).toBe(6);
  });

  it('is refused with 409 and a list of every missing bracket until all pass', async () => {
    const id = await demoBridge(people.engineer);
    const none = await signOff(id, { span: 1 });
    expect(none.status).toBe(409);
    // Every bracket's width and every surveyed reading is listed.
    const listed = Object.values(none.json.fields as Record<string, string[]>).flat();
    expect(listed.length).toBe(span1.length + 6);
    expect(none.json.fields['G1 point 0']).toEqual(['edge width: not checked yet', 'level-bar reading: not checked yet']);

    await checkWholeSpan(id, span1.slice(0, -1));
    const last = span1[span1.length - 1];
    const almost = await signOff(id, { span: 1 });
    expect(almost.status).toBe(409);
    expect(Object.keys(almost.json.fields)).toEqual([`${last.girder} point ${last.point}`]);

    // A failing latest check blocks too, even after a passing one.
    await checkWholeSpan(id, [last]);
    const fail = await record(id, { span: 1, girder: 'G1', point: 4, measured_edge_width: span1.find((p) => p.girder === 'G1' && p.point === 4)!.edge_width! + 0.5 });
    expect(fail.json.pass).toBe(false);
    const blocked = await signOff(id, { span: 1 });
    expect(blocked.status).toBe(409);
    expect(blocked.json.fields['G1 point 4'][0]).toMatch(/out of tolerance/);
    expect(await SignOff.count({ where: { bridgeId: Number(id) } })).toBe(0);

    // The correction supersedes the failing check; now the span can be signed off.
    await checkWholeSpan(
      id,
      span1.filter((p) => p.girder === 'G1' && p.point === 4),
    );
    const done = await signOff(id, { span: 1, note: 'Overhang forms G1 and G5 checked before the pour' });
    expect(done.status, done.text).toBe(201);
    expect(done.json).toMatchObject({ span: 1, revision: 1, by: 'Test inspector', out_of_date: false });

    const again = await signOff(id, { span: 1 });
    expect(again.status).toBe(409);
    expect(again.json.error).toMatch(/already signed off/);
  });

  it('shows the sign-off as out of date after a later geometry revision', async () => {
    const id = await demoBridge(people.engineer);
    await checkWholeSpan(id);
    expect((await signOff(id, { span: 1 })).status).toBe(201);
    const before = await call(signoffs.GET, { cookie: people.crew.cookie, params: { id } });
    expect(before.json.spans[0]).toMatchObject({ span: 1, ready: true });
    expect(before.json.spans[0].signoff.out_of_date).toBe(false);
    expect(before.json.spans[1].ready).toBe(false);

    const changed = structuredClone(demoBridges[0]);
    changed.deck.slab_thickness += 0.01;
    expect((await call(revisions.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { base_revision: 1, description: changed } })).status).toBe(201);
    const after = await call(signoffs.GET, { cookie: people.crew.cookie, params: { id } });
    expect(after.json.current_revision).toBe(2);
    expect(after.json.spans[0].signoff).toMatchObject({ revision: 1, out_of_date: true });
    expect(after.json.spans[0].ready).toBe(false);
    expect(after.json.spans[0].missing[0].reason).toMatch(/revision 1; check again against revision 2/);
  });

  it('refuses an unknown span with 400, a crew member with 403, and audits the sign-off', async () => {
    const id = await demoBridge(people.engineer);
    const bad = await signOff(id, { span: 8 });
    expect(bad.status).toBe(400);
    expect(bad.json.fields.span).toBeDefined();
    expect((await signOff(id, { span: 'first' })).status).toBe(400);
    expect((await signOff(id, { span: 1 }, 'crew')).status).toBe(403);
    await checkWholeSpan(id);
    expect((await signOff(id, { span: 1 }, 'admin')).status).toBe(201);
    const log = await call(audit.GET, { cookie: people.crew.cookie, params: { id } });
    const events = log.json.filter((e: { action: string }) => e.action === 'signoff.create');
    expect(events).toHaveLength(1);
    expect(events[0].detail).toMatchObject({ span: 1, revision: 1 });
  });
});
