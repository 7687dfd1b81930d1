import { QueryTypes, type Sequelize } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { ensurePermission, type AuthUser } from '@/server/middleware/auth';
import { visibleSiteIds } from '@/server/services/site-access.service';
import { overdueReviews } from '@/server/services/procedure-reviews.service';
import { boardState, boardStateSql, type BoardSortKey } from '@/shared/rules/board';
import type { TagKind } from '@/shared/rules/tags';
import type { BoardQueryInput } from '@/shared/schemas/queries';
import type { BoardResponse, BoardRow, BoardSiteCounts } from '@/shared/types/board';

/** The board's filters and sort, as `boardQuery` (shared/schemas/queries.ts) reads them. */
export type BoardFilters = Omit<BoardQueryInput, 'page' | 'pageSize'>;

const SORT_COLUMNS: Record<BoardSortKey, string> = {
  site: 's.name',
  'plant-room': 'r.name',
  'plant-id': 'a.plant_id',
  name: 'a.name',
  kind: 't.kind',
  reason: 't.reason',
  holder: 'h.name',
  raised: 't.raised_at',
  expires: 't.expires_at',
  // The state follows the expiry (overdue, then due soon, then live), so it sorts by expiry.
  state: 't.expires_at',
};

const likeEscape = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

interface Scope { organisationId: number; siteIds: number[] | null; now: Date }

/** WHERE clause over live tags; every filter is a column of an index or of a joined primary key. */
function whereClause(scope: Scope, f: Partial<BoardFilters>) {
  const where = ['t.organisation_id = ?', "t.status = 'live'"];
  const values: unknown[] = [scope.organisationId];
  if (scope.siteIds) {
    if (!scope.siteIds.length) where.push('1 = 0');
    else { where.push('a.site_id IN (?)'); values.push(scope.siteIds); }
  }
  if (f.siteId) { where.push('a.site_id = ?'); values.push(f.siteId); }
  if (f.kind) { where.push('t.kind = ?'); values.push(f.kind); }
  if (f.holderId) { where.push('t.holder_id = ?'); values.push(f.holderId); }
  if (f.state) {
    const state = boardStateSql(f.state, 't.expires_at', scope.now);
    where.push(state.sql);
    values.push(...state.values);
  }
  // Every word must appear in one of plant ID, item name, reason or holder name.
  for (const word of (f.q ?? '').split(/\s+/).filter(Boolean).slice(0, 8)) {
    const like = `%${likeEscape(word)}%`;
    where.push('(a.plant_id LIKE ? OR a.name LIKE ? OR t.reason LIKE ? OR h.name LIKE ?)');
    values.push(like, like, like, like);
  }
  return { sql: where.join(' AND '), values };
}

/** 1 when the tag has a proof recorded (OSHA 29 CFR 1910.147(d)(6)). */
const PROVED = 'EXISTS (SELECT 1 FROM tag_proofs p WHERE p.tag_id = t.id)';

const FROM = `FROM tags t
  JOIN assets a ON a.id = t.asset_id
  JOIN sites s ON s.id = a.site_id
  LEFT JOIN plant_rooms r ON r.id = a.plant_room_id
  JOIN users h ON h.id = t.holder_id`;

interface RawRow {
  id: number; siteId: number; siteName: string; timeZone: string; plantRoomId: number | null; plantRoomName: string | null;
  assetId: number; plantId: string; assetName: string; kind: TagKind; reason: string; holderId: number; holderName: string;
  raisedAt: Date | string; expiresAt: Date | string; contactPhone: string; proved: number | string;
}

function toRow(r: RawRow, scope: Scope): BoardRow {
  const expiresAt = new Date(r.expiresAt);
  const state = boardState(expiresAt, scope.now);
  return {
    id: r.id, siteId: r.siteId, siteName: r.siteName, timeZone: r.timeZone, plantRoomId: r.plantRoomId, plantRoomName: r.plantRoomName,
    assetId: r.assetId, plantId: r.plantId, assetName: r.assetName, kind: r.kind, reason: r.reason,
    holder: { id: r.holderId, name: r.holderName }, raisedAt: new Date(r.raisedAt).toISOString(), expiresAt: expiresAt.toISOString(),
    state, contactPhone: r.contactPhone, proved: r.kind === 'isolation' ? Number(r.proved) > 0 : null,
  };
}

async function scopeFor(actor: AuthUser): Promise<Scope> {
  ensurePermission(actor, 'viewBoard', 'The board is for supervisors, admins and viewers.');
  return { organisationId: actor.organisationId, siteIds: visibleSiteIds(actor), now: clock.now() };
}

async function selectRows(sequelize: Sequelize, scope: Scope, f: BoardFilters, limit: number, offset: number): Promise<BoardRow[]> {
  const w = whereClause(scope, f);
  const dir = f.sort.descending ? 'DESC' : 'ASC';
  const rows = await sequelize.query<RawRow>(
    // Tags first: the (organisation_id, status, expires_at) index finds the live tags already in expiry order, so
    // the default sort reads only one page of index entries; the other tables join on their primary keys.
    `SELECT STRAIGHT_JOIN t.id, a.site_id AS siteId, s.name AS siteName, s.time_zone AS timeZone, a.plant_room_id AS plantRoomId, r.name AS plantRoomName,
       a.id AS assetId, a.plant_id AS plantId, a.name AS assetName, t.kind, t.reason, t.holder_id AS holderId, h.name AS holderName,
       t.raised_at AS raisedAt, t.expires_at AS expiresAt, t.contact_phone AS contactPhone, ${PROVED} AS proved
     ${FROM} WHERE ${w.sql}
     ORDER BY ${SORT_COLUMNS[f.sort.key]} ${dir}, t.expires_at ${dir}, t.id ${dir} LIMIT ? OFFSET ?`,
    { replacements: [...w.values, limit, offset], type: QueryTypes.SELECT },
  );
  return rows.map((r) => toRow(r, scope));
}

export async function getBoard(sequelize: Sequelize, actor: AuthUser, f: BoardFilters, paging: { page: number; pageSize: number; offset: number }): Promise<BoardResponse> {
  const scope = await scopeFor(actor);
  const w = whereClause(scope, f);
  const [items, [{ n }], perSite, reviewsOverdue] = await Promise.all([
    selectRows(sequelize, scope, f, paging.pageSize, paging.offset),
    sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n ${FROM} WHERE ${w.sql}`, { replacements: w.values, type: QueryTypes.SELECT }),
    siteCounts(sequelize, scope),
    overdueReviews(sequelize, scope.organisationId, scope.siteIds, scope.now),
  ]);
  const sum = (k: 'total' | 'overdue' | 'dueSoon' | 'notProved') => perSite.reduce((acc, s) => acc + s[k], 0);
  return {
    items, total: Number(n), page: paging.page, pageSize: paging.pageSize,
    counts: { total: sum('total'), overdue: sum('overdue'), dueSoon: sum('dueSoon'), notProved: sum('notProved'), perSite },
    asOf: scope.now.toISOString(),
    reviewsOverdue,
  };
}

/** Every live tag the caller may see, counted per site in one grouped query. */
async function siteCounts(sequelize: Sequelize, scope: Scope): Promise<BoardSiteCounts[]> {
  const w = whereClause(scope, {});
  const overdue = boardStateSql('overdue', 't.expires_at', scope.now);
  const dueSoon = boardStateSql('due-soon', 't.expires_at', scope.now);
  const rows = await sequelize.query<{ siteId: number; siteName: string; total: number; overdue: number; dueSoon: number; notProved: number }>(
    `SELECT a.site_id AS siteId, s.name AS siteName, COUNT(*) AS total,
       SUM(${overdue.sql}) AS overdue, SUM(${dueSoon.sql}) AS dueSoon,
       SUM(t.kind = 'isolation' AND NOT ${PROVED}) AS notProved
     FROM tags t JOIN assets a ON a.id = t.asset_id JOIN sites s ON s.id = a.site_id
     WHERE ${w.sql} GROUP BY a.site_id, s.name ORDER BY s.name, a.site_id`,
    { replacements: [...overdue.values, ...dueSoon.values, ...w.values], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ siteId: r.siteId, siteName: r.siteName, total: Number(r.total), overdue: Number(r.overdue), dueSoon: Number(r.dueSoon), notProved: Number(r.notProved) }));
}

/** The current view for the CSV export: every page, up to `max` rows. */
export async function boardRowsForExport(sequelize: Sequelize, actor: AuthUser, f: BoardFilters, max: number): Promise<{ rows: BoardRow[]; truncated: boolean }> {
  const scope = await scopeFor(actor);
  const rows = await selectRows(sequelize, scope, f, max + 1, 0);
  return { rows: rows.slice(0, max), truncated: rows.length > max };
}
