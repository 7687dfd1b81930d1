import { MaterialCommunityIcons } from '@/components/ui/icons';
import { View } from 'react-native';
import Svg, { Line } from 'react-native-svg';
import { colors, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { MEDIUM_ICONS, MEDIUM_LINES } from '@/components/connections/connection-vocabulary';
import { STATE_LOOK } from '@/components/tags/tag-vocabulary';
import { MEDIA, MEDIUM_LABELS } from '@/shared/rules/connections';
import type { PlantRoomDiagram } from '@/shared/types/connections';

/** What the lines and marks mean: each medium shown has its own line style, glyph and name. */
export function DiagramLegend({ diagram }: { diagram: PlantRoomDiagram }) {
  const media = MEDIA.filter((m) => diagram.connections.some((c) => c.medium === m));
  return (
    <View style={{ gap: space.xs }} testID="diagram-legend">
      <Text variant="label" bold>Key</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.md }}>
        {media.map((m) => (
          <View key={m} style={{ flexDirection: 'row', alignItems: 'center', gap: space.xs }}>
            <Svg width={36} height={10}><Line x1={0} y1={5} x2={36} y2={5} stroke={MEDIUM_LINES[m].stroke} strokeWidth={2.5} strokeDasharray={MEDIUM_LINES[m].dash} /></Svg>
            <MaterialCommunityIcons name={MEDIUM_ICONS[m]} size={18} color={colors.ink} />
            <Text variant="small">{MEDIUM_LABELS[m]}</Text>
          </View>
        ))}
      </View>
      <Text variant="small" muted>{`Arrows point from the supplying item to the item it supplies. States: ${(['normal', 'isolated', 'overridden', 'overdue'] as const).map((s) => STATE_LOOK[s].word).join(', ')}. A dashed box is an item in another room.`}</Text>
    </View>
  );
}
