import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { UserSiteAccess } from '@/server/models/user-site-access.model';
import { may } from '@/shared/rules/permissions';

/*
 * A viewer's site limits, in one place. The auth middleware reads the sites given to a viewer once per request
 * (grantedSiteIds) and every read of sites, plant rooms, items, tags, readings, photos, labels, exports and the
 * board filters through the functions below, so one rule decides what a viewer can see everywhere.
 */

/** The sites an admin has given a user (what a viewer may see), for the auth middleware. */
export async function grantedSiteIds(userId: number, transaction?: Transaction): Promise<number[]> {
  const rows = await UserSiteAccess.findAll({ attributes: ['siteId'], where: { userId }, transaction });
  return rows.map((r) => r.siteId);
}

/**
 * The sites a user may see: null means every site of their organisation (admins, supervisors, engineers:
 * permission `seeEverySite`); anyone else sees only the sites given to them, and none until then (or when the
 * actor was built without its sites: the rule fails closed).
 */
export function visibleSiteIds(actor: Pick<AuthUser, 'role' | 'siteIds'>): number[] | null {
  if (may(actor, 'seeEverySite')) return null;
  return actor.siteIds ?? [];
}

/** May this actor see a record on this site? */
export function seesSite(actor: Pick<AuthUser, 'role' | 'siteIds'>, siteId: number | null | undefined): boolean {
  const ids = visibleSiteIds(actor);
  return ids === null || (siteId != null && ids.includes(siteId));
}

/**
 * A Sequelize condition on a site column (`siteId`, or `id` for sites themselves) to spread into a `where`; empty
 * for those who see every site. It sits under Op.and, so a filter on the same column (`siteId: 3`) narrows it and
 * never replaces it.
 */
export function siteWhere(actor: Pick<AuthUser, 'role' | 'siteIds'>, column = 'siteId'): WhereOptions {
  const ids = visibleSiteIds(actor);
  return ids === null ? {} : { [Op.and]: [{ [column]: { [Op.in]: ids.length ? ids : [0] } }] };
}

/** Site ids per user, for lists of people. */
export async function siteIdsByUser(userIds: number[], transaction?: Transaction): Promise<Map<number, number[]>> {
  const result = new Map<number, number[]>(userIds.map((id) => [id, []]));
  if (!userIds.length) return result;
  const rows = await UserSiteAccess.findAll({ where: { userId: userIds }, order: [['siteId', 'ASC']], transaction });
  for (const r of rows) result.get(r.userId)?.push(r.siteId);
  return result;
}
