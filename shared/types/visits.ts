import type { TagEventType, TagKind } from '@/shared/rules/tags';
import type { VisitDecisionAction } from '@/shared/rules/visits';
import type { PersonRef } from '@/shared/types/tags';

export interface ItemRef {
  id: number;
  plantId: string;
  name: string;
}

/** Something done to a tag during a visit (or since a person's last visit). */
export interface TagActivity {
  tagId: number;
  type: TagEventType;
  at: string;
  by: PersonRef;
  kind: TagKind;
  reason: string;
  item: ItemRef;
  /** The note, clearance reason or extension reason given with it. */
  text: string | null;
}

export interface ReadingActivity {
  id: number;
  takenAt: string;
  by: PersonRef;
  item: ItemRef;
  /** Flag levels with their messages; empty when every check passed. */
  flags: { level: string; message: string }[];
  note: string;
}

export interface PhotoActivity {
  id: number;
  at: string;
  caption: string | null;
  /** What the photo is of, in words: an item, a plant room or a tag. */
  subject: string;
}

export interface VisitActivity {
  tagEvents: TagActivity[];
  readings: ReadingActivity[];
  photos: PhotoActivity[];
}

export interface VisitDecision {
  tagId: number;
  action: VisitDecisionAction;
  note: string;
  expiresAt: string | null;
  kind: TagKind;
  reason: string;
  item: ItemRef;
}

export interface Visit {
  id: number;
  site: { id: number; name: string; timeZone: string };
  person: PersonRef;
  purpose: string;
  jobReference: string;
  startedAt: string;
  endedAt: string | null;
  endNote: string | null;
  inProgress: boolean;
  /** Single visit only. */
  activity?: VisitActivity;
  decisions?: VisitDecision[];
}

/** What changed on a site or in a plant room since this person's last visit there. */
export interface SinceLastVisit {
  /** When the last visit ended; null when the person has not visited before. */
  since: string | null;
  /** The site's time zone, for showing the times as they were on site. */
  timeZone: string;
  raised: TagActivity[];
  cleared: TagActivity[];
  notes: TagActivity[];
  flaggedReadings: ReadingActivity[];
}

export interface RecentPlace {
  type: 'site' | 'plant-room';
  id: number;
  name: string;
  /** The site's name for a plant room. */
  siteName: string | null;
  openedAt: string;
  liveTagCount: number;
}
