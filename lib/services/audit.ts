import { AuditEvent } from '@/models';
import type { Transaction } from 'sequelize';

/** Appends an audit event. `detail` must never hold a password or a hash. */
export async function audit(userId: number | null, action: string, entityType: string, entityId: number | string | null, detail?: Record<string, unknown>, transaction?: Transaction): Promise<void> {
  await AuditEvent.create({ userId, action, entityType, entityId: entityId === null ? null : String(entityId), detail: detail ? JSON.stringify(detail) : null }, { transaction });
}
