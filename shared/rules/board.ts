import type { Role } from '@/shared/rules/roles';

/**
 * A live tag's state on the board, from its expiry and the server's clock: overdue once past its expiry,
 * due soon within DUE_SOON_HOURS of it (shared/rules/tags.ts), otherwise live.
 */
export const BOARD_STATES = ['overdue', 'due-soon', 'live'] as const;
export type BoardState = (typeof BOARD_STATES)[number];

export const BOARD_STATE_LABELS: Record<BoardState, string> = {
  overdue: 'Overdue',
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

/** Supervisors and admins see every site; viewers only the sites given to them; engineers have no board. */
export const mayViewBoard = (role: Role) => role !== 'engineer';

/** Reads `sort` (`key` or `-key`) from a query string; anything unknown falls back to the default. */
export function readBoardSort(raw: unknown): { key: BoardSortKey; descending: boolean } {
  const text = typeof raw === 'string' ? raw.trim() : '';
  const descending = text.startsWith('-');
  const key = (descending ? text.slice(1) : text) as BoardSortKey;
  return BOARD_SORT_KEYS.includes(key) ? { key, descending } : { key: DEFAULT_BOARD_SORT, descending: false };
}
