import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import type { Site } from '@/shared/types/register';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Sites as large tiles to browse from: site → plant rooms → items. */
export function SiteList({ sites }: { sites: Site[] }) {
  const { isWide } = useBreakpoints();
  if (sites.length === 0) return <EmptyState icon="office-building-outline" title="No sites yet">A supervisor adds the sites your team looks after.</EmptyState>;
  return (
    <View style={[styles.grid, isWide && styles.gridWide]}>
      {sites.map((s) => (
        <Link key={s.id} href={`/sites/${s.id}`} asChild>
          <Pressable style={StyleSheet.flatten([styles.tile, isWide && styles.tileWide])} accessibilityRole="link" accessibilityLabel={s.name} testID={`site-${s.id}`}>
            <MaterialCommunityIcons name="office-building-outline" size={30} color={colors.brand} />
            <View style={{ flex: 1, minWidth: 0 }}>
              <Text bold numberOfLines={1}>{s.name}</Text>
              {s.address ? <Text variant="small" muted numberOfLines={1}>{s.address}</Text> : null}
              <Text variant="small">{`${plural(s.plantRoomCount, 'plant room', 'plant rooms')} · ${plural(s.assetCount, 'item', 'items')}`}</Text>
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
  tileWide: { flexBasis: 320, flexGrow: 1, maxWidth: '50%' },
});
