import { NextRequest } from 'next/server';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import { computeOffsetTable } from '@/lib/geometry';
import * as bridges from '@/app/api/bridges/route';
import * as bridge from '@/app/api/bridges/[id]/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import * as signoffs from '@/app/api/bridges/[id]/signoffs/route';
import { Bridge } from '@/models';
import { listDistricts } from '@/lib/services/bridge-list';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

const create = (body: Record<string, unknown>) => call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { description: demoBridges[0], ...body } });
const list = async (query = '') => {
  const res = await call(bridges.GET, { cookie: people.crew.cookie, path: `/api/bridges${query}` });
  return res;
};
const names = (res: { json: { name: string }[] }) => res.json.map((b) => b.name);

// The demo bridge's own engine table tells which brackets (exterior girder points) exist.
const table = computeOffsetTable(demoBridges[0]);
const span1 = table.points.filter((p) => p.span === 1 && p.side !== 'interior');
const brackets = table.points.filter((p) => p.side !== 'interior').length;
const spanCount = new Set(table.points.map((p) => p.span)).size;

beforeAll(async () => {
  people = await makeUsers();
  // Seven bridges with known records; names share a prefix so the search below can tell them apart.
  const rows: Record<string, unknown>[] = [
    { name: 'Portfolio Alder Creek', structureNumber: 'PX-0101', route: 'County Road 12', district: 'North', stage: 'forming' },
    { name: 'Portfolio Birch Slough', structureNumber: 'PX-0102', route: 'Route 7', district: 'North', stage: 'design' },
    { name: 'Portfolio Cedar Wash', structureNumber: 'PX-0203', route: 'Route 7', district: 'South', stage: 'poured' },
    { name: 'Portfolio Dogwood Run', structureNumber: 'QZ-9001', route: 'Mill Lane', district: 'South', stage: 'forming' },
    { name: 'Portfolio Elm 50%', structureNumber: 'PX-0305', route: 'Old Quarry Road', district: 'East', stage: 'checked' },
    { name: 'Portfolio Fir Gap', route: 'County Road 12', district: 'East' },
    { name: 'Portfolio Gum Hollow', structureNumber: 'PX-0407', district: 'West', contractor: 'Invented Formworks Co.', featureCrossed: 'Gum Creek' },
  ];
  for (const r of rows) expect((await create(r)).status).toBe(201);
});

describe('bridge record fields', () => {
  it('are stored on create, returned by GET and changed by PATCH', async () => {
    const made = await create({ name: 'Record Test', structureNumber: ' RT-1 ', route: 'Route 9', featureCrossed: 'Spring Brook', district: 'Hill', contractor: 'Made-up Builders', stage: 'forming' });
    const id = String(made.json.id);
    const got = await call(bridge.GET, { cookie: people.crew.cookie, params: { id } });
    expect(got.json).toMatchObject({ structureNumber: 'RT-1', route: 'Route 9', featureCrossed: 'Spring Brook', district: 'Hill', contractor: 'Made-up Builders', stage: 'forming' });
    const patched = await call(bridge.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id }, body: { stage: 'checked', contractor: '' } });
    expect(patched.status).toBe(200);
    expect(patched.json).toMatchObject({ name: 'Record Test', stage: 'checked', contractor: null, route: 'Route 9' });
  });

  it('defaults to an empty record at stage design', async () => {
    const made = await create({ name: 'Bare Record' });
    const got = await call(bridge.GET, { cookie: people.crew.cookie, params: { id: String(made.json.id) } });
    expect(got.json).toMatchObject({ structureNumber: null, route: null, featureCrossed: null, district: null, contractor: null, stage: 'design' });
  });

  it('refuses an unknown stage or an empty PATCH with 400, writing nothing', async () => {
    const before = await Bridge.count();
    const bad = await create({ name: 'Bad Stage', stage: 'demolished' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.json.fields)).toContain('stage');
    expect(await Bridge.count()).toBe(before);
    const one = (await list('?q=Alder')).json[0];
    const empty = await call(bridge.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id: String(one.id) }, body: {} });
    expect(empty.status).toBe(400);
    const long = await call(bridge.PATCH, { method: 'PATCH', cookie: people.engineer.cookie, params: { id: String(one.id) }, body: { structureNumber: 'X'.repeat(41) } });
    expect(long.status).toBe(400);
    expect((await list('?q=Alder')).json[0].structureNumber).toBe('PX-0101');
  });
});

describe('GET /api/bridges search and filters', () => {
  it('searches name, structure number and route, ignoring case', async () => {
    expect(names(await list('?q=cedar'))).toEqual(['Portfolio Cedar Wash']);
    expect(names(await list('?q=qz-9001'))).toEqual(['Portfolio Dogwood Run']);
    expect(names(await list('?q=county%20road%2012')).sort()).toEqual(['Portfolio Alder Creek', 'Portfolio Fir Gap']);
  });

  it('takes % and _ in the search literally', async () => {
    expect(names(await list('?q=50%25'))).toEqual(['Portfolio Elm 50%']);
    expect(names(await list('?q=PX_0'))).toEqual([]);
  });

  it('filters by stage and district, combined with the search', async () => {
    expect(names(await list('?q=Portfolio&stage=forming')).sort()).toEqual(['Portfolio Alder Creek', 'Portfolio Dogwood Run']);
    expect(names(await list('?district=South')).sort()).toEqual(['Portfolio Cedar Wash', 'Portfolio Dogwood Run']);
    expect(names(await list('?q=route%207&district=North'))).toEqual(['Portfolio Birch Slough']);
  });

  it("offers the districts in use for the page's filter: each once, in order, none empty", async () => {
    // Worked out independently from every bridge the list API returns (the districts above and any
    // other test's) and compared with the filter's own read.
    const all = (await list('?limit=500')).json as { district: string | null }[];
    const expected = [...new Set(all.map((b) => b.district).filter((d): d is string => Boolean(d)))].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
    expect(expected).toEqual(expect.arrayContaining(['East', 'North', 'South', 'West']));
    expect(await listDistricts()).toEqual(expected);
  });

  it('answers 400 naming the parameter for a bad stage, attention, sort or limit', async () => {
    for (const [query, field] of [
      ['?stage=finished', 'stage'],
      ['?attention=everything', 'attention'],
      ['?sort=colour', 'sort'],
      ['?limit=0', 'limit'],
      ['?limit=501', 'limit'],
      ['?limit=ten', 'limit'],
    ]) {
      const res = await list(query);
      expect(res.status, query).toBe(400);
      expect(Object.keys(res.json.fields), query).toContain(field);
    }
  });
});

describe('GET /api/bridges paging', () => {
  /** One page through the handler, with its X-Next-Cursor header (helpers.call drops headers). */
  async function page(query: string, limit: number, cursor: string | null) {
    const req = new NextRequest(new URL(`/api/bridges?${query}&limit=${limit}${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`, 'http://localhost:3000'), {
      headers: { cookie: people.crew.cookie },
    });
    const res = await bridges.GET(req, { params: Promise.resolve({}) } as never);
    expect(res.status).toBe(200);
    return { rows: (await res.json()) as { id: number; name: string; activityAt: string }[], next: res.headers.get('X-Next-Cursor') };
  }

  async function walk(query: string, limit: number) {
    const seen: { id: number; name: string; activityAt: string }[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const got = await page(query, limit, cursor);
      expect(got.rows.length).toBeLessThanOrEqual(limit);
      seen.push(...got.rows);
      cursor = got.next;
      pages += 1;
    } while (cursor && pages < 20);
    return { seen, pages };
  }

  it('walks every matching bridge once, in name order, three at a time', async () => {
    const { seen, pages } = await walk('q=Portfolio&sort=name', 3);
    expect(pages).toBe(3);
    const expected = seen.map((b) => b.name).sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
    expect(seen.map((b) => b.name)).toEqual(expected);
    expect(new Set(seen.map((b) => b.id)).size).toBe(7);
  });

  it('walks newest activity first, and the last page has no cursor', async () => {
    const all = await Bridge.count();
    const { seen } = await walk('sort=activity', 2);
    expect(seen.length).toBe(all);
    expect(new Set(seen.map((b) => b.id)).size).toBe(all);
    const times = seen.map((b) => Date.parse(b.activityAt));
    for (let i = 1; i < times.length; i++) expect(times[i]).toBeLessThanOrEqual(times[i - 1]);
    expect((await page('sort=activity', all, null)).next).toBeNull();
  });

  it('refuses a made-up cursor and a cursor of another order with 400', async () => {
    const made = await list('?cursor=not-a-cursor');
    expect(made.status).toBe(400);
    expect(Object.keys(made.json.fields)).toContain('cursor');
    const byName = (await page('sort=name', 2, null)).next;
    const other = await list(`?sort=activity&cursor=${encodeURIComponent(byName!)}`);
    expect(other.status).toBe(400);
  });
});

describe('status counters', () => {
  const record = (id: string, body: unknown) => call(checks.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body });

  it('count brackets, failures, spans waiting for sign-off and spans signed off as the field work goes', async () => {
    const made = await create({ name: 'Counter Bridge', structureNumber: 'CB-1' });
    const id = String(made.json.id);
    const row = async () => (await list('?q=CB-1')).json[0];
    expect(await row()).toMatchObject({ bracketsPassing: 0, bracketsTotal: brackets, openFailures: 0, spansSignedOff: 0, spansTotal: spanCount, lastFieldAt: null });

    // Span 1 all in tolerance (a few thousandths off), readings where the top of girder was surveyed.
    for (const p of span1) {
      const res = await record(id, {
        span: 1,
        girder: p.girder,
        point: p.point,
        measured_edge_width: p.edge_width! + 0.003,
        ...(p.drop_from_girder_top !== null ? { measured_drop_from_girder_top: p.drop_from_girder_top - 0.004 } : {}),
      });
      expect(res.json.pass).toBe(true);
    }
    expect(await row()).toMatchObject({ bracketsPassing: span1.length, openFailures: 0, spansAwaitingSignoff: 1 });
    expect((await list('?attention=signoff')).json.map((b: { id: number }) => b.id)).toContain(Number(id));
    expect((await list('?attention=failures')).json.map((b: { id: number }) => b.id)).not.toContain(Number(id));

    // One bracket of span 2 half an inch wide: out of the ±1/4 in tolerance (common practice).
    const s2 = table.points.find((p) => p.span === 2 && p.side !== 'interior')!;
    expect((await record(id, { span: 2, girder: s2.girder, point: s2.point, measured_edge_width: s2.edge_width! + 0.5 / 12 })).json.pass).toBe(false);
    const failing = await row();
    expect(failing).toMatchObject({ bracketsPassing: span1.length, openFailures: 1 });
    expect(failing.lastFieldAt).not.toBeNull();
    expect((await list('?attention=failures')).json.map((b: { id: number }) => b.id)).toEqual([Number(id)]);

    expect((await call(signoffs.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { span: 1 } })).status).toBe(201);
    expect(await row()).toMatchObject({ spansSignedOff: 1, spansAwaitingSignoff: 0, openFailures: 1 });
    expect((await list('?attention=signoff')).json.map((b: { id: number }) => b.id)).not.toContain(Number(id));

    // Corrected: the bracket passes now and the failure is no longer open.
    expect((await record(id, { span: 2, girder: s2.girder, point: s2.point, measured_edge_width: s2.edge_width! })).json.pass).toBe(true);
    expect(await row()).toMatchObject({ openFailures: 0, bracketsPassing: span1.length + 1 });
  });
});
