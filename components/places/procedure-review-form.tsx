import { Formik } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { FieldMessage, FormTextField, useBoundField } from '@/components/forms/bound-fields';
import { FormCheckField } from '@/components/forms/check-field';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { todayIso } from '@/components/register/register-vocabulary';
import { useRecordProcedureReviewMutation } from '@/hooks/api/use-procedure-reviews';
import { useTagColleaguesQuery } from '@/hooks/api/use-tags';
import { procedureReviewSchema, type ProcedureReviewInput } from '@/shared/schemas/procedure-reviews';

type Values = Omit<ProcedureReviewInput, 'signedOff'> & { signedOff: boolean };

/** The engineers watched using the procedure: everyone who can hold a tag, except the reviewer. */
function ObservedPicker({ reviewerId }: { reviewerId: number }) {
  const observed = useBoundField<number[]>('observedUserIds');
  const people = (useTagColleaguesQuery().data ?? []).filter((p) => p.id !== reviewerId);
  const toggle = (id: number) => observed.set(observed.value.includes(id) ? observed.value.filter((x) => x !== id) : [...observed.value, id]);
  return (
    <View style={{ gap: space.xs }}>
      <Text variant="label" bold>Engineers observed using the procedure</Text>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        {people.map((p) => (
          <Chip key={p.id} label={p.name} selected={observed.value.includes(p.id)} onPress={() => toggle(p.id)} testID={`review-observed-${p.id}`} />
        ))}
      </View>
      <FieldMessage name="observedUserIds" testID="review-observed-error" />
    </View>
  );
}

/**
 * Records a site's periodic review of its isolation procedure (OSHA 29 CFR 1910.147(c)(6)): who was watched,
 * what deviated, what was corrected, and the reviewer's sign-off. Once saved it cannot be changed.
 */
export function ProcedureReviewForm({ siteId, reviewerId, onDone }: { siteId: number; reviewerId: number; onDone: () => void }) {
  const record = useRecordProcedureReviewMutation(siteId);
  return (
    <Formik<Values>
      initialValues={{ reviewedOn: todayIso(), observedUserIds: [], deviations: '', corrections: '', signedOff: false }}
      validationSchema={procedureReviewSchema}
      onSubmit={async (values, helpers) => {
        if (await submitForm(helpers, () => record.mutateAsync(procedureReviewSchema.cast(values) as ProcedureReviewInput))) onDone();
      }}
    >
      {({ handleSubmit, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="review-form">
          <FormStatusBanner word="Not recorded" />
          <FormTextField name="reviewedOn" label="Date of the review (YYYY-MM-DD)" testID="review-date" autoCapitalize="none" />
          <ObservedPicker reviewerId={reviewerId} />
          <FormTextField name="deviations" label="Deviations from the procedure" hint='Write "None found" if there were none.' multiline numberOfLines={3} testID="review-deviations" />
          <FormTextField name="corrections" label="Corrections made" hint='Write "None needed" if there were none.' multiline numberOfLines={3} testID="review-corrections" />
          <FormCheckField name="signedOff" label="I observed this procedure in use and sign off this review" testID="review-signed-off" />
          <FormButtons submitTitle="Record review" busy={isSubmitting} onSubmit={() => handleSubmit()} onCancel={onDone} testID="review" />
        </View>
      )}
    </Formik>
  );
}
