import type { BoardState } from '@/shared/rules/board';
import type { TagKind } from '@/shared/rules/tags';
import type { PersonRef } from '@/shared/types/tags';

/** Query of `GET /api/board` and `GET /api/board.csv`; every field optional. */
export interface BoardQuery {
  siteId?: number;
  kind?: TagKind;
  /** The person who holds the tag now. */
  holderId?: number;
  /** Matches the row's state exactly; leave out for every live tag. */
  state?: BoardState;
  /** Words matched against plant ID, item name, reason and holder name. */
  q?: string;
  /** A BOARD_SORT_KEYS key, `-` in front for descending (e.g. `-raised`). */
  sort?: string;
  page?: number;
  pageSize?: number;
}

/** One live tag on the board. */
export interface BoardRow {
  /** The tag id; the row links to /tags/<id>. */
  id: number;
  siteId: number;
  siteName: string;
  /** The site's IANA time zone, for showing times as they are on site. */
  timeZone: string;
  plantRoomId: number | null;
  plantRoomName: string | null;
  assetId: number;
  plantId: string;
  assetName: string;
  kind: TagKind;
  reason: string;
  /** Whoever holds the tag now. */
  holder: PersonRef;
  raisedAt: string;
  expiresAt: string;
  state: BoardState;
  contactPhone: string;
  /** Isolations: whether a proof is recorded (false = "not proved"); overrides: null. */
  proved: boolean | null;
}

export interface BoardCounts {
  total: number;
  overdue: number;
  dueSoon: number;
  /** Live isolations with no proof recorded. */
  notProved: number;
}

/** A site whose isolation procedure was last reviewed more than 12 months ago, or never (OSHA 29 CFR 1910.147(c)(6)). */
export interface ReviewOverdueSite {
  siteId: number;
  siteName: string;
  /** YYYY-MM-DD of the last review; null when none is recorded. */
  lastReviewedOn: string | null;
}

export interface BoardSiteCounts extends BoardCounts {
  siteId: number;
  siteName: string;
}

/**
 * `items`/`total` follow the filters; `counts` cover every live tag the caller may see (all their sites,
 * no other filter), so the header stays a fixed overview while the table is narrowed. Sites with no live tag
 * are left out of `perSite`, which is ordered by site name.
 */
export interface BoardResponse {
  items: BoardRow[];
  total: number;
  page: number;
  pageSize: number;
  counts: BoardCounts & { perSite: BoardSiteCounts[] };
  /** Server time the board was computed at (ISO UTC); states are as of this instant. */
  asOf: string;
  /** The caller's sites whose periodic procedure review is overdue. */
  reviewsOverdue: ReviewOverdueSite[];
}
