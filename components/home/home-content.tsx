import { MaterialCommunityIcons } from '@expo/vector-icons';
import { Link } from 'expo-router';
import type { ComponentProps } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { EngineerHome } from '@/components/home/engineer-home';
import { may } from '@/shared/rules/permissions';
import type { User } from '@/shared/types/user';

interface Action {
  href: string;
  title: string;
  detail: string;
  icon: ComponentProps<typeof MaterialCommunityIcons>['name'];
}

const ENGINEER: Action[] = [
  { href: '/scan', title: 'Scan a plant label', detail: 'Open an item from its QR label or type its code.', icon: 'qrcode-scan' },
  { href: '/assets', title: 'Find plant', detail: 'Search sites, plant rooms and items.', icon: 'magnify' },
];
const SUPERVISOR: Action[] = [
  { href: '/board', title: 'Live tags board', detail: 'Every live isolation and override across your sites.', icon: 'view-dashboard-outline' },
  { href: '/assets', title: 'Plant register', detail: 'Sites, plant rooms and items.', icon: 'file-tree-outline' },
  { href: '/scan', title: 'Scan a plant label', detail: 'Open an item from its QR label.', icon: 'qrcode-scan' },
];
const VIEWER: Action[] = [
  { href: '/board', title: 'Live tags board', detail: 'Read-only view of the sites you are given.', icon: 'view-dashboard-outline' },
  { href: '/assets', title: 'Plant register', detail: 'Read-only view of sites and plant.', icon: 'file-tree-outline' },
];

const HEADINGS: Record<User['role'], string> = {
  engineer: 'On site today',
  supervisor: 'Supervision',
  admin: 'Supervision and team',
  viewer: 'Overview',
};

export function HomeContent({ user }: { user: User }) {
  const { isWide } = useBreakpoints();
  const actions = user.role === 'engineer' ? ENGINEER : user.role === 'viewer' ? VIEWER : SUPERVISOR;
  return (
    <View style={{ gap: space.lg }} testID={`home-${user.role}`}>
      <Text variant="title">{HEADINGS[user.role]}</Text>
      <View style={[styles.grid, isWide && styles.gridWide]}>
        {actions.map((a) => (
          <Link key={a.href} href={a.href as never} asChild>
            <Pressable style={StyleSheet.flatten([styles.tile, isWide && styles.tileWide])} accessibilityRole="link">
              <MaterialCommunityIcons name={a.icon} size={32} color={colors.brand} />
              <View style={{ flex: 1 }}>
                <Text bold>{a.title}</Text>
                <Text muted variant="small">{a.detail}</Text>
              </View>
              <MaterialCommunityIcons name="chevron-right" size={28} color={colors.inkMuted} />
            </Pressable>
          </Link>
        ))}
      </View>
      {may(user, 'recordVisits') ? <EngineerHome /> : null}
      {user.role !== 'viewer' ? (
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
