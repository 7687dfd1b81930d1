import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ProcedureReviewForm } from '@/components/places/procedure-review-form';
import { formatDate } from '@/components/register/register-vocabulary';
import { errorMessage } from '@/hooks/api/request';
import { useProcedureReviewsQuery } from '@/hooks/api/use-procedure-reviews';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { REVIEW_INTERVAL_MONTHS } from '@/shared/rules/procedure-review';

const SHOWN = 3;

/** A site's yearly review of its isolation procedure: when it was last done, when it is due, and the record form. */
export function ProcedureReviewCard({ siteId }: { siteId: number }) {
  const reviews = useProcedureReviewsQuery(siteId);
  const { may, userId } = usePermissions();
  const [recording, setRecording] = useState(false);
  const data = reviews.data;
  return (
    <Card>
      <View testID="procedure-reviews">
        <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' }}>
          <Text variant="title" style={{ flex: 1 }}>Isolation procedure review</Text>
          {may('reviewProcedures') && !recording ? <Button title="Record a review" variant="secondary" onPress={() => setRecording(true)} testID="review-start" /> : null}
        </View>
        <Text muted variant="small">{`Someone other than the engineers using the procedure watches it in use at least every ${REVIEW_INTERVAL_MONTHS} months, and records what they found. Follow your organisation's own procedure for how the review is done.`}</Text>
        {reviews.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(reviews.error)}</Notice> : null}
        {data ? (
          data.overdue ? (
            <Notice tone="caution" word="Review overdue">
              {data.lastReviewedOn ? `Last reviewed ${formatDate(data.lastReviewedOn)}; it was due by ${formatDate(data.dueOn)}.` : 'No review of this site’s isolation procedure has been recorded.'}
            </Notice>
          ) : (
            <Text testID="review-status">{`Last reviewed ${formatDate(data.lastReviewedOn)}. Next due by ${formatDate(data.dueOn)}.`}</Text>
          )
        ) : null}
        {recording ? <ProcedureReviewForm siteId={siteId} reviewerId={userId} onDone={() => setRecording(false)} /> : null}
        {data?.items.slice(0, SHOWN).map((r) => (
          <View key={r.id} style={{ gap: space.xs, paddingTop: space.sm }} testID={`review-${r.id}`}>
            <Text bold>{`${formatDate(r.reviewedOn)} · ${r.reviewer.name}`}</Text>
            <Text variant="small">{`Observed: ${r.observed.map((p) => p.name).join(', ')}`}</Text>
            <Text variant="small">{`Deviations: ${r.deviations}`}</Text>
            <Text variant="small">{`Corrections: ${r.corrections}`}</Text>
          </View>
        ))}
        {data && data.items.length > SHOWN ? <Text muted variant="small">{`${data.items.length - SHOWN} earlier reviews kept on record.`}</Text> : null}
      </View>
    </Card>
  );
}
