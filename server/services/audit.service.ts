import type { Transaction } from 'sequelize';
import { AuditEvent, type AuditEventType } from '@/server/models/audit-event.model';

export async function recordAudit(
  event: { type: AuditEventType; organisationId: number | null; userId: number | null; actorId?: number | null; detail?: Record<string, unknown>; ip?: string | null },
  transaction?: Transaction,
) {
  await AuditEvent.create(
    { type: event.type, organisationId: event.organisationId, userId: event.userId, actorId: event.actorId ?? event.userId, detail: event.detail ?? null, ip: event.ip ?? null },
    { transaction },
  );
}
