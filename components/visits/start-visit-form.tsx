import { Formik } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { prepareValues, submitForm, validateWithSchema } from '@/components/forms/submit';
import { useStartVisitMutation } from '@/hooks/api/use-visits';
import { startVisitSchema, type StartVisitInput } from '@/shared/schemas/visits';
import type { Visit } from '@/shared/types/visits';

/** What the engineer came to a site for: a job reference and a few words. */
export function StartVisitForm({ siteId, onStarted, onCancel }: { siteId: number; onStarted: (visit: Visit) => void; onCancel?: () => void }) {
  const start = useStartVisitMutation(siteId);
  return (
    <Formik<StartVisitInput>
      initialValues={{ purpose: '', jobReference: '' }}
      validate={validateWithSchema<StartVisitInput>(startVisitSchema)}
      onSubmit={async (values, helpers) => {
        const visit = await submitForm(helpers, () => start.mutateAsync(startVisitSchema.cast(prepareValues(values))));
        if (visit) onStarted(visit);
      }}
    >
      {({ submitForm: submit, isSubmitting }) => (
        <View style={{ gap: space.md }} testID="start-visit-form">
          <FormTextField name="purpose" label="What you came to do" hint="For example: annual service of boilers 1 and 2; pump 3 not starting." multiline numberOfLines={3} testID="visit-purpose" />
          <FormTextField name="jobReference" label="Job reference (optional)" autoCapitalize="characters" testID="visit-job-reference" />
          <FormStatusBanner />
          <FormButtons submitTitle="Start visit" busy={isSubmitting} onSubmit={() => void submit()} onCancel={onCancel} testID="start-visit" />
        </View>
      )}
    </Formik>
  );
}
