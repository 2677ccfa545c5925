/**
 * Bulk filling of a throwaway database for the data benchmark (tests/bench/data.ts): bridges with
 * three revisions each, their records and status counters, field checks, photo records and the audit
 * events those writes leave, inserted many rows per statement inside transactions.
 */
import crypto from 'node:crypto';
import type { Sequelize, Transaction } from 'sequelize';
import { demoBridges } from '../../lib/demo/bridges';
import { computeOffsetTable, type BridgeDescription, type OffsetPoint } from '../../lib/geometry';
import { statusCounts } from '../../lib/services/bridge-status';
import { searchTextOf } from '../../models/Bridge';

export const CHECKS_PER_BRIDGE = 20;
export const PHOTOS_PER_BRIDGE = 2;
const CHUNK = 400;
const DISTRICTS = ['North Valley', 'South Valley', 'Upper Ridge', 'Lower Ridge', 'Coast', 'Plains', 'Lakes', 'Hill Country', 'River Bend', 'High Desert', 'Pine Flats', 'Canyon'];
const STAGES = ['design', 'forming', 'checked', 'poured'];

type Template = { description: BridgeDescription; json: string; brackets: OffsetPoint[]; table: ReturnType<typeof computeOffsetTable> };

const templates: Template[] = demoBridges.map((d) => {
  const table = computeOffsetTable(d);
  return { description: d, json: JSON.stringify(d), brackets: table.points.filter((p) => p.side !== 'interior' && p.edge_width !== null), table };
});

async function insert(sequelize: Sequelize, table: string, rows: Record<string, unknown>[], transaction: Transaction): Promise<void> {
  const qi = sequelize.getQueryInterface();
  for (let i = 0; i < rows.length; i += CHUNK) await qi.bulkInsert(table, rows.slice(i, i + CHUNK), { transaction });
}

/** Rows of one bridge's field work: checks at the first brackets (every 10th bridge has one out of tolerance), photos, audit events. */
function fieldRows(bridgeId: number, t: Template, userId: number, at: Date, firstCheckId: number, firstPhotoId: number) {
  const checks: Record<string, unknown>[] = [];
  for (let k = 0; k < CHECKS_PER_BRIDGE; k++) {
    const p = t.brackets[k % t.brackets.length];
    const failing = bridgeId % 10 === 0 && k === CHECKS_PER_BRIDGE - 1;
    const measured = p.edge_width! + (failing ? 0.06 : 0.002);
    checks.push({
      id: firstCheckId + k,
      bridge_id: bridgeId,
      revision: 3,
      span: p.span,
      girder: p.girder,
      point: p.point,
      side: p.side,
      station: p.station,
      measured_edge_width: measured,
      computed_edge_width: p.edge_width,
      width_deviation: measured - p.edge_width!,
      width_tolerance: 0.25 / 12,
      width_pass: !failing,
      measured_drop_from_girder_top: null,
      computed_drop_from_girder_top: null,
      reading_deviation: null,
      reading_tolerance: 0.01,
      reading_pass: null,
      pass: !failing,
      note: '',
      supersedes_id: null,
      user_id: userId,
      created_at: new Date(at.getTime() + k * 60_000),
      client_key: null,
    });
  }
  const photos = Array.from({ length: PHOTOS_PER_BRIDGE }, (_, k) => ({
    id: firstPhotoId + k,
    bridge_id: bridgeId,
    check_id: firstCheckId + CHECKS_PER_BRIDGE - 1 - k,
    user_id: userId,
    stored_name: `${crypto.randomBytes(16).toString('hex')}.jpg`,
    original_name: `bracket-${k + 1}.jpg`,
    content_type: 'image/jpeg',
    size: 180_000,
    caption: '',
    created_at: new Date(at.getTime() + (CHECKS_PER_BRIDGE + k) * 60_000),
  }));
  const events = [
    ...checks.map((c) => ({ action: 'check.create', detail: JSON.stringify({ check: c.id, span: c.span, girder: c.girder, point: c.point, revision: 3, pass: c.pass }), created_at: c.created_at })),
    ...photos.map((a) => ({ action: 'attachment.create', detail: JSON.stringify({ attachment: a.id, check: a.check_id, content_type: 'image/jpeg', size: a.size }), created_at: a.created_at })),
  ].map((e) => ({ user_id: userId, entity_type: 'bridge', entity_id: String(bridgeId), ...e }));
  return { checks, photos, events };
}

/**
 * Adds bridges `from`..`to` (ids, inclusive) with three revisions each, their field work and audit
 * events, and their status counters worked out by the same function the app uses.
 */
export async function fillBridges(sequelize: Sequelize, from: number, to: number, userId: number): Promise<void> {
  const base = Date.UTC(2026, 0, 1);
  const BATCH = 250;
  for (let start = from; start <= to; start += BATCH) {
    const end = Math.min(to, start + BATCH - 1);
    const bridges: Record<string, unknown>[] = [];
    const revisions: Record<string, unknown>[] = [];
    const checks: Record<string, unknown>[] = [];
    const photos: Record<string, unknown>[] = [];
    const events: Record<string, unknown>[] = [];
    for (let id = start; id <= end; id++) {
      const t = templates[id % templates.length];
      const at = new Date(base + id * 3_600_000);
      const field = fieldRows(id, t, userId, at, (id - 1) * CHECKS_PER_BRIDGE + 1, (id - 1) * PHOTOS_PER_BRIDGE + 1);
      const counts = statusCounts(
        t.table,
        field.checks.map((c) => ({
          id: c.id as number,
          span: c.span as number,
          girder: c.girder as string,
          point: c.point as number,
          revision: 3,
          measuredEdgeWidth: c.measured_edge_width as number,
          widthPass: c.width_pass as boolean,
          measuredReading: null,
          readingPass: null,
        })),
        [],
        3,
      );
      const last = field.photos[field.photos.length - 1].created_at as Date;
      bridges.push({
        id,
        name: `Bench bridge ${String(id).padStart(5, '0')} ${t.description.name}`,
        units: t.description.units,
        current_revision: 3,
        search_text: searchTextOf(`Bench bridge ${String(id).padStart(5, '0')} ${t.description.name}`, `BN-${String(id).padStart(5, '0')}`, `Route ${(id % 97) + 1}`),
        created_at: at,
        updated_at: at,
        structure_number: `BN-${String(id).padStart(5, '0')}`,
        route: `Route ${(id % 97) + 1}`,
        feature_crossed: `Creek ${id % 31}`,
        district: DISTRICTS[id % DISTRICTS.length],
        contractor: `Contractor ${id % 40}`,
        stage: STAGES[id % STAGES.length],
        brackets_total: counts.bracketsTotal,
        brackets_passing: counts.bracketsPassing,
        open_failures: counts.openFailures,
        spans_total: counts.spansTotal,
        spans_signed_off: counts.spansSignedOff,
        spans_awaiting_signoff: counts.spansAwaitingSignoff,
        last_field_at: last,
        activity_at: last,
      });
      for (let r = 1; r <= 3; r++) {
        revisions.push({ bridge_id: id, revision: r, description: t.json, author_id: userId, note: `Revision ${r}`, created_at: new Date(at.getTime() + r * 1000) });
        events.push({
          user_id: userId,
          action: r === 1 ? 'bridge.create' : 'revision.create',
          entity_type: 'bridge',
          entity_id: String(id),
          detail: JSON.stringify({ revision: r }),
          created_at: new Date(at.getTime() + r * 1000),
        });
      }
      checks.push(...field.checks);
      photos.push(...field.photos);
      events.push(...field.events);
    }
    await sequelize.transaction(async (transaction) => {
      await insert(sequelize, 'bridges', bridges, transaction);
      await insert(sequelize, 'geometry_revisions', revisions, transaction);
      await insert(sequelize, 'field_checks', checks, transaction);
      await insert(sequelize, 'attachments', photos, transaction);
      await insert(sequelize, 'audit_events', events, transaction);
    });
  }
}
