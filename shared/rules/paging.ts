export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 50;

/** Reads `page` and `pageSize` from a query string, capping the page size. */
export function readPaging(query: { page?: unknown; pageSize?: unknown }) {
  const page = Math.max(1, Math.floor(Number(query.page) || 1));
  const pageSize = Math.min(MAX_PAGE_SIZE, Math.max(1, Math.floor(Number(query.pageSize) || DEFAULT_PAGE_SIZE)));
  return { page, pageSize, offset: (page - 1) * pageSize };
}
