import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK, STATE_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import { isOverdue } from '@/shared/rules/tags';
import type { Tag } from '@/shared/types/tags';

/** A live tag on an item's record: kind, holder, reason and expiry; opens the tag. */
export function TagCard({ tag, now }: { tag: Tag; now: Date }) {
  const kind = KIND_LOOK[tag.kind];
  const overdue = tag.overdue || isOverdue(tag, now);
  const edge = TONE_COLORS[kind.tone].solid;
  return (
    <Link href={`/tags/${tag.id}`} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={`${kind.word} tag held by ${tag.holder.name}: ${tag.reason}`}
        testID={`tag-card-${tag.id}`}
        style={StyleSheet.flatten([styles.card, { borderLeftColor: edge }])}
      >
        <View style={styles.top}>
          <MaterialCommunityIcons name={kind.icon} size={22} color={colors.ink} />
          <Text bold style={{ flex: 1 }}>{`${kind.word} · ${tag.holder.name}`}</Text>
          <MaterialCommunityIcons name="chevron-right" size={24} color={colors.inkMuted} />
        </View>
        <Text numberOfLines={3}>{tag.reason}</Text>
        {tag.status === 'live' && tag.proved === false ? <Text variant="small" bold testID={`tag-card-not-proved-${tag.id}`}>⚠ Not proved: no proof of isolation recorded</Text> : null}
        <View style={[styles.expiry, overdue && styles.expiryOverdue]}>
          <MaterialCommunityIcons name={overdue ? STATE_LOOK.overdue.icon : 'calendar-clock'} size={18} color={overdue ? colors.brandInk : colors.ink} />
          <Text variant="small" bold style={{ color: overdue ? colors.brandInk : colors.ink, flexShrink: 1 }}>
            {`${overdue ? STATE_LOOK.overdue.word : 'Live'} · ${expiryPhrase(tag.expiresAt, now)} · ${formatInZone(tag.expiresAt, tag.asset.timeZone, now)}`}
          </Text>
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    borderLeftWidth: 8,
    padding: space.md,
    gap: space.xs,
    minHeight: layout.minTouch,
  },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  expiry: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: space.xs, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, backgroundColor: colors.surfaceSunk },
  expiryOverdue: { backgroundColor: colors.mandatory },
});
