import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import type { Tag, TagPoint } from '@/shared/types/tags';

/** The words every isolation point carries, wherever it is shown. */
const pointWarningText = (forPlantId: string, holderName: string) => `Do not operate — point of an isolation on ${forPlantId} held by ${holderName}`;

/** An item used as an isolation point of a live tag: a danger line that opens the item. */
export function PointWarning({ point, tag }: { point: TagPoint; tag: Tag }) {
  if (!point.asset) return null;
  return (
    <Link href={`/assets/${point.asset.id}`} asChild>
      <Pressable style={styles.box} accessibilityRole="link" testID={`point-warning-${point.asset.id}`}>
        <MaterialCommunityIcons name="hand-back-left-off" size={22} color={colors.danger} />
        <View style={{ flex: 1 }}>
          <Text variant="small" bold>{`${point.asset.plantId} · ${point.asset.name} (${ISOLATION_METHOD_LABELS[point.method].toLowerCase()})`}</Text>
          <Text variant="small">{pointWarningText(tag.asset.plantId, tag.holder.name)}</Text>
        </View>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', gap: space.sm, alignItems: 'center', padding: space.sm, borderRadius: radius.sm, borderWidth: 2, borderColor: colors.danger, backgroundColor: colors.dangerSoft, minHeight: layout.minTouch },
});
