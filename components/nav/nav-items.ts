import type { MaterialCommunityIcons } from '@expo/vector-icons';
import type { ComponentProps } from 'react';
import type { Role } from '@/shared/rules/roles';

export interface NavItem {
  href: string;
  label: string;
  icon: ComponentProps<typeof MaterialCommunityIcons>['name'];
  roles: Role[];
}

const everyone: Role[] = ['admin', 'supervisor', 'engineer', 'viewer'];

export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', icon: 'home-variant-outline', roles: everyone },
  { href: '/scan', label: 'Scan', icon: 'qrcode-scan', roles: everyone },
  { href: '/assets', label: 'Register', icon: 'file-tree-outline', roles: everyone },
  { href: '/board', label: 'Board', icon: 'view-dashboard-outline', roles: ['admin', 'supervisor', 'viewer'] },
  { href: '/team', label: 'Team', icon: 'account-group-outline', roles: ['admin'] },
  { href: '/settings', label: 'Settings', icon: 'account-cog-outline', roles: everyone },
];

// Screens that belong to a tab without living under its path (the register's sites and plant rooms).
const ALSO_UNDER: Record<string, string[]> = { '/assets': ['/sites', '/plant-rooms'] };

const under = (pathname: string, href: string) => pathname === href || pathname.startsWith(`${href}/`);

export const isActive = (pathname: string, href: string) =>
  href === '/' ? pathname === '/' : under(pathname, href) || (ALSO_UNDER[href] ?? []).some((h) => under(pathname, h));
