import { MaterialCommunityIcons } from '@/components/ui/icons';
import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import { PlaceGrid, PlaceTile } from '@/components/register/place-tile';
import type { PlantRoom } from '@/shared/types/register';

export function PlantRoomList({ rooms }: { rooms: PlantRoom[] }) {
  if (rooms.length === 0) return <EmptyState icon="door-open" title="No plant rooms yet">Add the first plant room at this site.</EmptyState>;
  return (
    <PlaceGrid>
      {rooms.map((r) => (
        <PlaceTile key={r.id} href={`/plant-rooms/${r.id}`} icon="door-open" name={r.name} detail={r.floorArea} testID={`plant-room-${r.id}`}>
          <Text variant="small">{`${r.assetCount} ${r.assetCount === 1 ? 'item' : 'items'}`}</Text>
          <View style={styles.live} testID={`plant-room-live-${r.id}`}>
            <MaterialCommunityIcons name={r.liveTagCount ? 'tag-multiple' : 'tag-off-outline'} size={18} color={colors.ink} />
            <Text variant="small" bold={r.liveTagCount > 0}>{r.liveTagCount ? `${r.liveTagCount} live ${r.liveTagCount === 1 ? 'tag' : 'tags'}` : 'No live tags'}</Text>
          </View>
        </PlaceTile>
      ))}
    </PlaceGrid>
  );
}

const styles = StyleSheet.create({
  live: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
