import type { Transaction } from 'sequelize';
import { Jimp } from 'jimp';
import { computeOffsetTable, type BridgeDescription, type OffsetPoint } from '@/lib/geometry';
import { saveUpload } from '@/lib/uploads/store';
import { writeStatus } from '@/lib/services/bridge-status';
import { FIELD_DEFAULTS } from '@/lib/services/tolerances';
import { Attachment, AuditEvent, Bridge, FieldCheck, SignOff } from '@/models';

/** Invented record fields for the demo bridges, by position (a bridge past the list keeps an empty record). */
export const DEMO_RECORDS = [
  { structureNumber: 'DM-0417', route: 'County Road 9', featureCrossed: 'Marlow Creek', district: 'Valley District', contractor: 'Example Formworks Co.', stage: 'forming' },
  { structureNumber: 'DM-0522', route: 'Route 31', featureCrossed: 'Dry wash', district: 'Valley District', contractor: 'Sample Bridge Builders', stage: 'forming' },
  { structureNumber: 'DM-0608', route: 'Ridge Road', featureCrossed: 'Rail spur', district: 'Hill District', contractor: '', stage: 'design' },
];

const HOUR = 3600 * 1000;

/**
 * A small invented field photo (JPEG, 320 × 240): concrete-grey deck, a plywood form edge and a tape
 * line, drawn pixel by pixel so nothing is read from disk.
 */
export async function demoPhoto(): Promise<Buffer> {
  const image = new Jimp({ width: 320, height: 240, color: 0xb9b4a8ff });
  for (let y = 0; y < 240; y++) {
    for (let x = 0; x < 320; x++) {
      const formEdge = y > 150 && y < 190 - x / 16;
      const tape = Math.abs(y - (120 - x / 10)) < 2;
      const shade = ((x * 7 + y * 13) % 17) * 2;
      const colour = tape ? 0xe0b020ff : formEdge ? 0xc49a6cff - shade * 0x1010100 : 0xb9b4a8ff - shade * 0x1010100;
      image.setPixelColor(colour >>> 0, x, y);
    }
  }
  return image.getBuffer('image/jpeg', { quality: 70 });
}

type Ctx = { transaction: Transaction; inspectorId: number; now: number };

/** A made-up reading a few thousandths off the target (deterministic; always within the default tolerance). */
function nearby(target: number, i: number): number {
  return target + (((i * 37) % 9) - 4) * 0.001;
}

async function addChecks(bridge: Bridge, rows: OffsetPoint[], ctx: Ctx, startHoursAgo: number, failAt?: OffsetPoint): Promise<FieldCheck[]> {
  const tol = FIELD_DEFAULTS[bridge.units === 'm' ? 'm' : 'ft'];
  const made: FieldCheck[] = [];
  for (const [i, row] of rows.entries()) {
    const failing = row === failAt;
    // The failing bracket is 0.06 ft (about 3/4 in) too wide: out of the ±1/4 in edge-width tolerance.
    const width = failing ? row.edge_width! + 0.06 : nearby(row.edge_width!, i);
    const reading = row.drop_from_girder_top !== null && !failing ? nearby(row.drop_from_girder_top, i + 3) : null;
    const widthPass = Math.abs(width - row.edge_width!) <= tol.width;
    const readingPass = reading === null ? null : Math.abs(reading - row.drop_from_girder_top!) <= tol.reading;
    const created = await FieldCheck.create(
      {
        bridgeId: bridge.id,
        revision: bridge.currentRevision,
        span: row.span,
        girder: row.girder,
        point: row.point,
        side: row.side,
        station: row.station,
        measuredEdgeWidth: width,
        computedEdgeWidth: row.edge_width,
        widthDeviation: width - row.edge_width!,
        widthTolerance: tol.width,
        widthPass,
        measuredReading: reading,
        computedReading: reading === null ? null : row.drop_from_girder_top,
        readingDeviation: reading === null ? null : reading - row.drop_from_girder_top!,
        readingTolerance: tol.reading,
        readingPass,
        pass: widthPass && readingPass !== false,
        note: failing ? 'Form edge out past the mark; crew to pull it in before the pour.' : '',
        supersedesId: null,
        userId: ctx.inspectorId,
        createdAt: new Date(ctx.now - (startHoursAgo - i * 0.1) * HOUR),
      },
      { transaction: ctx.transaction },
    );
    made.push(created);
  }
  await AuditEvent.bulkCreate(
    made.map((c) => ({
      userId: ctx.inspectorId,
      action: 'check.create',
      entityType: 'bridge',
      entityId: String(bridge.id),
      detail: JSON.stringify({ check: c.id, span: c.span, girder: c.girder, point: c.point, revision: c.revision, pass: c.pass, supersedes: null, demo: true }),
      createdAt: c.createdAt,
    })),
    { transaction: ctx.transaction },
  );
  return made;
}

/**
 * Invented field history for the freshly seeded demo bridges, so a new user sees every state: the first
 * bridge has span 1 checked in tolerance and signed off, and in span 2 a few passing brackets and one out
 * of tolerance with a photo; the second has part of span 1 checked and passing. Runs inside the seed's
 * transaction; the photo file is written to the uploads folder first.
 */
export async function seedDemoHistory(bridges: { bridge: Bridge; description: BridgeDescription }[], inspectorId: number, transaction: Transaction): Promise<void> {
  const ctx: Ctx = { transaction, inspectorId, now: Date.now() };
  for (const [i, { bridge }] of bridges.entries()) {
    const record = DEMO_RECORDS[i];
    if (record) await bridge.update(record, { transaction });
  }
  const [first, second] = bridges;
  if (first) {
    const table = computeOffsetTable(first.description);
    const brackets = table.points.filter((p) => p.side !== 'interior' && p.edge_width !== null);
    const span1 = brackets.filter((p) => p.span === 1);
    await addChecks(first.bridge, span1, ctx, 52);
    const signedAt = new Date(ctx.now - 44 * HOUR);
    const signoff = await SignOff.create(
      { bridgeId: first.bridge.id, span: 1, revision: first.bridge.currentRevision, userId: inspectorId, note: 'Span 1 overhang forms checked at every bracket.', createdAt: signedAt },
      { transaction },
    );
    await AuditEvent.create(
      {
        userId: inspectorId,
        action: 'signoff.create',
        entityType: 'bridge',
        entityId: String(first.bridge.id),
        detail: JSON.stringify({ signoff: signoff.id, span: 1, revision: signoff.revision, demo: true }),
        createdAt: signedAt,
      },
      { transaction },
    );
    const span2 = brackets.filter((p) => p.span === 2).slice(0, 6);
    const failAt = span2[span2.length - 1];
    const checks = await addChecks(first.bridge, span2, ctx, 6, failAt);
    const failed = checks[checks.length - 1];
    const bytes = await demoPhoto();
    const storedName = await saveUpload(bytes, 'jpg');
    const photo = await Attachment.create(
      {
        bridgeId: first.bridge.id,
        checkId: failed.id,
        userId: inspectorId,
        storedName,
        originalName: 'form-edge-span2.jpg',
        contentType: 'image/jpeg',
        size: bytes.byteLength,
        caption: 'Form edge past the chalk mark',
        createdAt: new Date(failed.createdAt.getTime() + 60_000),
      },
      { transaction },
    );
    await AuditEvent.create(
      {
        userId: inspectorId,
        action: 'attachment.create',
        entityType: 'bridge',
        entityId: String(first.bridge.id),
        detail: JSON.stringify({ attachment: photo.id, check: failed.id, name: photo.originalName, content_type: photo.contentType, size: photo.size, demo: true }),
        createdAt: photo.createdAt,
      },
      { transaction },
    );
    await writeStatus(first.bridge, table, transaction);
    await Bridge.update({ lastFieldAt: photo.createdAt, activityAt: photo.createdAt }, { where: { id: first.bridge.id }, transaction });
  }
  if (second) {
    const table = computeOffsetTable(second.description);
    const span1 = table.points.filter((p) => p.side !== 'interior' && p.edge_width !== null && p.span === 1).slice(0, 8);
    const checks = await addChecks(second.bridge, span1, ctx, 30);
    await writeStatus(second.bridge, table, transaction);
    const last = checks[checks.length - 1].createdAt;
    await Bridge.update({ lastFieldAt: last, activityAt: last }, { where: { id: second.bridge.id }, transaction });
  }
  for (const { bridge, description } of bridges.slice(2)) {
    await writeStatus(bridge, computeOffsetTable(description), transaction);
  }
}
