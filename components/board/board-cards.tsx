import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import { BoardStateMark } from '@/components/board/board-state-mark';
import { HolderContact } from '@/components/board/holder-contact';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import type { BoardRow } from '@/shared/types/board';

interface Props {
  rows: BoardRow[];
  total: number;
  now: Date;
  busy: boolean;
  onMore: () => void;
}

/** The board on a phone: one card per live tag, overdue ones edged and marked, "show more" instead of pages. */
export function BoardCards({ rows, total, now, busy, onMore }: Props) {
  if (rows.length === 0 && !busy) return <EmptyState icon="tag-off-outline" title="No live tags match">Clear a filter or the search to see more.</EmptyState>;
  return (
    <View style={{ gap: space.sm }} testID="board-cards">
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm }}>
        <Text variant="small" muted style={{ flex: 1 }}>{`${total} ${total === 1 ? 'tag' : 'tags'}`}</Text>
        {busy ? <ActivityIndicator color={colors.brand} accessibilityLabel="Loading" /> : null}
      </View>
      {rows.map((r) => <BoardCard key={r.id} row={r} now={now} />)}
      {rows.length < total ? <Button title="Show more" variant="secondary" onPress={onMore} busy={busy} testID="board-more" /> : null}
    </View>
  );
}

function BoardCard({ row, now }: { row: BoardRow; now: Date }) {
  const kind = KIND_LOOK[row.kind];
  const overdue = row.state === 'overdue';
  return (
    <View style={[styles.card, { borderLeftColor: overdue ? colors.mandatory : TONE_COLORS[kind.tone].solid }, overdue && styles.overdue]} testID={`board-row-${row.id}`}>
      <Link href={`/tags/${row.id}`} asChild>
        <Pressable accessibilityRole="link" accessibilityLabel={`${kind.word} on ${row.plantId}, ${row.state === 'overdue' ? 'past expiry' : expiryPhrase(row.expiresAt, now)}`} style={styles.open}>
          <View style={styles.top}>
            <MaterialCommunityIcons name={kind.icon} size={22} color={colors.ink} />
            <Text bold style={{ flex: 1 }}>{`${row.plantId} · ${row.assetName}`}</Text>
            <MaterialCommunityIcons name="chevron-right" size={24} color={colors.inkMuted} />
          </View>
          <Text variant="small" muted>{`${kind.word} · ${row.siteName}${row.plantRoomName ? ` · ${row.plantRoomName}` : ''}`}</Text>
          <Text numberOfLines={3}>{row.reason}</Text>
          <BoardStateMark state={row.state} proved={row.proved} />
          <Text variant="small" bold>{expiryPhrase(row.expiresAt, now)}</Text>
          <Text variant="small" muted>{`Expires ${formatInZone(row.expiresAt, row.timeZone, now)}`}</Text>
          <Text variant="small" muted>{`Raised ${formatInZone(row.raisedAt, row.timeZone, now)}`}</Text>
        </Pressable>
      </Link>
      <HolderContact row={row} />
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: colors.surface, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, borderLeftWidth: 8, padding: space.md, gap: space.xs },
  overdue: { borderColor: colors.mandatory, borderWidth: 2, borderLeftWidth: 8 },
  open: { gap: space.xs, minHeight: layout.minTouch },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
