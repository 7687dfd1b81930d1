import type { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { ROLES, ROLE_LABELS } from '@/shared/rules/roles';
import type { TeamMember } from '@/shared/types/team';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

export const ROLE_OPTIONS = ROLES.map((r) => ({ value: r, label: ROLE_LABELS[r] }));

/** A person's standing as a word and a glyph, never a colour alone. */
export function memberStatus(m: TeamMember): { word: string; icon: IconName; tone: 'safe' | 'neutral' | 'caution' } {
  if (!m.active) return { word: 'Deactivated', icon: 'account-off-outline', tone: 'neutral' };
  if (m.invitePending) return { word: 'Invitation pending', icon: 'email-fast-outline', tone: 'caution' };
  return { word: 'Active', icon: 'account-check-outline', tone: 'safe' };
}

/** Audit log event names in plain words (server/models/audit-event.model.ts AuditEventType). */
export const AUDIT_EVENT_LABELS: Record<string, { word: string; icon: IconName }> = {
  'sign-in': { word: 'Signed in', icon: 'login' },
  'sign-in-failed': { word: 'Failed sign-in', icon: 'account-alert-outline' },
  'sign-out': { word: 'Signed out', icon: 'logout' },
  'role-change': { word: 'Role changed', icon: 'account-switch-outline' },
  'user-deactivated': { word: 'Account deactivated', icon: 'account-off-outline' },
  'user-reactivated': { word: 'Account reactivated', icon: 'account-reactivate-outline' },
  'user-invited': { word: 'Invitation sent', icon: 'email-fast-outline' },
  'site-access-change': { word: 'Site access changed', icon: 'office-building-cog-outline' },
  'password-reset': { word: 'Password link', icon: 'key-outline' },
};

/** Outbox e-mail kinds (server/mail/outbox.ts MAIL_KINDS) in plain words. */
export const MAIL_KIND_LABELS: Record<string, string> = {
  'tag-raised': 'Tag raised e-mail',
  'tag-cleared': 'Tag cleared e-mail',
  'tag-cleared-in-absence': 'Cleared-in-absence e-mail',
  'my-tag-cleared-in-absence': 'Your-tag-cleared e-mail',
  'my-tag-handed-over': 'Your-tag-taken-over e-mail',
  digest: 'Morning digest',
  invite: 'Invitation',
  'password-reset': 'Password reset link',
};
