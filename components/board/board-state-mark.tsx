import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { BOARD_STATE_LOOK } from '@/components/board/board-vocabulary';
import { TONE_COLORS } from '@/components/tags/tag-vocabulary';
import type { BoardState } from '@/shared/rules/board';

/** A row's state as icon and word on a coloured ground; overdue is solid so it stands out in a long list. */
export function BoardStateMark({ state, proved, testID }: { state: BoardState; proved?: boolean | null; testID?: string }) {
  const look = BOARD_STATE_LOOK[state];
  const tone = TONE_COLORS[look.tone];
  const solid = state === 'overdue';
  const fg = solid ? tone.onSolid : undefined;
  const mark = (
    <View style={[styles.mark, { backgroundColor: solid ? tone.solid : tone.soft, borderColor: tone.solid }]} testID={testID}>
      <MaterialCommunityIcons name={look.icon} size={18} color={fg ?? (look.tone === 'caution' ? colors.cautionInk : tone.solid)} />
      <Text variant="small" bold style={fg ? { color: fg } : undefined}>{look.word}</Text>
    </View>
  );
  if (proved !== false) return mark;
  // An isolation with no proof recorded (OSHA 29 CFR 1910.147(d)(6)): said in words beside the state, in caution yellow.
  return (
    <View style={{ gap: space.xs }}>
      {mark}
      <View style={[styles.mark, { backgroundColor: colors.cautionSoft, borderColor: colors.caution }]} testID={testID ? `${testID}-not-proved` : undefined}>
        <MaterialCommunityIcons name="alert" size={18} color={colors.cautionInk} />
        <Text variant="small" bold style={{ color: colors.cautionInk }}>Not proved</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  mark: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: space.xs, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 2 },
});
