import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { isolatedLabel, summaryOf, type StateSource } from '@/components/tags/tag-summary';
import { STATE_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import { useNow } from '@/components/tags/use-now';
import type { AssetTagSummary } from '@/shared/rules/tags';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function detail(s: AssetTagSummary): string {
  if (s.state === 'isolated') {
    const group = s.liveIsolations > 1 ? ' Group isolation: it stays isolated until the last tag is cleared.' : '';
    const overrides = s.liveOverrides ? ` Also ${plural(s.liveOverrides, 'live override', 'live overrides')}.` : '';
    const unproved = s.unprovedIsolations ? ` ${s.unprovedIsolations === s.liveIsolations ? 'Not proved' : `${s.unprovedIsolations} not proved`}: no proof of isolation recorded yet.` : '';
    return `${plural(s.liveIsolations, 'live isolation tag', 'live isolation tags')}. ${STATE_LOOK.isolated.meaning}${group}${overrides}${unproved}`;
  }
  if (s.state === 'overridden') return `${plural(s.liveOverrides, 'live override', 'live overrides')}. ${STATE_LOOK.overridden.meaning}`;
  return STATE_LOOK.normal.meaning;
}

/**
 * The item's state at a glance, at the top of its record: a glyph tile, the state in one word and what it means.
 * An overdue tag adds a second, blue strip: someone has to act on it.
 */
export function AssetStateBanner(props: StateSource) {
  const now = useNow();
  const s = summaryOf(props, now);
  const look = STATE_LOOK[s.state];
  const tone = TONE_COLORS[look.tone];
  const word = s.state === 'isolated' ? isolatedLabel(s.liveIsolations) : look.word;
  return (
    <View style={[styles.frame, { borderColor: tone.solid }]} testID="asset-state-banner" accessibilityRole="summary" accessibilityLabel={`Item state: ${word}${s.overdue ? ', overdue' : ''}`}>
      <View style={[styles.row, { backgroundColor: tone.soft }]}>
        <View style={[styles.tile, { backgroundColor: tone.solid }]}>
          <MaterialCommunityIcons name={look.icon} size={34} color={tone.onSolid} />
        </View>
        <View style={styles.words}>
          <Text variant="small" bold muted>ITEM STATE</Text>
          <Text variant="heading" testID="asset-state-word">{word}</Text>
          <Text>{detail(s)}</Text>
        </View>
      </View>
      {s.overdue ? (
        <View style={[styles.overdue, { backgroundColor: TONE_COLORS.mandatory.solid }]} testID="asset-state-overdue">
          <MaterialCommunityIcons name={STATE_LOOK.overdue.icon} size={24} color={colors.brandInk} />
          <Text bold style={{ color: colors.brandInk, flex: 1 }}>{`${STATE_LOOK.overdue.word} — ${STATE_LOOK.overdue.meaning}`}</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { borderWidth: 3, borderRadius: radius.lg, overflow: 'hidden', backgroundColor: colors.surface },
  row: { flexDirection: 'row', alignItems: 'stretch' },
  tile: { width: 72, alignItems: 'center', justifyContent: 'center' },
  words: { flex: 1, padding: space.md, gap: 2 },
  overdue: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.md, paddingVertical: space.sm },
});
