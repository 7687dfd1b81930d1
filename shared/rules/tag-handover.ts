import { may, type Actor } from '@/shared/rules/permissions';
import type { TagLike } from '@/shared/rules/tags';

/**
 * An unanswered hand-over offer lapses after this many minutes. The two people are meant to be together at the
 * plant, the on-coming lock going on before the off-going one comes off (OSHA 29 CFR 1910.147(f)(4)); an offer
 * older than a working half-hour no longer describes who is standing there.
 * common practice, no published source: the length is our choice.
 */
export const HANDOVER_OFFER_MINUTES = 30;

interface HandoverOfferLike {
  toUserId: number | null;
  lapsesAt: string | Date | null;
}

const ms = (t: string | Date) => (t instanceof Date ? t.getTime() : Date.parse(t));

/** An offer is open until it is accepted, withdrawn or lapses. */
export function offerIsOpen(offer: HandoverOfferLike, now: Date): boolean {
  return !!offer.toUserId && !!offer.lapsesAt && ms(offer.lapsesAt) > now.getTime();
}

export function offerLapsesAt(now: Date): Date {
  return new Date(now.getTime() + HANDOVER_OFFER_MINUTES * 60_000);
}

/**
 * Who the actor is in a hand-over: the holder (may offer and withdraw), the colleague named in an open offer
 * (may accept), or nobody (403 naming the holder).
 */
export function handoverRole(actor: Actor, tag: Pick<TagLike, 'holderId' | 'status'> & HandoverOfferLike, now: Date): 'holder' | 'offered' | 'none' {
  if (tag.status !== 'live' || !may(actor, 'holdTags')) return 'none';
  if (actor.id === tag.holderId) return 'holder';
  return offerIsOpen(tag, now) && tag.toUserId === actor.id ? 'offered' : 'none';
}
