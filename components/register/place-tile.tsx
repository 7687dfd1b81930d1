import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link, type Href } from 'expo-router';
import type { ComponentProps, ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Text } from '@/components/ui/text';

/** Large tiles of places to browse from (sites, plant rooms): two to a row on a wide screen. */
export function PlaceGrid({ children }: { children: ReactNode }) {
  const { isWide } = useBreakpoints();
  return <View style={[styles.grid, isWide && styles.gridWide]}>{children}</View>;
}

/** One place: its icon, its name, a muted line and what it holds, as a link. */
export function PlaceTile({ href, icon, name, detail, testID, children }: {
  href: Href;
  icon: ComponentProps<typeof MaterialCommunityIcons>['name'];
  name: string;
  detail?: string | null;
  testID: string;
  children: ReactNode;
}) {
  const { isWide } = useBreakpoints();
  return (
    <Link href={href} asChild>
      <Pressable style={StyleSheet.flatten([styles.tile, isWide && styles.tileWide])} accessibilityRole="link" accessibilityLabel={name} testID={testID}>
        <MaterialCommunityIcons name={icon} size={30} color={colors.brand} />
        <View style={{ flex: 1, minWidth: 0 }}>
          <Text bold numberOfLines={1}>{name}</Text>
          {detail ? <Text variant="small" muted numberOfLines={1}>{detail}</Text> : null}
          {children}
        </View>
        <MaterialCommunityIcons name="chevron-right" size={28} color={colors.inkMuted} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.sm },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  tile: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.md, minHeight: layout.minTouch + 20 },
  tileWide: { flexBasis: 320, flexGrow: 1, maxWidth: '50%' },
});
