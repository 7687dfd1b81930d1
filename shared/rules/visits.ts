import type { TagKind } from '@/shared/rules/tags';

/** What an engineer may do with each live tag they hold on a site when they end their visit there. */
export const VISIT_DECISION_ACTIONS = ['leave', 'handover', 'clear'] as const;
export type VisitDecisionAction = (typeof VISIT_DECISION_ACTIONS)[number];

export const VISIT_DECISION_LABELS: Record<VisitDecisionAction, string> = {
  leave: 'Leave in place',
  handover: 'Offer in hand-over',
  clear: 'Clear it now',
};

/** Words for a note left with a tag: enough to tell the next person what was left and why. */
const MIN_LEAVE_NOTE = 10;

/**
 * Why a decision cannot stand, or null. An override left behind must carry a note: the next person finds plant
 * in a non-normal state and needs to know why (common practice, no published source). A clearance needs a reason
 * as long as any other clearance.
 */
export function decisionProblem(kind: TagKind, action: VisitDecisionAction, note: string, minClearance: number): string | null {
  const text = note.trim();
  if (action === 'leave' && kind === 'override' && text.length < MIN_LEAVE_NOTE) {
    return `An override cannot be left without a note: at least ${MIN_LEAVE_NOTE} characters on what was left and why.`;
  }
  if (action === 'clear' && text.length < minClearance) return `Say why it can be cleared, in at least ${minClearance} characters.`;
  return null;
}

/**
 * Order for a person's own live tags and a place's live tags: what needs acting on first. Unproved isolations
 * (when the record carries `proved`), then past expiry, then expiring soon, then the rest by expiry.
 */
function attentionRank(tag: { proved?: boolean | null; kind: TagKind; overdue: boolean; dueSoon: boolean }): number {
  if (tag.kind === 'isolation' && tag.proved === false) return 0;
  if (tag.overdue) return 1;
  if (tag.dueSoon) return 2;
  return 3;
}

export function byAttention<T extends { proved?: boolean | null; kind: TagKind; overdue: boolean; dueSoon: boolean; expiresAt: string }>(tags: T[]): T[] {
  return [...tags].sort((a, b) => attentionRank(a) - attentionRank(b) || a.expiresAt.localeCompare(b.expiresAt));
}
