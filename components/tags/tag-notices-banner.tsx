import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { StatusBanner } from '@/components/forms/status-banner';
import { failureStatus } from '@/components/forms/submit';
import { useAcknowledgeTagMutation, useTagNoticesQuery } from '@/hooks/api/use-tags';
import type { TagNotice } from '@/shared/types/tags';

function NoticeRow({ notice }: { notice: TagNotice }) {
  const ack = useAcknowledgeTagMutation(notice.tagId);
  const what = notice.kind === 'cleared-in-absence' ? 'cleared' : 'moved to a colleague';
  return (
    <View style={{ gap: space.sm }} testID={`tag-notice-${notice.tagId}`}>
      <Notice tone="danger" word="While you were away">
        {`${notice.by.name} ${what} your tag on ${notice.asset.plantId} ${notice.asset.name}: “${notice.reason}”. Your lock may have been removed. Speak to them and check the plant before you resume any work.`}
      </Notice>
      <StatusBanner status={ack.error ? failureStatus(ack.error) : null} testID="action-refusal" />
      <Button title="I have read this" variant="primary" busy={ack.isPending} onPress={() => ack.mutate({})} testID={`tag-notice-ack-${notice.tagId}`} />
    </View>
  );
}

/**
 * Tags of the signed-in person cleared or reassigned in their absence (OSHA 29 CFR 1910.147(e)(3)(iii)). Until each
 * is acknowledged the server refuses them any raise, clearance, extension or hand-over.
 */
export function TagNoticesBanner() {
  const notices = useTagNoticesQuery();
  if (!notices.data?.length) return null;
  return (
    <View style={{ gap: space.md }} testID="tag-notices">
      {notices.data.map((n) => <NoticeRow key={n.id} notice={n} />)}
    </View>
  );
}
