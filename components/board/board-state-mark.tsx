import { MaterialCommunityIcons } from '@expo/vector-icons';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { BOARD_STATE_LOOK } from '@/components/board/board-vocabulary';
import { TONE_COLORS } from '@/components/tags/tag-vocabulary';
import type { BoardState } from '@/shared/rules/board';

/** A row's state as icon and word on a coloured ground; overdue is solid so it stands out in a long list. */
export function BoardStateMark({ state, testID }: { state: BoardState; testID?: string }) {
  const look = BOARD_STATE_LOOK[state];
  const tone = TONE_COLORS[look.tone];
  const solid = state === 'overdue';
  const fg = solid ? tone.onSolid : undefined;
  return (
    <View style={[styles.mark, { backgroundColor: solid ? tone.solid : tone.soft, borderColor: tone.solid }]} testID={testID}>
      <MaterialCommunityIcons name={look.icon} size={18} color={fg ?? (look.tone === 'caution' ? colors.cautionInk : tone.solid)} />
      <Text variant="small" bold style={fg ? { color: fg } : undefined}>{look.word}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  mark: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: space.xs, paddingHorizontal: space.sm, paddingVertical: 2, borderRadius: radius.sm, borderWidth: 2 },
});
