import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useRouter } from 'expo-router';
import { View } from 'react-native';
import { colors } from '@/components/theme';
import { DataTable, type Column, type Paging, type SortState } from '@/components/ui/data-table';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import { BoardStateMark } from '@/components/board/board-state-mark';
import { HolderContact } from '@/components/board/holder-contact';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import type { BoardRow } from '@/shared/types/board';

interface Props {
  rows: BoardRow[];
  now: Date;
  sort: SortState;
  onSort: (s: SortState) => void;
  paging: Paging;
  busy: boolean;
}

// Column keys are the server's sort keys (shared/rules/board.ts BOARD_SORT_KEYS).
/** The board as a dense table for wide screens and print; a row opens the tag. */
export function BoardTable({ rows, now, sort, onSort, paging, busy }: Props) {
  const router = useRouter();
  const columns: Column<BoardRow>[] = [
    { key: 'site', title: 'Site', flex: 0.9, sortable: true, render: (r) => <Text variant="small" numberOfLines={2}>{r.siteName}</Text> },
    { key: 'plant-room', title: 'Plant room', flex: 1, sortable: true, render: (r) => <Text variant="small" numberOfLines={2}>{r.plantRoomName ?? '—'}</Text> },
    {
      key: 'plant-id', title: 'Item', flex: 1.4, sortable: true,
      render: (r) => (
        <View>
          <Text variant="small" bold>{r.plantId}</Text>
          <Text variant="small" muted numberOfLines={2}>{r.assetName}</Text>
        </View>
      ),
    },
    {
      key: 'kind', title: 'Kind', width: 118, sortable: true,
      render: (r) => (
        <View style={{ flexDirection: 'row', alignItems: 'center', gap: 4 }}>
          <MaterialCommunityIcons name={KIND_LOOK[r.kind].icon} size={18} color={colors.ink} />
          <Text variant="small">{KIND_LOOK[r.kind].word}</Text>
        </View>
      ),
    },
    { key: 'reason', title: 'Reason', flex: 1.8, sortable: true, render: (r) => <Text variant="small" numberOfLines={3}>{r.reason}</Text> },
    { key: 'holder', title: 'Holder', flex: 1.3, sortable: true, render: (r) => <HolderContact row={r} /> },
    { key: 'raised', title: 'Raised', flex: 1.3, sortable: true, render: (r) => <SiteTime iso={r.raisedAt} timeZone={r.timeZone} now={now} /> },
    {
      key: 'expires', title: 'Expires', flex: 1.4, sortable: true,
      render: (r) => (
        <View>
          <Text variant="small" bold>{expiryPhrase(r.expiresAt, now)}</Text>
          <SiteTime iso={r.expiresAt} timeZone={r.timeZone} now={now} muted />
        </View>
      ),
    },
    { key: 'state', title: 'State', width: 178, sortable: true, render: (r) => <BoardStateMark state={r.state} proved={r.proved} testID={`board-state-${r.id}`} /> },
  ];
  return (
    <DataTable
      label="Live tags"
      columns={columns}
      rows={rows}
      rowKey={(r) => r.id}
      sort={sort}
      onSort={onSort}
      paging={paging}
      busy={busy}
      minWidth={1080}
      onRowPress={(r) => router.push(`/tags/${r.id}`)}
      empty={<EmptyState icon="tag-off-outline" title="No live tags match">Clear a filter or the search to see more.</EmptyState>}
      testID="board-table"
    />
  );
}

/** A time as the site's clock reads it, the zone on its own line so narrow columns break cleanly. */
function SiteTime({ iso, timeZone, now, muted }: { iso: string; timeZone: string; now: Date; muted?: boolean }) {
  const text = formatInZone(iso, timeZone, now);
  const cut = text.lastIndexOf(' (');
  return (
    <View>
      <Text variant="small" muted={muted}>{cut > 0 ? text.slice(0, cut) : text}</Text>
      {/* The zone on a line of its own, without brackets, so a narrow column never breaks it. */}
      {cut > 0 ? <Text variant="small" muted numberOfLines={1}>{text.slice(cut + 2).replace(/\)$/, '')}</Text> : null}
    </View>
  );
}
