import type { ListResponse } from '@/shared/types/api';

export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 50;
/** No list holds more than this many pages; a larger page number is refused (400), not sent to the database. */
export const MAX_PAGE = 100_000;

/**
 * `page`, `pageSize` and the row offset from a query string: the values `pagingQuery` (shared/schemas/request.ts)
 * has checked, or, on a route not yet behind it, raw text read leniently with both capped.
 */
export function readPaging(query: { page?: unknown; pageSize?: unknown }) {
  const page = Math.min(MAX_PAGE, Math.max(1, Math.floor(Number(query.page) || 1)));
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(Number(query.pageSize) || DEFAULT_PAGE_SIZE)));
  return { page, pageSize, offset: (page - 1) * pageSize };
}

/** A page of a list as the services read it: `readPaging`'s answer. */
export type Paging = ReturnType<typeof readPaging>;

/** The rows of one page, for a query's `limit` and `offset`. */
export const pageRows = (paging: Paging) => ({ limit: paging.pageSize, offset: paging.offset });

/** A list answer: one page of items, the total, and the page asked for. */
export const listPage = <T>(items: T[], total: number, paging: Paging): ListResponse<T> => ({ items, total, page: paging.page, pageSize: paging.pageSize });
