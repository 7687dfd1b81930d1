import type { Transaction } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { AuditEvent, type AuditEventType } from '@/server/models/audit-event.model';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';
import type { ListResponse } from '@/shared/types/api';
import type { AuditEntry } from '@/shared/types/team';

/** The audit log: sign-ins, password links and team changes; written in the caller's transaction. */
export async function recordAudit(
  event: { type: AuditEventType; organisationId: number | null; userId: number | null; actorId?: number | null; detail?: Record<string, unknown>; ip?: string | null },
  transaction?: Transaction,
) {
  await AuditEvent.create(
    { type: event.type, organisationId: event.organisationId, userId: event.userId, actorId: event.actorId ?? event.userId, detail: event.detail ?? null, ip: event.ip ?? null },
    { transaction },
  );
}

export async function listAudit(actor: AuthUser, paging: Paging): Promise<ListResponse<AuditEntry>> {
  const { rows, count } = await AuditEvent.findAndCountAll({
    where: { organisationId: actor.organisationId },
    order: [['id', 'DESC']],
    ...pageRows(paging),
  });
  const entries = rows.map((e) => ({ id: Number(e.id), type: e.type, at: e.createdAt.toISOString(), userId: e.userId, actorId: e.actorId, detail: e.detail ?? null, ip: e.ip }));
  return listPage(entries, count, paging);
}
