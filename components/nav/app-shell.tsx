import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, layout, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Text } from '@/components/ui/text';
import { BrandMark } from '@/components/nav/brand-mark';
import { isActive, navItemsFor } from '@/components/nav/nav-items';
import type { User } from '@/shared/types/user';
import { ROLE_LABELS } from '@/shared/rules/roles';

/** Bottom tabs on phones; a side navigation from layout.wideFrom. */
export function AppShell({ user, children }: { user: User; children: ReactNode }) {
  const { isWide } = useBreakpoints();
  const pathname = usePathname();
  const insets = useSafeAreaInsets();
  const items = navItemsFor(user);

  if (isWide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.side} role="navigation">
          <View style={styles.sideBrand}>
            <BrandMark size={36} />
            <Text variant="title" style={{ color: colors.paper }}>Isoledger</Text>
          </View>
          {items.map((item) => {
            const active = isActive(pathname, item.href);
            return (
              <Link key={item.href} href={item.href} asChild>
                <Pressable style={StyleSheet.flatten([styles.sideItem, active && styles.sideItemActive])} accessibilityRole="link" accessibilityState={{ selected: active }}>
                  <MaterialCommunityIcons name={item.icon} size={24} color={active ? colors.ink : colors.paper} />
                  <Text bold={active} style={{ color: active ? colors.ink : colors.paper }}>{item.label}</Text>
                </Pressable>
              </Link>
            );
          })}
          <View style={styles.sideUser}>
            <Text bold style={{ color: colors.paper }}>{user.name}</Text>
            <Text variant="small" style={{ color: colors.surfaceSunk }}>{ROLE_LABELS[user.role]}</Text>
            <Text variant="small" style={{ color: colors.surfaceSunk }}>{user.organisation.name}</Text>
          </View>
        </View>
        <View style={{ flex: 1 }}>{children}</View>
      </View>
    );
  }

  return (
    <View style={{ flex: 1, backgroundColor: colors.paper }}>
      <View style={{ flex: 1 }}>{children}</View>
      <View style={[styles.tabs, { paddingBottom: Math.max(insets.bottom, space.xs) }]} role="navigation">
        {items.map((item) => {
          const active = isActive(pathname, item.href);
          return (
            <Link key={item.href} href={item.href} asChild>
              <Pressable style={styles.tab} accessibilityRole="link" accessibilityState={{ selected: active }} accessibilityLabel={item.label}>
                <View style={[styles.tabIcon, active && styles.tabIconActive]}>
                  <MaterialCommunityIcons name={item.icon} size={24} color={active ? colors.ink : colors.paper} />
                </View>
                <Text variant="small" bold={active} style={{ color: colors.paper }}>{item.label}</Text>
              </Pressable>
            </Link>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  side: { width: layout.sideNavWidth, backgroundColor: colors.ink, paddingVertical: space.lg, paddingHorizontal: space.sm, gap: space.xs },
  sideBrand: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingHorizontal: space.sm, marginBottom: space.lg },
  sideItem: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouch, paddingHorizontal: space.md, borderRadius: 8 },
  // The current place is marked in a neutral tone: yellow and red are kept for caution and danger.
  sideItemActive: { backgroundColor: colors.paper },
  sideUser: { marginTop: 'auto', padding: space.sm, gap: 2, borderTopWidth: 1, borderTopColor: colors.inkMuted, paddingTop: space.md },
  tabs: { flexDirection: 'row', backgroundColor: colors.ink, paddingTop: space.xs },
  tab: { flex: 1, alignItems: 'center', minHeight: layout.minTouch + 12, justifyContent: 'center', gap: 2 },
  tabIcon: { paddingHorizontal: space.md, paddingVertical: 2, borderRadius: 999 },
  tabIconActive: { backgroundColor: colors.paper },
});
