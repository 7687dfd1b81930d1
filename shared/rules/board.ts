import { DUE_SOON_HOURS, isDueSoon, isOverdue } from '@/shared/rules/tags';

/**
 * A live tag's state on the board, from its expiry and the server's clock: overdue once past its expiry,
 * due soon within DUE_SOON_HOURS of it (shared/rules/tags.ts), otherwise live.
 */
export const BOARD_STATES = ['overdue', 'due-soon', 'live'] as const;
export type BoardState = (typeof BOARD_STATES)[number];

/** The one state rule, from the tag rules' overdue and due-soon checks. */
export function boardState(expiresAt: Date | string, now: Date): BoardState {
  const tag = { status: 'live' as const, expiresAt };
  return isOverdue(tag, now) ? 'overdue' : isDueSoon(tag, now) ? 'due-soon' : 'live';
}

/** When "due soon" ends: DUE_SOON_HOURS after now. */
export const dueSoonUntil = (now: Date) => new Date(now.getTime() + DUE_SOON_HOURS * 3600_000);

/**
 * The same rule as an SQL condition on an expiry column, with its `?` values, so the database filters and
 * counts exactly what `boardState` says (overdue: before now; due soon: now up to and including the end of
 * the window; live: after it).
 */
export function boardStateSql(state: BoardState, column: string, now: Date): { sql: string; values: Date[] } {
  const soon = dueSoonUntil(now);
  if (state === 'overdue') return { sql: `${column} < ?`, values: [now] };
  if (state === 'due-soon') return { sql: `(${column} >= ? AND ${column} <= ?)`, values: [now, soon] };
  return { sql: `${column} > ?`, values: [soon] };
}

export const BOARD_STATE_LABELS: Record<BoardState, string> = {
  overdue: 'Past expiry',
  'due-soon': 'Due within 24 h',
  live: 'Live',
};

/** Columns the board sorts by; `sort=expires` ascending, `sort=-expires` descending. */
export const BOARD_SORT_KEYS = ['site', 'plant-room', 'plant-id', 'name', 'kind', 'reason', 'holder', 'raised', 'expires', 'state'] as const;
export type BoardSortKey = (typeof BOARD_SORT_KEYS)[number];
/** Soonest expiry first, so overdue tags lead. */
export const DEFAULT_BOARD_SORT: BoardSortKey = 'expires';

/** The CSV export holds the current view, every page, up to this many rows. */
export const BOARD_CSV_MAX_ROWS = 5000;

/** Seconds between refreshes of an open board. */
export const BOARD_REFRESH_SECONDS = 30;

/** Reads `sort` (`key` or `-key`) from a query string; anything unknown falls back to the default. */
export function readBoardSort(raw: unknown): { key: BoardSortKey; descending: boolean } {
  const text = typeof raw === 'string' ? raw.trim() : '';
  const descending = text.startsWith('-');
  const key = (descending ? text.slice(1) : text) as BoardSortKey;
  return BOARD_SORT_KEYS.includes(key) ? { key, descending } : { key: DEFAULT_BOARD_SORT, descending: false };
}
