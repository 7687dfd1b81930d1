import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import type { ComponentProps, ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { telHref } from '@/components/board/board-vocabulary';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK, STATE_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import { isOverdue } from '@/shared/rules/tags';
import type { Tag } from '@/shared/types/tags';

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

function Line({ icon, label, children, wide }: { icon: ComponentProps<typeof MaterialCommunityIcons>['name']; label: string; children: ReactNode; wide?: boolean }) {
  return (
    <View style={[styles.line, wide && styles.lineWide]}>
      <MaterialCommunityIcons name={icon} size={22} color={colors.ink} style={{ marginTop: 2 }} />
      <View style={{ flex: 1 }}>
        <Text variant="small" muted>{label}</Text>
        {typeof children === 'string' ? <Text>{children}</Text> : children}
      </View>
    </View>
  );
}

/** The tag at a glance: its state plate (kind and live/overdue/cleared), the item, the holder and the times. */
export function TagHeader({ tag, now }: { tag: Tag; now: Date }) {
  const { isWide } = useBreakpoints();
  const kind = KIND_LOOK[tag.kind];
  const overdue = tag.overdue || isOverdue(tag, now);
  const status = tag.status === 'cleared' ? STATE_LOOK.cleared : overdue ? STATE_LOOK.overdue : null;
  const tone = TONE_COLORS[tag.status === 'cleared' ? 'neutral' : kind.tone];
  const statusWord = status?.word ?? 'Live';
  const tz = tag.asset.timeZone;

  return (
    <View style={[styles.frame, { borderColor: tone.solid }]} testID="tag-header">
      <View style={[styles.plate, { backgroundColor: tone.solid }]}>
        <MaterialCommunityIcons name={tag.status === 'cleared' ? STATE_LOOK.cleared.icon : kind.icon} size={36} color={tone.onSolid} />
        <View style={{ flex: 1 }}>
          <Text variant="small" bold style={{ color: tone.onSolid }}>{`${kind.word.toUpperCase()} TAG`}</Text>
          <Text variant="heading" style={{ color: tone.onSolid }} testID="tag-status-word">{statusWord}</Text>
          {tag.status === 'live' ? <Text style={{ color: tone.onSolid }}>{tag.kind === 'isolation' ? STATE_LOOK.isolated.meaning : STATE_LOOK.overridden.meaning}</Text> : null}
        </View>
      </View>
      {overdue ? (
        <View style={styles.overdue} testID="tag-overdue">
          <MaterialCommunityIcons name={STATE_LOOK.overdue.icon} size={24} color={colors.brandInk} />
          <Text bold style={{ color: colors.brandInk, flex: 1 }}>{`${capitalise(expiryPhrase(tag.expiresAt, now))}. It stays in force until a person clears it; the holder should clear or extend it.`}</Text>
        </View>
      ) : null}
      {tag.status === 'live' && tag.proved === false ? (
        <View style={styles.notProved} testID="tag-not-proved">
          <Notice tone="caution" word="Not proved">No proof of this isolation is recorded yet. Prove it dead before any work starts, then record how.</Notice>
        </View>
      ) : null}
      <View style={[styles.body, isWide && styles.bodyWide]}>
        <Line wide={isWide} icon="map-marker-outline" label="Item">
          <Link href={`/assets/${tag.asset.id}`} asChild>
            <Pressable accessibilityRole="link" style={styles.link} testID="tag-item-link">
              <Text bold style={styles.linkText}>{`${tag.asset.plantId} · ${tag.asset.name}`}</Text>
            </Pressable>
          </Link>
          <Text variant="small" muted>{[tag.asset.siteName, tag.asset.plantRoomName].filter(Boolean).join(' · ')}</Text>
        </Line>
        <Line wide={isWide} icon="account-hard-hat" label={tag.status === 'live' ? 'Held by' : 'Was held by'}>
          <Text bold testID="tag-holder">{tag.holder.name}</Text>
          {tag.contactPhone && tag.status === 'live' ? (
            <Link href={telHref(tag.contactPhone)} asChild>
              <Pressable accessibilityRole="link" accessibilityLabel={`Call ${tag.holder.name} on ${tag.contactPhone}`} style={StyleSheet.flatten([styles.link, styles.call])} testID="tag-call">
                <MaterialCommunityIcons name="phone" size={20} color={colors.brand} />
                <Text bold style={styles.linkText}>{`Call ${tag.contactPhone}`}</Text>
              </Pressable>
            </Link>
          ) : tag.status === 'live' ? <Text variant="small" muted>No contact phone given.</Text> : null}
        </Line>
        <Line wide={isWide} icon="tag-outline" label="Raised">{`${formatInZone(tag.raisedAt, tz, now)} by ${tag.raisedBy.name}`}</Line>
        {tag.status === 'live' ? (
          <Line wide={isWide} icon="calendar-clock" label="Expires">
            <Text bold={overdue}>{formatInZone(tag.expiresAt, tz, now)}</Text>
            <Text variant="small" bold testID="tag-expiry-relative">{expiryPhrase(tag.expiresAt, now)}</Text>
          </Line>
        ) : (
          <Line wide={isWide} icon="lock-open-check-outline" label="Cleared">{`${tag.clearedAt ? formatInZone(tag.clearedAt, tz, now) : '—'} by ${tag.clearedBy?.name ?? 'Unknown'}`}</Line>
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  notProved: { padding: space.sm },
  frame: { borderWidth: 3, borderRadius: radius.lg, overflow: 'hidden', backgroundColor: colors.surface },
  plate: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md },
  overdue: { flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.md, backgroundColor: colors.mandatory },
  body: { padding: space.md, gap: space.md },
  bodyWide: { flexDirection: 'row', flexWrap: 'wrap' },
  line: { flexDirection: 'row', gap: space.md },
  lineWide: { flexBasis: '45%', flexGrow: 1 },
  link: { minHeight: layout.minTouch, justifyContent: 'center', alignSelf: 'flex-start' },
  call: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  linkText: { color: colors.brand, textDecorationLine: 'underline' },
});
