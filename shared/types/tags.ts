import type { EnergySource } from '@/shared/rules/register';
import type { Photo } from '@/shared/types/register';
import type { IsolationMethod, ReleaseCheck, TagEventType, TagKind, TagStatus } from '@/shared/rules/tags';
import type { OmittedSource, ProofMethod } from '@/shared/rules/tag-isolation';

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
  /** The lock or tag number on this point when it has its own ('' = the tag's lock). */
  lockNumber: string;
}

/** A record that the isolation was proved before work (OSHA 29 CFR 1910.147(d)(6)). */
export interface TagProof {
  id: number;
  method: ProofMethod;
  instrument: string;
  reading: string;
  note: string;
  by: PersonRef;
  at: string;
}

/** An open hand-over offer: the holder has named a colleague, who has not yet accepted. */
export interface HandoverOffer {
  to: PersonRef;
  note: string;
  offeredAt: string;
  lapsesAt: string;
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
  /** The person who holds the tag now (the raiser, or whoever accepted it in a hand-over or reassignment). */
  holder: PersonRef;
  /** Same as holder.id; lets the shared rules (clearancePermission, mayExtend, handoverRole) take a tag as it is. */
  holderId: number;
  raisedBy: PersonRef;
  raisedAt: string;
  expiresAt: string;
  contactPhone: string;
  lockNumber: string;
  energySources: EnergySource[];
  /** The item's sources this isolation leaves out, each with the reason. */
  omittedSources: OmittedSource[];
  points: TagPoint[];
  /** Isolations: false until a proof is recorded ("not proved"). Overrides: null (nothing to prove). */
  proved: boolean | null;
  proofs: TagProof[];
  handoverOffer: HandoverOffer | null;
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
  /** The lock on this point: its own number, else the tag's. */
  lockNumber: string;
  forAsset: { id: number; plantId: string; name: string };
  holder: PersonRef;
}

/** Something that happened to the caller's tag while they were away; they acknowledge it before doing anything else. */
export interface TagNotice {
  id: number;
  tagId: number;
  kind: 'cleared-in-absence' | 'reassigned-in-absence';
  at: string;
  by: PersonRef;
  reason: string;
  asset: { id: number; plantId: string; name: string };
}
