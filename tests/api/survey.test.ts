import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import * as offsets from '@/app/api/bridges/[id]/offsets/route';
import * as survey from '@/app/api/bridges/[id]/survey/route';
import * as preview from '@/app/api/bridges/[id]/survey/preview/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as bridgeRoute from '@/app/api/bridges/[id]/route';
import { createBridge, getBridge } from '@/lib/services/bridges';
import { AuditEvent, GirderSurvey, SurveyImport } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
type Row = { span: number; girder: string; point: number; edge_drop: number | null; bottom_of_slab: number; top_of_girder: number | null; buildup: number | null; drop_from_girder_top: number | null };

beforeAll(async () => {
  people = await makeUsers();
});

async function newBridge(name: string): Promise<string> {
  const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name, description: demoBridges[0] });
  return String(id);
}

async function table(id: string): Promise<Row[]> {
  const res = await call(offsets.GET, { cookie: people.crew.cookie, params: { id } });
  expect(res.status).toBe(200);
  return res.json.points;
}

const at = (rows: Row[], girder: string, span: number, point: number) => rows.find((p) => p.girder === girder && p.span === span && p.point === point)!;
const storedCount = async (id: string) => GirderSurvey.count({ where: { bridgeId: Number(id) } });

const BAD_CSV = [
  'girder,span,point,elevation',
  'G1,1,4,253.10', // good
  'G7,1,4,253.10', // unknown girder
  'G1,1,40,253.10', // point out of range (20th points)
  'G1,1,4,253.20', // duplicate of line 2
  'G1,x,5,253.10', // non-numeric span
  'G1,9,5,253.10', // span out of range (three spans)
  'G5,2,3,level', // non-numeric elevation
].join('\n');

describe('top-of-girder survey import', () => {
  it('a file with bad rows gets a per-row report from preview and commit, and stores nothing', async () => {
    const id = await newBridge('Survey bad rows');
    const before = await table(id);
    const pre = await call(preview.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: BAD_CSV, filename: 'bad.csv' } });
    expect(pre.status).toBe(200);
    expect(pre.json.summary).toMatchObject({ rows: 7, good: 1, bad: 6 });
    const problems = new Map<number, string>((pre.json.rows as { line: number; problems: string[] }[]).map((r) => [r.line, r.problems.join(' ')]));
    expect(problems.get(2)).toBe('');
    expect(problems.get(3)).toMatch(/unknown girder/i);
    expect(problems.get(4)).toMatch(/point 40 is out of range/i);
    expect(problems.get(5)).toMatch(/duplicate/i);
    expect(problems.get(6)).toMatch(/not a whole number/i);
    expect(problems.get(7)).toMatch(/span 9 is out of range/i);
    expect(problems.get(8)).toMatch(/not a number/i);
    expect(await storedCount(id)).toBe(0);

    const commit = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: BAD_CSV, filename: 'bad.csv' } });
    expect(commit.status).toBe(400);
    expect(Object.keys(commit.json.fields).sort()).toEqual(['line.3', 'line.4', 'line.5', 'line.6', 'line.7', 'line.8']);
    expect(await storedCount(id)).toBe(0);
    expect(await SurveyImport.count({ where: { bridgeId: Number(id) } })).toBe(0);
    // The good row of the bad file did not reach the table either.
    expect(at(await table(id), 'G1', 1, 4).top_of_girder).toBe(at(before, 'G1', 1, 4).top_of_girder);
  });

  it('a good file changes the buildups and readings the way the data contract defines them', async () => {
    const id = await newBridge('Survey good rows');
    const before = await table(id);
    expect(at(before, 'G1', 2, 5).buildup).toBeNull();
    const csv = 'girder,span,point,elevation\nG1,2,5,254.40\nG5,2,5,254.10\nG1,1,10,253.50\n';
    const pre = await call(preview.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { csv } });
    expect(pre.status).toBe(200);
    expect(pre.json.summary).toMatchObject({ rows: 3, good: 3, bad: 0, replacing: 0 });
    expect(await storedCount(id)).toBe(0); // preview writes nothing

    const res = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv, filename: 'span2.csv', revision: pre.json.revision } });
    expect(res.status, res.text).toBe(201);
    expect(res.json).toMatchObject({ stored: 3, replaced: 0 });

    const after = await table(id);
    const demoSettlement = demoBridges[0].deck.form_settlement as number;
    for (const [girder, span, point, tog] of [
      ['G1', 2, 5, 254.4],
      ['G5', 2, 5, 254.1],
      ['G1', 1, 10, 253.5],
    ] as const) {
      const p = at(after, girder, span, point);
      // bridge-format.md, "Definitions the engine computes": buildup = bottom of slab − top of girder;
      // drop from girder top = edge drop − buildup − form settlement.
      expect(p.top_of_girder).toBeCloseTo(tog, 9);
      expect(p.buildup).toBeCloseTo(p.bottom_of_slab - tog, 9);
      expect(p.drop_from_girder_top).toBeCloseTo((p.edge_drop as number) - (p.buildup as number) - demoSettlement, 9);
    }
    // The description's own 253.68 at G1 span 1 point 10 is overridden by the survey.
    expect(at(before, 'G1', 1, 10).top_of_girder).toBeCloseTo(253.68, 9);
    expect(at(after, 'G1', 1, 10).buildup).not.toBeCloseTo(at(before, 'G1', 1, 10).buildup as number, 6);
    // Points not in the file keep what they had.
    expect(at(after, 'G5', 1, 10).top_of_girder).toBeCloseTo(at(before, 'G5', 1, 10).top_of_girder as number, 9);
  });

  // Common practice: spreadsheets in a decimal-comma locale save CSV with semicolons between cells.
  it('a semicolon file with decimal commas is read, says its separator, and stores the values it shows', async () => {
    const id = await newBridge('Survey semicolons');
    const csv = 'Girder;Span;Point;Elevation\r\nG1;2;5;254,40\r\n"G5";2;5;"254,10"\r\n';
    const pre = await call(preview.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { csv } });
    expect(pre.status).toBe(200);
    expect(pre.json).toMatchObject({ delimiter: 'semicolons', decimal_comma: true, summary: { rows: 2, good: 2, bad: 0 } });
    expect(pre.json.rows.map((r: { elevation: number }) => r.elevation)).toEqual([254.4, 254.1]);
    const res = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv, filename: 'metric-locale.csv' } });
    expect(res.status, res.text).toBe(201);
    expect(res.json).toMatchObject({ stored: 2, delimiter: 'semicolons' });
    expect(at(await table(id), 'G5', 2, 5).top_of_girder).toBeCloseTo(254.1, 9);
    const comma = await call(preview.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { csv: 'G1,2,5,254.40' } });
    expect(comma.json).toMatchObject({ delimiter: 'commas', decimal_comma: false });
  });

  it('a new import of the same point replaces the value and keeps the old one as history, with who and when', async () => {
    const id = await newBridge('Survey replace');
    expect((await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: 'G1,3,8,255.00', filename: 'first.csv' } })).status).toBe(201);
    const pre = await call(preview.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { csv: 'G1,3,8,255.04' } });
    expect(pre.json.rows[0].replaces).toBeCloseTo(255.0, 9);
    expect(pre.json.summary.replacing).toBe(1);
    const second = await call(survey.POST, { method: 'POST', cookie: people.engineer.cookie, params: { id }, body: { csv: 'G1,3,8,255.04', filename: 'second.csv' } });
    expect(second.status).toBe(201);
    expect(second.json.replaced).toBe(1);
    expect(at(await table(id), 'G1', 3, 8).top_of_girder).toBeCloseTo(255.04, 9);

    const list = await call(survey.GET, { cookie: people.crew.cookie, params: { id } });
    expect(list.status).toBe(200);
    expect(list.json.values).toHaveLength(1);
    const v = list.json.values[0];
    expect(v.elevation).toBeCloseTo(255.04, 9);
    expect(v.imported_by).toBe('Test engineer');
    expect(v.history).toHaveLength(1);
    expect(v.history[0].elevation).toBeCloseTo(255.0, 9);
    expect(v.history[0].imported_by).toBe('Test inspector');
    expect(list.json.imports.map((i: { filename: string }) => i.filename)).toEqual(['second.csv', 'first.csv']);
    expect(await GirderSurvey.count({ where: { bridgeId: Number(id) } })).toBe(2);
    expect(await AuditEvent.count({ where: { action: 'survey.import', entityId: id } })).toBe(2);
    expect(list.text).not.toMatch(/password/i);
  });

  it('after the span is divided differently, a stored value follows its place on the girder, or drops out between points', async () => {
    const id = await newBridge('Survey and a newer revision');
    const first = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: 'G1,3,20,254.9\nG1,3,10,254.6\nG1,3,3,254.2' } });
    expect(first.status).toBe(201);
    const current = await getBridge(id);
    // Tenth points instead of 20th points: 20th point 20 is tenth point 10 (the span's end), 20th point 10
    // is tenth point 5 (midspan), and 20th point 3 lies between tenth points 1 and 2.
    const rev = await call(revisions.POST, {
      method: 'POST',
      cookie: people.engineer.cookie,
      params: { id },
      body: {
        base_revision: current.revision,
        description: {
          ...current.description,
          points_per_span: 10,
          top_of_girder: (current.description.top_of_girder ?? []).filter((t) => t.point <= 10),
        },
        note: 'tenth points',
      },
    });
    expect(rev.status).toBe(201);
    const rows = await table(id);
    expect(rows.some((p) => p.point > 10)).toBe(false);
    expect(at(rows, 'G1', 3, 10).top_of_girder).toBeCloseTo(254.9, 9);
    expect(at(rows, 'G1', 3, 5).top_of_girder).toBeCloseTo(254.6, 9);
    expect(at(rows, 'G1', 3, 1).top_of_girder).toBeNull();
    expect(at(rows, 'G1', 3, 2).top_of_girder).toBeNull();
    const list = await call(survey.GET, { cookie: people.crew.cookie, params: { id } });
    const now = new Map((list.json.values as { point: number; point_on_current_revision: number | null }[]).map((v) => [v.point, v.point_on_current_revision]));
    expect([now.get(20), now.get(10), now.get(3)]).toEqual([10, 5, null]);

    // A new import at tenth point 5 replaces the value surveyed as 20th point 10: the same place.
    const again = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: 'G1,3,5,254.65' } });
    expect(again.json.replaced).toBe(1);
    expect(at(await table(id), 'G1', 3, 5).top_of_girder).toBeCloseTo(254.65, 9);
    const relisted = await call(survey.GET, { cookie: people.crew.cookie, params: { id } });
    const mid = (relisted.json.values as { point: number; points_per_span: number; history: { elevation: number }[] }[]).find((v) => v.point === 5)!;
    expect(mid.points_per_span).toBe(10);
    expect(mid.history.map((h) => h.elevation)).toEqual([254.6]);
  });

  it('refuses crew, a stale revision and a body without csv, writing nothing', async () => {
    const id = await newBridge('Survey refusals');
    const crew = await call(survey.POST, { method: 'POST', cookie: people.crew.cookie, params: { id }, body: { csv: 'G1,1,1,253' } });
    expect(crew.status).toBe(403);
    const current = await getBridge(id);
    const rev = await call(revisions.POST, {
      method: 'POST',
      cookie: people.engineer.cookie,
      params: { id },
      body: { base_revision: current.revision, description: current.description, note: 'newer' },
    });
    expect(rev.status).toBe(201);
    const stale = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: 'G1,1,1,253', revision: current.revision } });
    expect(stale.status).toBe(409);
    const empty = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { filename: 'x.csv' } });
    expect(empty.status).toBe(400);
    expect(empty.json.fields.csv).toBeTruthy();
    const blank = await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: '\n\n' } });
    expect(blank.status).toBe(400);
    expect(await storedCount(id)).toBe(0);
    const missing = await call(preview.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id: '999999' }, body: { csv: 'G1,1,1,253' } });
    expect(missing.status).toBe(404);
  });

  it('deleting a bridge removes its survey values and imports', async () => {
    const id = await newBridge('Survey then delete');
    expect((await call(survey.POST, { method: 'POST', cookie: people.inspector.cookie, params: { id }, body: { csv: 'G1,1,1,253.0' } })).status).toBe(201);
    expect(await storedCount(id)).toBe(1);
    expect((await call(bridgeRoute.DELETE, { method: 'DELETE', cookie: people.admin.cookie, params: { id } })).status).toBe(200);
    expect(await storedCount(id)).toBe(0);
    expect(await SurveyImport.count({ where: { bridgeId: Number(id) } })).toBe(0);
  });
});
