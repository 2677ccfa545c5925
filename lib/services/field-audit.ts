import { AuditEvent, User } from '@/models';
import { roleAllows, type Role } from '@/lib/auth/roles';
import { requireBridge } from './require-bridge';

export type AuditJson = { id: number; action: string; label: string; by: string | null; detail: Record<string, unknown>; created_at: string };

/** Plain words for the actions a bridge's log holds. */
export const ACTION_LABELS: Record<string, string> = {
  'bridge.create': 'Bridge created',
  'bridge.rename': 'Bridge renamed',
  'revision.create': 'Geometry revision saved',
  'check.create': 'Check recorded',
  'attachment.create': 'Photo or file attached',
  'sheet.send': 'Field sheet e-mailed',
  'signoff.create': 'Span signed off',
  'tolerances.update': 'Tolerances changed',
};

/** Only these detail keys leave the server (audit detail is written by our services; still whitelisted). */
const DETAIL_KEYS = [
  'name',
  'from',
  'to',
  'revision',
  'check',
  'span',
  'girder',
  'point',
  'pass',
  'supersedes',
  'attachment',
  'content_type',
  'size',
  'via',
  'outbox',
  'signoff',
  'before',
  'after',
  'demo',
];

/** The audit log of one bridge, newest first (at most `limit` events). */
export async function bridgeAudit(bridgeId: string, limit = 300, viewerRole: Role = 'crew'): Promise<AuditJson[]> {
  // Who a sheet was e-mailed to is for the people who send sheets, not for every reader.
  const seesRecipients = roleAllows(viewerRole, ['inspector', 'engineer']);
  const bridge = await requireBridge(bridgeId);
  const rows = await AuditEvent.findAll({
    where: { entityType: 'bridge', entityId: String(bridge.id) },
    include: [{ model: User, as: 'user', attributes: ['name'] }],
    order: [['id', 'DESC']],
    limit,
  });
  return rows.map((e) => {
    let raw: Record<string, unknown> = {};
    try {
      const v = e.detail ? JSON.parse(e.detail) : {};
      if (v && typeof v === 'object' && !Array.isArray(v)) raw = v as Record<string, unknown>;
    } catch {}
    const detail: Record<string, unknown> = {};
    for (const k of DETAIL_KEYS) if (k in raw) detail[k] = raw[k];
    if (e.action === 'sheet.send' && !seesRecipients && Array.isArray(detail.to)) detail.to = `${detail.to.length} recipient${detail.to.length === 1 ? '' : 's'}`;
    return {
      id: e.id,
      action: e.action,
      label: ACTION_LABELS[e.action] ?? e.action,
      by: (e as AuditEvent & { user?: User | null }).user?.name ?? null,
      detail,
      created_at: e.createdAt.toISOString(),
    };
  });
}
