import type { EnergySource } from '@/shared/rules/register';
import type { Photo } from '@/shared/types/register';
import type { IsolationMethod, ReleaseCheck, TagEventType, TagKind, TagStatus } from '@/shared/rules/tags';

export interface PersonRef {
  id: number;
  name: string;
}

export interface TagPoint {
  id: number;
  assetId: number | null;
  asset: { id: number; plantId: string; name: string } | null;
  description: string;
  method: IsolationMethod;
}

export interface TagEvent {
  id: number;
  type: TagEventType;
  at: string;
  by: PersonRef;
  /** Event details: reason, previous/new expiry, from/to holder, note text, checks, contact attempts… */
  data: Record<string, unknown>;
}

export interface Tag {
  id: number;
  assetId: number;
  asset: { id: number; plantId: string; name: string; siteId: number; siteName: string; plantRoomName: string | null; timeZone: string };
  kind: TagKind;
  status: TagStatus;
  overdue: boolean;
  dueSoon: boolean;
  reason: string;
  /** The person who holds the tag now (the raiser, or whoever took it over). */
  author: PersonRef;
  /** Same as author.id; lets the shared rules (clearancePermission, mayExtend, mayTakeOver) take a tag as it is. */
  holderId: number;
  raisedBy: PersonRef;
  raisedAt: string;
  expiresAt: string;
  contactPhone: string;
  lockNumber: string;
  energySources: EnergySource[];
  points: TagPoint[];
  normalState: string;
  leftState: string;
  clearedAt: string | null;
  clearedBy: PersonRef | null;
  checks: Partial<Record<ReleaseCheck, boolean>> | null;
  photoCount: number;
  /** Single tag only: photos of the lock or tag in place. */
  photos?: Photo[];
  events?: TagEvent[];
}

/** Shown on an item used as an isolation point for work on another item. */
export interface PointUse {
  tagId: number;
  method: IsolationMethod;
  forAsset: { id: number; plantId: string; name: string };
  holder: PersonRef;
}
