import type { PersonRef } from '@/shared/types/tags';

export interface ProcedureReview {
  id: number;
  siteId: number;
  reviewedOn: string;
  reviewer: PersonRef;
  observed: PersonRef[];
  deviations: string;
  corrections: string;
  signedOffAt: string;
}

export interface ProcedureReviewList {
  items: ProcedureReview[];
  /** YYYY-MM-DD of the latest review, null if none. */
  lastReviewedOn: string | null;
  /** When the next one is due; null when none has been recorded (due now). */
  dueOn: string | null;
  overdue: boolean;
}
