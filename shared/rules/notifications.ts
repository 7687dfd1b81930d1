import { may } from '@/shared/rules/permissions';
import type { Role } from '@/shared/rules/roles';

/**
 * E-mails a person can choose to receive. `raised`/`cleared`: a tag was raised, cleared or cleared in absence
 * anywhere in the organisation; `digest`: the morning list of overdue and due-today tags; `myTags`: a tag you
 * hold was cleared in your absence or taken over by someone else.
 */
export const NOTIFICATION_KEYS = ['raised', 'cleared', 'digest', 'myTags'] as const;
export type NotificationKey = (typeof NOTIFICATION_KEYS)[number];

export const NOTIFICATION_LABELS: Record<NotificationKey, string> = {
  raised: 'A tag is raised on any site',
  cleared: 'A tag is cleared, or cleared in the holder’s absence',
  digest: 'Morning list of overdue and due-today tags (07:00 site time)',
  myTags: 'A tag I hold is cleared in my absence or taken over',
};

/** Which of the e-mails a role can receive at all; the others are never sent to it. */
export function notificationsForRole(role: Role): NotificationKey[] {
  if (may({ role }, 'receiveOrganisationMail')) return [...NOTIFICATION_KEYS];
  if (may({ role }, 'receiveOwnTagMail')) return ['myTags'];
  return [];
}

/** Local hour at which each site's morning digest goes out. */
export const DIGEST_HOUR = 7;
/** A digest not sent by this local hour (server down all morning) is skipped for the day rather than sent late. */
export const DIGEST_LAST_HOUR = 12;

/** One-time link lifetimes. */
export const INVITE_TTL_HOURS = 7 * 24;
export const RESET_TTL_HOURS = 1;
export const MIN_PASSWORD_LENGTH = 10;
/** bcrypt uses only the first 72 bytes of a password (OpenBSD bcrypt(3)); longer ones are refused, not cut. */
export const MAX_PASSWORD_BYTES = 72;
/** UTF-8 length, as bcrypt counts it. */
export const passwordBytes = (password: string) => new TextEncoder().encode(password).length;
