import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { StatusBanner } from '@/components/forms/status-banner';
import { failureStatus } from '@/components/forms/submit';
import { formatInZone } from '@/components/tags/tag-time';
import { useWithdrawHandoverMutation } from '@/hooks/api/use-tags';
import type { Tag } from '@/shared/types/tags';
import type { User } from '@/shared/types/user';

/** An open hand-over offer, as each side sees it: the holder may withdraw it; the named colleague is asked to accept. */
export function HandoverOfferNotice({ tag, me, now }: { tag: Tag; me: User; now: Date }) {
  const withdraw = useWithdrawHandoverMutation(tag.id);
  const offer = tag.handoverOffer;
  if (!offer) return null;
  const lapses = formatInZone(offer.lapsesAt, tag.asset.timeZone, now);
  const note = offer.note ? ` Note: “${offer.note}”` : '';
  if (me.id === tag.holder.id) {
    return (
      <View style={{ gap: space.sm }} testID="handover-offered-by-me">
        <Notice tone="mandatory" word="Offered">{`You offered this tag to ${offer.to.name}. You hold it until they accept; the offer lapses ${lapses}.${note}`}</Notice>
        <StatusBanner status={withdraw.error ? failureStatus(withdraw.error) : null} testID="action-refusal" />
        <Button title="Withdraw the offer" variant="secondary" busy={withdraw.isPending} onPress={() => withdraw.mutate({})} testID="handover-withdraw" />
      </View>
    );
  }
  if (me.id === offer.to.id) {
    return (
      <View testID="handover-offered-to-me">
        <Notice tone="mandatory" word="Offered to you">{`${tag.holder.name} offers you this tag. Put your own lock on, then accept before ${lapses}.${note}`}</Notice>
      </View>
    );
  }
  return <Notice tone="info" word="Hand-over">{`${tag.holder.name} has offered this tag to ${offer.to.name}.`}</Notice>;
}
