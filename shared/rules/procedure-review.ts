import { addMonths } from '@/shared/rules/register';

/**
 * OSHA 29 CFR 1910.147(c)(6)(i): the employer conducts a periodic inspection of the energy control procedure
 * at least annually. A site's review is overdue once its last one is more than this many months old, or when
 * none is recorded.
 */
export const REVIEW_INTERVAL_MONTHS = 12;

/** The date the next review is due (YYYY-MM-DD), or null when none has been recorded (due now). */
export function reviewDueOn(lastReviewedOn: string | null): string | null {
  return lastReviewedOn ? addMonths(lastReviewedOn, REVIEW_INTERVAL_MONTHS) : null;
}

/** Overdue when there is no review, or today (site's local date) is past the due date. */
export function isReviewOverdue(lastReviewedOn: string | null, today: string): boolean {
  const due = reviewDueOn(lastReviewedOn);
  return !due || today > due;
}
