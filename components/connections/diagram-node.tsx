import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { NODE_SIZE, type PlacedItem } from '@/components/connections/diagram-layout';
import { ASSET_TYPE_ICONS } from '@/components/register/register-vocabulary';
import { STATE_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';

/** An item in the diagram: type glyph and plant ID, its state in a word with its own glyph; tap opens the item. */
export function DiagramNode({ placed, onOpen }: { placed: PlacedItem; onOpen: (id: number) => void }) {
  const { item } = placed;
  const look = STATE_LOOK[item.overdue ? 'overdue' : item.state];
  const tone = TONE_COLORS[look.tone];
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={`${item.plantId} ${item.name}: ${look.word}${item.inRoom ? '' : ', in another room'}`}
      onPress={() => onOpen(item.id)}
      testID={`diagram-item-${item.plantId}`}
      style={({ pressed }) => [styles.node, { left: placed.x, top: placed.y, borderStyle: item.inRoom ? 'solid' : 'dashed', opacity: pressed ? 0.8 : 1 }]}
    >
      <View style={styles.row}>
        <MaterialCommunityIcons name={ASSET_TYPE_ICONS[item.type]} size={20} color={colors.ink} />
        <Text bold numberOfLines={1} style={{ flex: 1 }}>{item.plantId}</Text>
      </View>
      <Text variant="small" numberOfLines={1} muted>{item.inRoom ? item.name : `${item.name} (other room)`}</Text>
      <View style={[styles.state, { backgroundColor: item.state === 'normal' && !item.overdue ? tone.soft : tone.solid }]}>
        <MaterialCommunityIcons name={look.icon} size={16} color={item.state === 'normal' && !item.overdue ? colors.safe : tone.onSolid} />
        <Text variant="small" bold style={{ color: item.state === 'normal' && !item.overdue ? colors.ink : tone.onSolid }}>{look.word}</Text>
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  node: {
    position: 'absolute', width: NODE_SIZE.width, height: NODE_SIZE.height, padding: space.xs, gap: 2,
    backgroundColor: colors.surface, borderColor: colors.ink, borderWidth: 2, borderRadius: radius.md,
  },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  state: { flexDirection: 'row', alignItems: 'center', alignSelf: 'flex-start', gap: 2, paddingHorizontal: space.xs, borderRadius: radius.pill },
});
