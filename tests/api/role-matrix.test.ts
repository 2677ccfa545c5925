import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { demoBridges } from '@/lib/demo/bridges';
import * as health from '@/app/api/health/route';
import * as compute from '@/app/api/compute/route';
import * as bridges from '@/app/api/bridges/route';
import * as bridge from '@/app/api/bridges/[id]/route';
import * as revisions from '@/app/api/bridges/[id]/revisions/route';
import * as offsets from '@/app/api/bridges/[id]/offsets/route';
import * as offsetsCsv from '@/app/api/bridges/[id]/offsets.csv/route';
import * as users from '@/app/api/admin/users/route';
import { createUser } from '@/lib/services/users';
import * as user from '@/app/api/admin/users/[id]/route';
import { createBridge, getBridge } from '@/lib/services/bridges';
import { call, cookieOf, EVERYONE, makeUsers, type TestUser, type Who } from './helpers';
import type { Role } from '@/lib/auth/roles';
// Field work (issue 6).
import * as fieldChecks from '@/app/api/bridges/[id]/checks/route';
import * as fieldAttachments from '@/app/api/bridges/[id]/attachments/route';
import * as fieldAttachment from '@/app/api/attachments/[id]/route';
import * as fieldSendSheet from '@/app/api/bridges/[id]/send-sheet/route';
import * as fieldSheetCsv from '@/app/api/bridges/[id]/field-sheet.csv/route';
// Exports: PDF sheets, DXF plan, LandXML out (issue 15).
import * as exportOffsetsPdf from '@/app/api/bridges/[id]/offsets.pdf/route';
import * as exportSheetPdf from '@/app/api/bridges/[id]/field-sheet.pdf/route';
import * as exportPlanDxf from '@/app/api/bridges/[id]/plan.dxf/route';
import * as exportAlignmentXml from '@/app/api/bridges/[id]/alignment.xml/route';
import * as fieldSignoffs from '@/app/api/bridges/[id]/signoffs/route';
import * as fieldTolerances from '@/app/api/bridges/[id]/tolerances/route';
import * as fieldAudit from '@/app/api/bridges/[id]/audit/route';
import * as fieldOutbox from '@/app/api/admin/outbox/route';
import { callRaw as fieldCallRaw, multipartRequest as fieldMultipart, PNG_1X1 as FIELD_PNG } from './field-helpers';
import * as surveyRoute from '@/app/api/bridges/[id]/survey/route';
import * as surveyPreview from '@/app/api/bridges/[id]/survey/preview/route';
// Geometry editor and LandXML import (issue 4, part A).
import * as landxmlImport from '@/app/api/import/landxml/route';
import * as revisionOne from '@/app/api/bridges/[id]/revisions/[revision]/route';
// Invites and password resets by e-mail (issue 14).
import * as inviteRoute from '@/app/api/admin/users/invite/route';
import * as inviteOne from '@/app/api/admin/users/[id]/invite/route';
import * as resetLinkRoute from '@/app/api/admin/users/[id]/reset-link/route';
import * as passwordReset from '@/app/api/password-reset/route';
import * as passwordLinks from '@/app/api/password-links/route';
import { inviteUser } from '@/lib/services/invites';
import { issueToken } from '@/lib/auth/one-time-token';
import { db } from '@/lib/db/connection';

type Expect = Record<Who, number>;
const row = (anonymous: number, crew: number, inspector: number, engineer: number, admin: number): Expect => ({
  anonymous,
  crew,
  inspector,
  engineer,
  admin,
});
const READ = row(401, 200, 200, 200, 200);

let people: Record<Role, TestUser>;
let fresh = 0;

/** A new stored bridge so destructive calls never depend on each other. */
async function newBridge(): Promise<string> {
  const { id } = await createBridge({ id: people.engineer.id, email: '', name: '', role: 'engineer' }, { name: `Matrix ${++fresh}`, description: demoBridges[0] });
  return String(id);
}

type Case = {
  handler: unknown;
  expect: Expect;
  setup?: () => Promise<{ params?: Record<string, string>; body?: unknown }>;
};

// Every route handler of app/api must have an entry here; the last test enforces it.
const matrix: Record<string, Case> = {
  'GET /api/health': { handler: health.GET, expect: row(200, 200, 200, 200, 200) },
  'POST /api/compute': { handler: compute.POST, expect: READ, setup: async () => ({ body: demoBridges[0] }) },
  'GET /api/bridges': { handler: bridges.GET, expect: READ },
  'POST /api/bridges': {
    handler: bridges.POST,
    expect: row(401, 403, 403, 201, 201),
    setup: async () => ({ body: { name: 'Role matrix bridge', description: demoBridges[1] } }),
  },
  'GET /api/bridges/[id]': { handler: bridge.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'PATCH /api/bridges/[id]': {
    handler: bridge.PATCH,
    expect: row(401, 403, 403, 200, 200),
    setup: async () => ({ params: { id: await newBridge() }, body: { name: 'Renamed' } }),
  },
  'DELETE /api/bridges/[id]': {
    handler: bridge.DELETE,
    expect: row(401, 403, 403, 403, 200),
    setup: async () => ({ params: { id: await newBridge() } }),
  },
  'GET /api/bridges/[id]/revisions': { handler: revisions.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'POST /api/bridges/[id]/revisions': {
    handler: revisions.POST,
    expect: row(401, 403, 403, 201, 201),
    setup: async () => {
      const id = await newBridge();
      const current = await getBridge(id);
      return { params: { id }, body: { base_revision: current.revision, description: current.description, note: 'matrix' } };
    },
  },
  'GET /api/bridges/[id]/offsets': { handler: offsets.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/offsets.csv': { handler: offsetsCsv.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/admin/users': { handler: users.GET, expect: row(401, 403, 403, 403, 200) },
  'POST /api/admin/users': {
    handler: users.POST,
    expect: row(401, 403, 403, 403, 201),
    setup: async () => ({ body: { email: `new-${++fresh}@test.invalid`, name: 'New person', role: 'crew', password: 'long-enough-password' } }),
  },
  'PATCH /api/admin/users/[id]': {
    handler: user.PATCH,
    expect: row(401, 403, 403, 403, 200),
    setup: async () => ({ params: { id: String(people.crew.id) }, body: { name: 'Cal Renamed' } }),
  },
  'DELETE /api/admin/users/[id]': {
    handler: user.DELETE,
    expect: row(401, 403, 403, 403, 200),
    setup: async () => ({
      params: { id: String((await createUser(null, { email: `gone-${++fresh}@test.invalid`, name: 'Leaving', role: 'crew', password: 'long-enough-password' })).id) },
    }),
  },
  // Top-of-girder survey (issue 4, part B): engineer and inspector import; everyone signed in reads.
  'GET /api/bridges/[id]/survey': { handler: surveyRoute.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'POST /api/bridges/[id]/survey': {
    handler: surveyRoute.POST,
    expect: row(401, 403, 201, 201, 201),
    setup: async () => ({ params: { id: await newBridge() }, body: { csv: 'girder,span,point,elevation\nG1,1,1,253.00\n' } }),
  },
  'POST /api/bridges/[id]/survey/preview': {
    handler: surveyPreview.POST,
    expect: row(401, 403, 200, 200, 200),
    setup: async () => ({ params: { id: await newBridge() }, body: { csv: 'G1,1,1,253.00' } }),
  },
  // Field work (issue 6): inspectors record, crew reads; the upload goes as real multipart.
  'GET /api/bridges/[id]/checks': { handler: fieldChecks.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'POST /api/bridges/[id]/checks': {
    handler: fieldChecks.POST,
    expect: row(401, 403, 201, 403, 201),
    setup: async () => ({ params: { id: await newBridge() }, body: { span: 1, girder: 'G1', point: 3, measured_edge_width: 4.5 } }),
  },
  'GET /api/bridges/[id]/attachments': { handler: fieldAttachments.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'POST /api/bridges/[id]/attachments': {
    handler: async (req: Request, ctx: { params: Promise<Record<string, string>> }) =>
      fieldAttachments.POST(await fieldMultipart(req.url, req.headers.get('cookie') ?? undefined, { bytes: FIELD_PNG, name: 'matrix.png', type: 'image/png' }), ctx as never),
    expect: row(401, 403, 201, 403, 201),
    setup: async () => ({ params: { id: await newBridge() } }),
  },
  'GET /api/attachments/[id]': {
    handler: fieldAttachment.GET,
    expect: READ,
    setup: async () => {
      const id = await newBridge();
      const req = await fieldMultipart(`/api/bridges/${id}/attachments`, people.inspector.cookie, { bytes: FIELD_PNG, name: 'matrix.png', type: 'image/png' });
      const res = await fieldCallRaw(fieldAttachments.POST, req, { id });
      return { params: { id: String(res.json.id) } };
    },
  },
  'POST /api/bridges/[id]/send-sheet': {
    handler: fieldSendSheet.POST,
    expect: row(401, 403, 202, 403, 202),
    setup: async () => ({ params: { id: await newBridge() }, body: { to: ['matrix@example.com'], span: 1 } }),
  },
  'GET /api/bridges/[id]/field-sheet.csv': { handler: fieldSheetCsv.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/offsets.pdf': { handler: exportOffsetsPdf.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/field-sheet.pdf': { handler: exportSheetPdf.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/plan.dxf': { handler: exportPlanDxf.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/alignment.xml': { handler: exportAlignmentXml.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/bridges/[id]/signoffs': { handler: fieldSignoffs.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  // Nothing checked yet on a new bridge: the role passes and the sign-off is refused as incomplete.
  'POST /api/bridges/[id]/signoffs': {
    handler: fieldSignoffs.POST,
    expect: row(401, 403, 409, 403, 409),
    setup: async () => ({ params: { id: await newBridge() }, body: { span: 1 } }),
  },
  'GET /api/bridges/[id]/tolerances': { handler: fieldTolerances.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'PATCH /api/bridges/[id]/tolerances': {
    handler: fieldTolerances.PATCH,
    expect: row(401, 403, 403, 200, 200),
    setup: async () => ({ params: { id: await newBridge() }, body: { width_tolerance: 0.02 } }),
  },
  'GET /api/bridges/[id]/audit': { handler: fieldAudit.GET, expect: READ, setup: async () => ({ params: { id: await newBridge() } }) },
  'GET /api/admin/outbox': { handler: fieldOutbox.GET, expect: row(401, 403, 403, 403, 200) },
  // The import takes a multipart upload: the session cookie is carried onto a real LandXML upload.
  'POST /api/import/landxml': {
    handler: async (req: { url: string; headers: Headers }, ctx: unknown) =>
      landxmlImport.POST(
        await fieldMultipart(req.url, req.headers.get('cookie') ?? undefined, {
          bytes: fs.readFileSync(path.resolve(__dirname, '../fixtures/landxml/creek-road-ft.xml')),
          name: 'creek-road-ft.xml',
          type: 'application/xml',
        }),
        ctx as never,
      ),
    expect: row(401, 403, 403, 200, 200),
  },
  'GET /api/bridges/[id]/revisions/[revision]': { handler: revisionOne.GET, expect: READ, setup: async () => ({ params: { id: await newBridge(), revision: '1' } }) },
  // Invites and password resets by e-mail (issue 14): administrators invite; anyone may ask for a reset link or use a link.
  'POST /api/admin/users/invite': {
    handler: inviteRoute.POST,
    expect: row(401, 403, 403, 403, 201),
    setup: async () => ({ body: { email: `invited-${++fresh}@test.invalid`, name: 'Invited person', role: 'crew' } }),
  },
  'POST /api/admin/users/[id]/invite': { handler: inviteOne.POST, expect: row(401, 403, 403, 403, 200), setup: async () => ({ params: { id: await pendingInvite() } }) },
  'DELETE /api/admin/users/[id]/invite': { handler: inviteOne.DELETE, expect: row(401, 403, 403, 403, 200), setup: async () => ({ params: { id: await pendingInvite() } }) },
  'POST /api/admin/users/[id]/reset-link': {
    handler: resetLinkRoute.POST,
    expect: row(401, 403, 403, 403, 202),
    setup: async () => ({ params: { id: String((await createUser(null, { email: `reset-${++fresh}@test.invalid`, name: 'Resetting', role: 'crew', password: 'long-enough-password' })).id) } }),
  },
  'POST /api/password-reset': { handler: passwordReset.POST, expect: row(202, 202, 202, 202, 202), setup: async () => ({ body: { email: `asks-${++fresh}@test.invalid` } }) },
  'POST /api/password-links': {
    handler: passwordLinks.POST,
    expect: row(200, 200, 200, 200, 200),
    setup: async () => {
      const u = await createUser(null, { email: `link-${++fresh}@test.invalid`, name: 'Link user', role: 'crew', password: 'long-enough-password' });
      const { token } = await (await db()).transaction((transaction) => issueToken(u.id, 'reset', transaction));
      return { body: { purpose: 'reset', token, password: 'chosen-from-link-1' } };
    },
  },
};

/** A pending invite's user id (the mail goes to the local outbox). */
async function pendingInvite(): Promise<string> {
  const answer = await inviteUser({ id: people.admin.id, email: people.admin.email, name: 'Matrix admin', role: 'admin' }, { email: `pending-${++fresh}@test.invalid`, name: 'Pending', role: 'crew' });
  return String(answer.user.id);
}

beforeAll(async () => {
  people = await makeUsers();
});

describe('role matrix: every route × every role', () => {
  for (const [route, c] of Object.entries(matrix)) {
    for (const who of EVERYONE) {
      it(`${route} as ${who} → ${c.expect[who]}`, async () => {
        const { params, body } = (await c.setup?.()) ?? {};
        const [method] = route.split(' ');
        const res = await call(c.handler, { method, cookie: cookieOf(people, who), params, body });
        expect(res.status, res.text.slice(0, 300)).toBe(c.expect[who]);
        expect(res.text).not.toMatch(/password_?hash|\$2[aby]\$/i);
        expect(res.text).not.toMatch(/\n\s+at .+\(.+:\d+:\d+\)/);
      });
    }
  }
});

/** Finds every exported HTTP method of every route handler file under app/api. */
function discoverRoutes(): string[] {
  const root = path.resolve(__dirname, '../../app/api');
  const found: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === 'route.ts') {
        const rel = '/api/' + path.relative(root, dir).split(path.sep).join('/');
        const src = fs.readFileSync(full, 'utf8');
        for (const m of ['GET', 'POST', 'PATCH', 'PUT', 'DELETE']) {
          if (new RegExp(`export (const|async function|function) ${m}\\b|export \\{[^}]*\\bas ${m}\\b`).test(src)) found.push(`${m} ${rel}`);
        }
      }
    }
  };
  walk(root);
  return found;
}

describe('coverage of the matrix', () => {
  it('lists every route handler in app/api (next-auth excepted)', () => {
    const missing = discoverRoutes().filter((r) => !r.includes('/api/auth/') && !(r in matrix));
    expect(missing).toEqual([]);
  });
});
