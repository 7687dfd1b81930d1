import { may } from '@/shared/rules/permissions';
import type { Role } from '@/shared/rules/roles';

export const TAG_KINDS = ['isolation', 'override'] as const;
export type TagKind = (typeof TAG_KINDS)[number];

export const TAG_STATUSES = ['live', 'cleared'] as const;
export type TagStatus = (typeof TAG_STATUSES)[number];

export const ISOLATION_METHODS = ['valve-locked', 'isolator-locked', 'fuse-withdrawn', 'blank-fitted', 'disconnected', 'other'] as const;
export type IsolationMethod = (typeof ISOLATION_METHODS)[number];

export const ISOLATION_METHOD_LABELS: Record<IsolationMethod, string> = {
  'valve-locked': 'Valve locked shut',
  'isolator-locked': 'Isolator locked off',
  'fuse-withdrawn': 'Fuse withdrawn',
  'blank-fitted': 'Blank or spade fitted',
  disconnected: 'Disconnected and capped',
  other: 'Other (described)',
};

const TAG_EVENT_TYPES = [
  'raised', 'proved', 'extended', 'handover-offered', 'handover-withdrawn', 'handed-over', 'reassigned-in-absence',
  'note-added', 'photo-added', 'cleared', 'cleared-in-absence', 'acknowledged',
] as const;
export type TagEventType = (typeof TAG_EVENT_TYPES)[number];

export const TAG_EVENT_LABELS: Record<TagEventType, string> = {
  raised: 'Raised',
  proved: 'Isolation proved',
  extended: 'Expiry extended',
  'handover-offered': 'Hand-over offered',
  'handover-withdrawn': 'Hand-over offer withdrawn',
  'handed-over': 'Handed over and accepted',
  'reassigned-in-absence': 'Reassigned in the holder’s absence',
  'note-added': 'Note added',
  'photo-added': 'Photo added',
  cleared: 'Cleared',
  'cleared-in-absence': 'Cleared in the holder’s absence',
  acknowledged: 'Holder acknowledged',
};

/** Release checks recorded when an isolation is cleared (OSHA 29 CFR 1910.147(e)(1)–(e)(2)). */
export const RELEASE_CHECKS = ['workComplete', 'guardsRefitted', 'personnelClear', 'testedSafe'] as const;
export type ReleaseCheck = (typeof RELEASE_CHECKS)[number];

export const RELEASE_CHECK_LABELS: Record<ReleaseCheck, string> = {
  workComplete: 'Work complete; tools and materials removed',
  guardsRefitted: 'Guards, covers and panels refitted',
  personnelClear: 'Everyone affected told, and clear of the item',
  testedSafe: 'Item tested and safe to return to service',
};

/** A clearance must say why, in words: blank, whitespace or fewer than this many characters are refused. */
export const MIN_CLEARANCE_REASON = 10;
export const MIN_RAISE_REASON = 5;
/** Engineers may set an expiry at most this far ahead; supervisors and admins up to MAX_EXPIRY_DAYS_SUPERVISOR. */
const MAX_EXPIRY_DAYS_ENGINEER = 14;
const MAX_EXPIRY_DAYS_SUPERVISOR = 90;
/** Due soon: expiring within this many hours. */
export const DUE_SOON_HOURS = 24;

export interface TagLike {
  kind: TagKind;
  status: TagStatus;
  expiresAt: string | Date;
  holderId: number;
  /** Isolations only: a proof of the isolation has been recorded (OSHA 29 CFR 1910.147(d)(6)). */
  proved?: boolean | null;
}

const ms = (t: string | Date) => (t instanceof Date ? t.getTime() : Date.parse(t));

/**
 * A live tag past its expiry is overdue. It stays live: a tag never clears itself
 * (common practice, no published source: an expired tag still marks a hazard until a person clears it).
 */
export function isOverdue(tag: Pick<TagLike, 'status' | 'expiresAt'>, now: Date): boolean {
  return tag.status === 'live' && ms(tag.expiresAt) < now.getTime();
}

export function isDueSoon(tag: Pick<TagLike, 'status' | 'expiresAt'>, now: Date): boolean {
  const left = ms(tag.expiresAt) - now.getTime();
  return tag.status === 'live' && left >= 0 && left <= DUE_SOON_HOURS * 3600_000;
}

export type AssetState = 'isolated' | 'overridden' | 'normal';

export interface AssetTagSummary {
  state: AssetState;
  liveIsolations: number;
  liveOverrides: number;
  /** Live isolations with no proof recorded yet ("not proved"). */
  unprovedIsolations: number;
  overdue: boolean;
}

/**
 * The item's state from its tags: isolated while any isolation tag is live (group isolation: until the last
 * one is cleared, OSHA 29 CFR 1910.147(f)(3)), else overridden while any override is live, else normal.
 */
export function assetStateFromTags(tags: Pick<TagLike, 'kind' | 'status' | 'expiresAt' | 'proved'>[], now: Date): AssetTagSummary {
  const live = tags.filter((t) => t.status === 'live');
  const liveIsolations = live.filter((t) => t.kind === 'isolation').length;
  const liveOverrides = live.filter((t) => t.kind === 'override').length;
  return {
    state: liveIsolations > 0 ? 'isolated' : liveOverrides > 0 ? 'overridden' : 'normal',
    liveIsolations,
    liveOverrides,
    unprovedIsolations: live.filter((t) => t.kind === 'isolation' && !t.proved).length,
    overdue: live.some((t) => isOverdue(t, now)),
  };
}

/** The longer expiry limit goes with overseeing tags (`superviseTags` in shared/rules/permissions.ts). */
export function maxExpiryDays(role: Role): number {
  return may({ role }, 'superviseTags') ? MAX_EXPIRY_DAYS_SUPERVISOR : MAX_EXPIRY_DAYS_ENGINEER;
}

/** Why an expiry is not acceptable, or null. Computed with the server's clock on the server. */
export function expiryProblem(expiresAt: Date, now: Date, role: Role): string | null {
  if (Number.isNaN(expiresAt.getTime())) return 'Give a valid expiry date and time.';
  if (expiresAt.getTime() <= now.getTime()) return 'The expiry must be in the future.';
  const days = maxExpiryDays(role);
  if (expiresAt.getTime() - now.getTime() > days * 86400_000) return `The expiry may be at most ${days} days ahead for your role.`;
  return null;
}

export function clearanceReasonProblem(reason: unknown): string | null {
  const text = typeof reason === 'string' ? reason.trim() : '';
  if (!text) return 'State the reason for clearing this tag.';
  if (text.length < MIN_CLEARANCE_REASON) return `The reason must be at least ${MIN_CLEARANCE_REASON} characters: say what was done and why the tag can come off.`;
  return null;
}
