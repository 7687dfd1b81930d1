import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import type { PlantRoom } from '@/shared/types/register';

export function PlantRoomList({ rooms }: { rooms: PlantRoom[] }) {
  const { isWide } = useBreakpoints();
  if (rooms.length === 0) return <EmptyState icon="door-open" title="No plant rooms yet">Add the first plant room at this site.</EmptyState>;
  return (
    <View style={[styles.grid, isWide && styles.gridWide]}>
      {rooms.map((r) => (
        <Link key={r.id} href={`/plant-rooms/${r.id}`} asChild>
          <Pressable style={StyleSheet.flatten([styles.tile, isWide && styles.tileWide])} accessibilityRole="link" accessibilityLabel={r.name} testID={`plant-room-${r.id}`}>
            <MaterialCommunityIcons name="door-open" size={30} color={colors.brand} />
            <View style={{ flex: 1, minWidth: 0 }}>
              <Text bold numberOfLines={1}>{r.name}</Text>
              {r.floorArea ? <Text variant="small" muted numberOfLines={1}>{r.floorArea}</Text> : null}
              <Text variant="small">{`${r.assetCount} ${r.assetCount === 1 ? 'item' : 'items'}`}</Text>
              <View style={styles.live} testID={`plant-room-live-${r.id}`}>
                <MaterialCommunityIcons name={r.liveTagCount ? 'tag-multiple' : 'tag-off-outline'} size={18} color={colors.ink} />
                <Text variant="small" bold={r.liveTagCount > 0}>{r.liveTagCount ? `${r.liveTagCount} live ${r.liveTagCount === 1 ? 'tag' : 'tags'}` : 'No live tags'}</Text>
              </View>
            </View>
            <MaterialCommunityIcons name="chevron-right" size={28} color={colors.inkMuted} />
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.sm },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  tile: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.md, minHeight: layout.minTouch + 20 },
  live: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  tileWide: { flexBasis: 320, flexGrow: 1, maxWidth: '50%' },
});
