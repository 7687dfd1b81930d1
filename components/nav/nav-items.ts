import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import type { Href } from 'expo-router';
import { may, type Actor, type RolePermission } from '@/shared/rules/permissions';

export interface NavItem {
  href: Href & string;
  label: string;
  icon: ComponentProps<typeof MaterialCommunityIcons>['name'];
  /** Shown to whoever holds this permission (shared/rules/permissions.ts). */
  permission: RolePermission;
}

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', icon: 'home-variant-outline', permission: 'viewRegister' },
  { href: '/scan', label: 'Scan', icon: 'qrcode-scan', permission: 'viewRegister' },
  { href: '/assets', label: 'Register', icon: 'file-tree-outline', permission: 'viewRegister' },
  { href: '/board', label: 'Board', icon: 'view-dashboard-outline', permission: 'viewBoard' },
  { href: '/team', label: 'Team', icon: 'account-group-outline', permission: 'administerTeam' },
  { href: '/settings', label: 'Settings', icon: 'account-cog-outline', permission: 'viewRegister' },
];

/** The navigation a signed-in person gets. */
export const navItemsFor = (actor: Pick<Actor, 'role'>) => NAV_ITEMS.filter((i) => may(actor, i.permission));

// Screens that belong to a tab without living under its path (the register's sites and plant rooms).
const ALSO_UNDER: Record<string, string[]> = { '/assets': ['/sites', '/plant-rooms'] };

const under = (pathname: string, href: string) => pathname === href || pathname.startsWith(`${href}/`);

export const isActive = (pathname: string, href: string) =>
  href === '/' ? pathname === '/' : under(pathname, href) || (ALSO_UNDER[href] ?? []).some((h) => under(pathname, h));
