import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ActionStatusNotice, type ActionStatus } from '@/components/tags/action-support';
import { formatInZone } from '@/components/tags/tag-time';
import { errorMessage, RequestError } from '@/hooks/api/request';
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
  const failure: ActionStatus | undefined = withdraw.error ? { status: withdraw.error instanceof RequestError ? withdraw.error.status : 0, message: errorMessage(withdraw.error) } : undefined;
  if (me.id === tag.holder.id) {
    return (
      <View style={{ gap: space.sm }} testID="handover-offered-by-me">
        <Notice tone="mandatory" word="Offered">{`You offered this tag to ${offer.to.name}. You hold it until they accept; the offer lapses ${lapses}.${note}`}</Notice>
        <ActionStatusNotice status={failure} />
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
