import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link, type Href } from 'expo-router';
import type { ComponentProps } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { EngineerHome } from '@/components/home/engineer-home';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { RolePermission } from '@/shared/rules/permissions';
import type { User } from '@/shared/types/user';

interface Action {
  href: Href;
  title: string;
  /** What the tile says to someone who may act, and to someone who only reads. */
  detail: [string, string];
  icon: ComponentProps<typeof MaterialCommunityIcons>['name'];
  /** Shown to whoever holds this permission (shared/rules/permissions.ts). */
  permission: RolePermission;
}

// In this order: the board first for those who oversee, the scanner before the register for those who work on plant.
const ACTIONS: Action[] = [
  { href: '/board', title: 'Live tags board', detail: ['Every live isolation and override across your sites.', 'Read-only view of the sites you are given.'], icon: 'view-dashboard-outline', permission: 'viewBoard' },
  { href: '/scan', title: 'Scan a plant label', detail: ['Open an item from its QR label or type its code.', 'Open an item from its QR label.'], icon: 'qrcode-scan', permission: 'raiseTag' },
  { href: '/assets', title: 'Plant register', detail: ['Search sites, plant rooms and items.', 'Read-only view of sites and plant.'], icon: 'file-tree-outline', permission: 'viewRegister' },
];

// The heading says what the home is for, by the first of these the person may do.
const HEADINGS: [RolePermission, string][] = [['administerTeam', 'Supervision and team'], ['superviseTags', 'Supervision'], ['raiseTag', 'On site today']];

export function HomeContent({ user }: { user: User }) {
  const { isWide } = useBreakpoints();
  const { may } = usePermissions();
  const actions = ACTIONS.filter((a) => may(a.permission));
  const acts = may('raiseTag');
  const heading = HEADINGS.find(([p]) => may(p))?.[1] ?? 'Overview';
  return (
    <View style={{ gap: space.lg }} testID={`home-${user.role}`}>
      <Text variant="title">{heading}</Text>
      <View style={[styles.grid, isWide && styles.gridWide]}>
        {actions.map((a) => (
          <Link key={a.title} href={a.href} asChild>
            <Pressable style={StyleSheet.flatten([styles.tile, isWide && styles.tileWide])} accessibilityRole="link">
              <MaterialCommunityIcons name={a.icon} size={32} color={colors.brand} />
              <View style={{ flex: 1 }}>
                <Text bold>{a.title}</Text>
                <Text muted variant="small">{a.detail[acts ? 0 : 1]}</Text>
              </View>
              <MaterialCommunityIcons name="chevron-right" size={28} color={colors.inkMuted} />
            </Pressable>
          </Link>
        ))}
      </View>
      {may('recordVisits') ? <EngineerHome /> : null}
      {acts ? (
        <Notice tone="caution" title="Before you work on any plant">
          Isoledger records what has been isolated or overridden, by whom and why. It does not make anything safe. Follow the site's safe isolation procedure, isolate every energy source, lock and tag physically, and prove the isolation before work. Gas work only by a competent person registered as local law requires.
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.md },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  tile: { flexDirection: 'row', alignItems: 'center', gap: space.md, backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, minHeight: layout.minTouch + 24 },
  tileWide: { flexBasis: 340, flexGrow: 1 },
});
