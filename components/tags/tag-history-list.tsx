import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK, STATE_LOOK } from '@/components/tags/tag-vocabulary';
import { isOverdue } from '@/shared/rules/tags';
import type { Tag } from '@/shared/types/tags';

/** Every tag an item has carried, newest first, as a vertical line of entries; each opens its tag. */
export function TagHistoryList({ tags, now, limit }: { tags: Tag[]; now: Date; limit?: number }) {
  const sorted = [...tags].sort((a, b) => Date.parse(b.raisedAt) - Date.parse(a.raisedAt)).slice(0, limit);
  return (
    <View testID="asset-tag-history">
      {sorted.map((tag, i) => {
        const kind = KIND_LOOK[tag.kind];
        const state = tag.status === 'cleared' ? STATE_LOOK.cleared : tag.overdue || isOverdue(tag, now) ? STATE_LOOK.overdue : { word: 'Live', icon: kind.icon };
        const tz = tag.asset.timeZone;
        return (
          <Link key={tag.id} href={`/tags/${tag.id}`} asChild>
            <Pressable accessibilityRole="link" style={styles.entry} testID={`history-tag-${tag.id}`}>
              <View style={styles.rail}>
                <View style={styles.dot}><MaterialCommunityIcons name={kind.icon} size={18} color={colors.ink} /></View>
                {i < sorted.length - 1 ? <View style={styles.line} /> : null}
              </View>
              <View style={styles.body}>
                <Text bold>{`${kind.word} · ${state.word}`}</Text>
                <Text numberOfLines={2}>{tag.reason}</Text>
                <Text variant="small" muted>{`Raised by ${tag.raisedBy.name}, ${formatInZone(tag.raisedAt, tz, now)}`}</Text>
                {tag.holder.id !== tag.raisedBy.id ? <Text variant="small" muted>{`Held by ${tag.holder.name}`}</Text> : null}
                {tag.clearedAt ? <Text variant="small" muted>{`Cleared by ${tag.clearedBy?.name ?? 'Unknown'}, ${formatInZone(tag.clearedAt, tz, now)}`}</Text> : null}
              </View>
            </Pressable>
          </Link>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  entry: { flexDirection: 'row', gap: space.md, minHeight: layout.minTouch },
  rail: { width: 32, alignItems: 'center' },
  dot: { width: 32, height: 32, borderRadius: 16, borderWidth: 2, borderColor: colors.ink, backgroundColor: colors.surface, alignItems: 'center', justifyContent: 'center' },
  line: { flex: 1, width: 2, backgroundColor: colors.line, marginVertical: 2 },
  body: { flex: 1, gap: 2, paddingBottom: space.lg },
});
