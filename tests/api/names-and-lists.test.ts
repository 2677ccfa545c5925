/**
 * Names and problem lists (issue 11, follow-up): a description's names (the bridge's, bents', girders'
 * and the girder names that top-of-girder and deflection entries refer to) are shown in lists, sheets,
 * CSV, PDF and DXF, so a control or right-to-left control character in one is refused with a message
 * naming the field; and every answer that lists problems lists at most 20 and counts the rest, not
 * only the compute API's (lib/api/problem-list.ts).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import * as compute from '@/app/api/compute/route';
import * as bridges from '@/app/api/bridges/route';
import * as users from '@/app/api/admin/users/route';
import { demoBridges } from '@/lib/demo/bridges';
import { warmComputePool } from '@/lib/workers/compute-pool';
import { Bridge } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;
const base = demoBridges[0];

beforeAll(async () => {
  people = await makeUsers();
  await warmComputePool();
});

const computeWith = (doc: unknown) => call(compute.POST, { method: 'POST', path: '/api/compute', cookie: people.crew.cookie, body: doc });
const save = (name: string, description: unknown) => call(bridges.POST, { method: 'POST', cookie: people.engineer.cookie, body: { name, description } });

/** The demo bridge with one change made by `edit` on a deep copy. */
function changed(edit: (b: typeof base) => void): typeof base {
  const b = structuredClone(base);
  edit(b);
  return b;
}

describe('control characters in a description’s names are refused, naming the field', () => {
  const cases: [string, (b: typeof base) => void, string, RegExp][] = [
    ['a girder name with BEL', (b) => (b.girders[0].name = 'G1\u0007'), 'girders.0.name', /^Girder name must not contain control characters/],
    ['a girder name with a line break', (b) => (b.girders[4].name = 'G5\nG6'), 'girders.4.name', /^Girder name must not contain control characters/],
    ['a bent name with a right-to-left override', (b) => (b.bents[1].name = 'Bent \u202E2'), 'bents.1.name', /^Bent name must not contain control characters/],
    ['the bridge name with NUL', (b) => (b.name = 'Held\u0000out'), 'name', /^Name must not contain control characters/],
    [
      'a tab in a top-of-girder entry’s girder name',
      (b) => (b.top_of_girder = [{ girder: 'G1\t', span: 1, point: 0, elevation: 250 }]),
      'top_of_girder.0.girder',
      /top-of-girder entry must not contain control/,
    ],
    ['a deflection entry’s girder name with CR', (b) => (b.deflections = [{ girder: 'G1\r', span: 1, values: [0, 0.1, 0] }]), 'deflections.0.girder', /deflection entry must not contain control/],
  ];
  for (const [what, edit, field, message] of cases) {
    it(`${what}: 400 from the compute API`, async () => {
      const res = await computeWith(changed(edit));
      expect(res.status).toBe(400);
      expect(res.json.fields[field]?.[0]).toMatch(message);
    });
  }

  it('on save: 400 naming description.girders.1.name, and nothing is stored', async () => {
    const before = await Bridge.count();
    const res = await save(
      'Held-out control test',
      changed((b) => (b.girders[1].name = 'G2\u001b[31m')),
    );
    expect(res.status).toBe(400);
    expect(res.json.fields['description.girders.1.name']?.[0]).toMatch(/^Girder name must not contain control characters/);
    expect(await Bridge.count()).toBe(before);
  });

  it('ordinary names (accents, dashes, the degree sign, spaces) still compute', async () => {
    const name = 'Poutre 1 — côté gauche 30°';
    const res = await computeWith(
      changed((b) => {
        const old = b.girders[0].name;
        b.girders[0].name = name;
        for (const t of b.top_of_girder ?? []) if (t.girder === old) t.girder = name;
        for (const d of b.deflections ?? []) if (d.girder === old) d.girder = name;
      }),
    );
    expect(res.status).toBe(200);
    expect(res.json.points.some((p: { girder: string }) => p.girder === name)).toBe(true);
  });
});

describe('every list of problems is short: the first 20 and a count', () => {
  it('saving a description with 30 bad girders (400) lists 20 problems and counts 30 or more', async () => {
    const girders = Array.from({ length: 30 }, (_, i) => ({ name: `G${i + 1}`, layout: 'zigzag', offsets: [0, 0, 0, 0] }));
    const res = await save('Held-out list test', { ...base, girders });
    expect(res.status).toBe(400);
    const listed = Object.values(res.json.fields as Record<string, string[]>).flat().length;
    expect(listed).toBe(20);
    expect(res.json.problem_count).toBeGreaterThanOrEqual(30);
    expect(res.json.error).toMatch(/\(first 20 of \d+ problems listed\)$/);
  });

  it('a short list is given whole, with its count', async () => {
    const res = await call(users.POST, { method: 'POST', cookie: people.admin.cookie, body: { email: 'not-an-address', name: '', role: 'emperor', password: 'x' } });
    expect(res.status).toBe(400);
    const listed = Object.values(res.json.fields as Record<string, string[]>).flat().length;
    expect(listed).toBeGreaterThanOrEqual(3);
    expect(res.json.problem_count).toBe(listed);
    expect(res.json.error).not.toMatch(/problems listed/);
  });
});
