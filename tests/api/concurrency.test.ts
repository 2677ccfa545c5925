import { beforeAll, describe, expect, it } from 'vitest';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as checks from '@/app/api/bridges/[id]/checks/route';
import { demoBridges } from '@/lib/demo/bridges';
import { AuditEvent, FieldCheck, GeometryRevision } from '@/models';
import { call, makeUsers, type TestUser } from './helpers';
import { demoBridge, engineRow } from './field-helpers';
import type { Role } from '@/lib/auth/roles';

let people: Record<Role, TestUser>;

beforeAll(async () => {
  people = await makeUsers();
});

describe('no lost updates under concurrent writes', () => {
  it('a dozen saves on one base: exactly one wins, eleven get 409, one revision is written', async () => {
    const id = await demoBridge(people.engineer);
    const results = await Promise.all(
      Array.from({ length: 12 }, (_, i) =>
        call(revisions.POST, {
          method: 'POST',
          cookie: (i % 2 ? people.admin : people.engineer).cookie,
          params: { id },
          body: { base_revision: 1, description: demoBridges[0], note: `parallel save ${i}` },
        }),
      ),
    );
    const statuses = results.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 409)).toHaveLength(11);
    expect(await GeometryRevision.count({ where: { bridgeId: Number(id) } })).toBe(2);
    expect(await AuditEvent.count({ where: { action: 'revision.create', entityId: id } })).toBe(1);
  });

  it('a dozen checks at once: every one is recorded, none lost or doubled', async () => {
    const id = await demoBridge(people.engineer);
    const before = await FieldCheck.count({ where: { bridgeId: Number(id) } });
    const results = await Promise.all(
      Array.from({ length: 12 }, (_, k) =>
        call(checks.POST, {
          method: 'POST',
          cookie: people.inspector.cookie,
          params: { id },
          body: { span: 2, girder: 'G1', point: k, measured_edge_width: (engineRow(2, 'G1', k).edge_width as number) + 0.002 },
        }),
      ),
    );
    expect(results.map((r) => r.status)).toEqual(Array(12).fill(201));
    expect(await FieldCheck.count({ where: { bridgeId: Number(id) } })).toBe(before + 12);
    const points = results.map((r) => r.json.point).sort((a: number, b: number) => a - b);
    expect(points).toEqual(Array.from({ length: 12 }, (_, k) => k));
  });
});
