import { HttpError, notFound } from '@/server/lib/http-error';
import { AuditEvent } from '@/server/models/audit-event.model';
import { User } from '@/server/models/user.model';
import type { AuthUser } from '@/server/middleware/auth';
import type { ListResponse } from '@/shared/types/api';
import { teamMembers } from '@/server/services/team.service';
import type { TeamMember } from '@/shared/types/team';

export type { TeamMember };

export async function listUsers(actor: AuthUser, paging: { page: number; pageSize: number; offset: number }): Promise<ListResponse<TeamMember>> {
  const { rows, count } = await User.findAndCountAll({
    where: { organisationId: actor.organisationId },
    order: [['name', 'ASC']],
    limit: paging.pageSize,
    offset: paging.offset,
  });
  return { items: await teamMembers(rows), total: count, page: paging.page, pageSize: paging.pageSize };
}

/** Another organisation's user is answered exactly like a missing one. */
export async function getUser(actor: AuthUser, id: number): Promise<TeamMember> {
  if (!Number.isSafeInteger(id)) throw new HttpError(400, 'bad-id', 'The id must be a number.');
  const user = await User.findOne({ where: { id, organisationId: actor.organisationId } });
  if (!user) throw notFound('User');
  return (await teamMembers([user]))[0];
}

export interface AuditEntry {
  id: number;
  type: string;
  at: string;
  userId: number | null;
  actorId: number | null;
  detail: Record<string, unknown> | null;
  ip: string | null;
}

export async function listAudit(actor: AuthUser, paging: { page: number; pageSize: number; offset: number }): Promise<ListResponse<AuditEntry>> {
  const { rows, count } = await AuditEvent.findAndCountAll({
    where: { organisationId: actor.organisationId },
    order: [['id', 'DESC']],
    limit: paging.pageSize,
    offset: paging.offset,
  });
  return {
    items: rows.map((e) => ({ id: Number(e.id), type: e.type, at: e.createdAt.toISOString(), userId: e.userId, actorId: e.actorId, detail: e.detail ?? null, ip: e.ip })),
    total: count,
    page: paging.page,
    pageSize: paging.pageSize,
  };
}
