import { useMemo, useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import type { SortState } from '@/components/ui/data-table';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { BoardActions } from '@/components/board/board-actions';
import { BoardCards } from '@/components/board/board-cards';
import { BoardCounts, BoardReviewsOverdue } from '@/components/board/board-counts';
import { BoardFilters, NO_BOARD_FILTERS, type BoardFilterState } from '@/components/board/board-filters';
import { BoardTable } from '@/components/board/board-table';
import { useBoardHolders } from '@/components/board/use-board-holders';
import { BoardPrintStyles } from '@/components/board/print-styles';
import { useNow } from '@/components/tags/use-now';
import { errorMessage } from '@/hooks/api/request';
import { useBoardQuery } from '@/hooks/api/use-board';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useSitesQuery } from '@/hooks/api/use-sites';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { DEFAULT_BOARD_SORT } from '@/shared/rules/board';
import type { BoardQuery } from '@/shared/types/board';

const TABLE_PAGE = 50;
const PHONE_PAGE = 20;

export default function BoardScreen() {
  const { isWide } = useBreakpoints();
  const { actor, may } = usePermissions();
  const [filters, setFilters] = useState<BoardFilterState>(NO_BOARD_FILTERS);
  const [sort, setSort] = useState<SortState>({ key: DEFAULT_BOARD_SORT, dir: 'asc' });
  const [page, setPage] = useState(1);
  const [phoneCount, setPhoneCount] = useState(PHONE_PAGE);
  const q = useDebouncedValue(filters.q.trim(), 300);
  const now = useNow(30_000);

  const query: BoardQuery = useMemo(() => ({
    q: q || undefined,
    siteId: filters.siteId ?? undefined,
    kind: filters.kind ?? undefined,
    holderId: filters.holderId ?? undefined,
    state: filters.state ?? undefined,
    sort: `${sort.dir === 'desc' ? '-' : ''}${sort.key}`,
    page: isWide ? page : 1,
    pageSize: isWide ? TABLE_PAGE : phoneCount,
  }), [q, filters.siteId, filters.kind, filters.holderId, filters.state, sort, page, phoneCount, isWide]);
  const board = useBoardQuery(query);
  const sites = useSitesQuery();
  const holders = useBoardHolders(board.data?.items ?? []);

  const change = (next: BoardFilterState) => {
    setFilters(next);
    setPage(1);
    setPhoneCount(PHONE_PAGE);
  };

  if (actor && !may('viewBoard')) {
    return (
      <Screen title="Live tags board">
        <Notice tone="info" word="Not for your role">The board is for supervisors, admins and viewers. Your own tags are on each plant item’s record.</Notice>
      </Screen>
    );
  }

  const readOnly = !!actor && !may('actOnBoard');
  const data = board.data;
  return (
    <Screen
      title="Live tags board"
      subtitle={readOnly ? 'Every live tag on the sites you can see · read only' : 'Every live isolation and override tag'}
      actions={<BoardActions query={query} updatedAt={data?.asOf ?? (board.dataUpdatedAt || null)} fetching={board.isFetching} onRefresh={() => void board.refetch()} />}
    >
      <BoardPrintStyles />
      <View style={{ gap: space.lg }} nativeID="board-print-area">
        {board.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(board.error)}</Notice> : null}
        {data ? (
          <BoardCounts
            counts={data.counts}
            siteId={filters.siteId}
            state={filters.state}
            onSite={(siteId) => change({ ...filters, siteId })}
            onState={(state) => change({ ...filters, state })}
          />
        ) : null}
        {data ? <BoardReviewsOverdue sites={data.reviewsOverdue} /> : null}
        <BoardFilters value={filters} onChange={change} sites={(sites.data?.items ?? []).map((s) => ({ value: s.id, label: s.name }))} holders={holders} />
        {!data ? (
          board.isPending ? <LoadingView /> : null
        ) : isWide ? (
          <BoardTable
            rows={data.items}
            now={now}
            sort={sort}
            onSort={(s) => { setSort(s); setPage(1); }}
            paging={{ page: data.page, pageSize: data.pageSize, total: data.total, onPage: setPage }}
            busy={board.isFetching}
          />
        ) : (
          <BoardCards rows={data.items} total={data.total} now={now} busy={board.isFetching} onMore={() => setPhoneCount((n) => n + PHONE_PAGE)} />
        )}
      </View>
    </Screen>
  );
}
