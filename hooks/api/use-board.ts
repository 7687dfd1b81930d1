import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { fetchBlob, request } from '@/hooks/api/request';
import { BOARD_REFRESH_SECONDS } from '@/shared/rules/board';
import { queryString } from '@/shared/rules/query-string';
import type { BoardQuery, BoardResponse } from '@/shared/types/board';

export const boardKeys = {
  all: ['board'] as const,
  view: (query: BoardQuery) => [...boardKeys.all, 'view', query] as const,
};


/** The live board: polled so a tag raised anywhere appears without a reload, and refreshed when the window regains focus. */
export function useBoardQuery(query: BoardQuery) {
  return useQuery({
    queryKey: boardKeys.view(query),
    queryFn: () => request<BoardResponse>(`/board${queryString({ ...query })}`),
    refetchInterval: BOARD_REFRESH_SECONDS * 1000,
    refetchIntervalInBackground: false,
    refetchOnWindowFocus: true,
    placeholderData: keepPreviousData,
  });
}

/** The same view as CSV, every page; paging is the server's to decide for an export. */
export function fetchBoardCsv(query: BoardQuery): Promise<Blob> {
  const { page: _page, pageSize: _pageSize, ...filters } = query;
  return fetchBlob(`/api/board.csv${queryString({ ...filters })}`);
}
