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

/*
 * What keeps the board fast (migration 0016): live tags are found through the index
 * (organisation_id, status, expires_at, id, asset_id, kind, holder_id), so the 100,000s of cleared tags are never
 * read, the default sort (expiry, then id) is the index's own order, and the counts read tags from the index alone.
 * Every condition compares a bare column with a value (no function on an indexed column). The page is chosen on the
 * tags (plus only the tables the filters or the sort need) before anything is joined for display, so the display
 * joins touch one page of rows; the counts for every site and the filtered total come from one grouped query.
 */

interface Sql { sql: string; values: unknown[] }

const and = (parts: Sql[]): Sql => ({ sql: parts.map((p) => p.sql).join(' AND '), values: parts.flatMap((p) => p.values) });

/** The caller's scope: their organisation's live tags on the sites they may see. */
function scopeConditions(scope: Scope): Sql[] {
  const where: Sql[] = [{ sql: 't.organisation_id = ?', values: [scope.organisationId] }, { sql: "t.status = 'live'", values: [] }];
  if (scope.siteIds) where.push(scope.siteIds.length ? { sql: 'a.site_id IN (?)', values: [scope.siteIds] } : { sql: '1 = 0', values: [] });
  return where;
}

/** The board's filters; each is a bare column of an index or of a joined primary key compared with a value. */
function filterConditions(scope: Scope, f: Partial<BoardFilters>): Sql[] {
  const where: Sql[] = [];
  if (f.siteId) where.push({ sql: 'a.site_id = ?', values: [f.siteId] });
  if (f.kind) where.push({ sql: 't.kind = ?', values: [f.kind] });
  if (f.holderId) where.push({ sql: 't.holder_id = ?', values: [f.holderId] });
  if (f.state) where.push(boardStateSql(f.state, 't.expires_at', scope.now));
  // Every word must appear in one of plant ID, item name, reason or holder name.
  for (const word of (f.q ?? '').split(/\s+/).filter(Boolean).slice(0, 8)) {
    const like = `%${likeEscape(word)}%`;
    where.push({ sql: '(a.plant_id LIKE ? OR a.name LIKE ? OR t.reason LIKE ? OR h.name LIKE ?)', values: [like, like, like, like] });
  }
  return where;
}

/** 1 when the tag has a proof recorded (OSHA 29 CFR 1910.147(d)(6)). */
const PROVED = 'EXISTS (SELECT 1 FROM tag_proofs p WHERE p.tag_id = t.id)';

const JOINS = {
  a: 'JOIN assets a ON a.id = t.asset_id',
  s: 'JOIN sites s ON s.id = a.site_id',
  r: 'LEFT JOIN plant_rooms r ON r.id = a.plant_room_id',
  h: 'JOIN users h ON h.id = t.holder_id',
} as const;

/** The joins, in order, that SQL naming these aliases needs on top of tags (a site or room needs its item). */
function joinsFor(...sql: string[]): string {
  const text = sql.join(' ');
  const uses = (alias: string) => new RegExp(`\\b${alias}\\.`).test(text);
  const need = { s: uses('s'), r: uses('r'), h: uses('h') };
  const parts: string[] = [];
  if (need.s || need.r || uses('a')) parts.push(JOINS.a);
  if (need.s) parts.push(JOINS.s);
  if (need.r) parts.push(JOINS.r);
  if (need.h) parts.push(JOINS.h);
  return parts.join('\n  ');
}

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

/** The sort as SQL: the chosen column, then expiry and id, so the order is total and the same in both halves. */
function orderBy(f: BoardFilters): string {
  const dir = f.sort.descending ? 'DESC' : 'ASC';
  const columns = [...new Set([SORT_COLUMNS[f.sort.key], 't.expires_at', 't.id'])];
  return columns.map((c) => `${c} ${dir}`).join(', ');
}

async function selectRows(sequelize: Sequelize, scope: Scope, f: BoardFilters, limit: number, offset: number): Promise<BoardRow[]> {
  const w = and([...scopeConditions(scope), ...filterConditions(scope, f)]);
  const order = orderBy(f);
  const rows = await sequelize.query<RawRow>(
    // The page's tag ids first, tags leading (STRAIGHT_JOIN): in the default sort the index hands over live tags in
    // expiry order and only one page of index entries is read. Then one page of rows is joined for display.
    `SELECT t.id, a.site_id AS siteId, s.name AS siteName, s.time_zone AS timeZone, a.plant_room_id AS plantRoomId, r.name AS plantRoomName,
       a.id AS assetId, a.plant_id AS plantId, a.name AS assetName, t.kind, t.reason, t.holder_id AS holderId, h.name AS holderName,
       t.raised_at AS raisedAt, t.expires_at AS expiresAt, t.contact_phone AS contactPhone, ${PROVED} AS proved
     FROM (SELECT STRAIGHT_JOIN t.id FROM tags t
       ${joinsFor(w.sql, order)}
       WHERE ${w.sql} ORDER BY ${order} LIMIT ? OFFSET ?) page
     JOIN tags t ON t.id = page.id
     ${joinsFor('a. s. r. h.')}
     ORDER BY ${order}`,
    { replacements: [...w.values, limit, offset], type: QueryTypes.SELECT },
  );
  return rows.map((r) => toRow(r, scope));
}

export async function getBoard(sequelize: Sequelize, actor: AuthUser, f: BoardFilters, paging: { page: number; pageSize: number; offset: number }): Promise<BoardResponse> {
  const scope = await scopeFor(actor);
  const [items, { perSite, matching }, reviewsOverdue] = await Promise.all([
    selectRows(sequelize, scope, f, paging.pageSize, paging.offset),
    siteCounts(sequelize, scope, f),
    overdueReviews(sequelize, scope.organisationId, scope.siteIds, scope.now),
  ]);
  const sum = (k: 'total' | 'overdue' | 'dueSoon' | 'notProved') => perSite.reduce((acc, s) => acc + s[k], 0);
  return {
    items, total: matching, page: paging.page, pageSize: paging.pageSize,
    counts: { total: sum('total'), overdue: sum('overdue'), dueSoon: sum('dueSoon'), notProved: sum('notProved'), perSite },
    asOf: scope.now.toISOString(),
    reviewsOverdue,
  };
}

/**
 * Every live tag the caller may see, counted per site, and how many of them the filters match (the view's total),
 * in one grouped query.
 */
async function siteCounts(sequelize: Sequelize, scope: Scope, f: Partial<BoardFilters>): Promise<{ perSite: BoardSiteCounts[]; matching: number }> {
  const w = and(scopeConditions(scope));
  const filters = filterConditions(scope, f);
  const matched = filters.length ? { sql: `SUM(CASE WHEN ${and(filters).sql} THEN 1 ELSE 0 END)`, values: and(filters).values } : { sql: 'COUNT(*)', values: [] };
  const overdue = boardStateSql('overdue', 't.expires_at', scope.now);
  const dueSoon = boardStateSql('due-soon', 't.expires_at', scope.now);
  const rows = await sequelize.query<{ siteId: number; siteName: string; total: number; overdue: number; dueSoon: number; notProved: number; matching: number }>(
    // Grouped by the item's site first; each site's name is joined once per site, not once per tag.
    `SELECT c.siteId, s.name AS siteName, c.total, c.overdue, c.dueSoon, c.notProved, c.matching
     FROM (SELECT STRAIGHT_JOIN a.site_id AS siteId, COUNT(*) AS total,
         SUM(${overdue.sql}) AS overdue, SUM(${dueSoon.sql}) AS dueSoon,
         SUM(t.kind = 'isolation' AND NOT ${PROVED}) AS notProved, ${matched.sql} AS matching
       FROM tags t
       ${joinsFor('a.', matched.sql)}
       WHERE ${w.sql} GROUP BY a.site_id) c
     JOIN sites s ON s.id = c.siteId
     ORDER BY s.name, c.siteId`,
    { replacements: [...overdue.values, ...dueSoon.values, ...matched.values, ...w.values], type: QueryTypes.SELECT },
  );
  return {
    perSite: rows.map((r) => ({ siteId: r.siteId, siteName: r.siteName, total: Number(r.total), overdue: Number(r.overdue), dueSoon: Number(r.dueSoon), notProved: Number(r.notProved) })),
    matching: rows.reduce((acc, r) => acc + Number(r.matching), 0),
  };
}

/** The current view for the CSV export: every page, up to `max` rows. */
export async function boardRowsForExport(sequelize: Sequelize, actor: AuthUser, f: BoardFilters, max: number): Promise<{ rows: BoardRow[]; truncated: boolean }> {
  const scope = await scopeFor(actor);
  const rows = await selectRows(sequelize, scope, f, max + 1, 0);
  return { rows: rows.slice(0, max), truncated: rows.length > max };
}
