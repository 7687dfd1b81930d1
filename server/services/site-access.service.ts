import type { Transaction } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { UserSiteAccess } from '@/server/models/user-site-access.model';

/**
 * The sites a user may see: null means every site of their organisation (admins, supervisors, engineers);
 * a viewer sees only the sites an admin has given them, and none until then.
 */
export async function visibleSiteIds(actor: Pick<AuthUser, 'id' | 'role'>, transaction?: Transaction): Promise<number[] | null> {
  if (actor.role !== 'viewer') return null;
  const rows = await UserSiteAccess.findAll({ attributes: ['siteId'], where: { userId: actor.id }, transaction });
  return rows.map((r) => r.siteId);
}

/** Site ids per user, for lists of people. */
export async function siteIdsByUser(userIds: number[], transaction?: Transaction): Promise<Map<number, number[]>> {
  const result = new Map<number, number[]>(userIds.map((id) => [id, []]));
  if (!userIds.length) return result;
  const rows = await UserSiteAccess.findAll({ where: { userId: userIds }, order: [['siteId', 'ASC']], transaction });
  for (const r of rows) result.get(r.userId)?.push(r.siteId);
  return result;
}
