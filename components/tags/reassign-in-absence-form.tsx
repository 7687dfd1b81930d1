import { Formik } from 'formik';
import { View } from 'react-native';
import { FormSelectField, FormTextField } from '@/components/forms/bound-fields';
import { FormCheckField } from '@/components/forms/check-field';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormReasonField } from '@/components/forms/reason-field';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { useColleagueOptions } from '@/components/tags/handover-form';
import { useReassignInAbsenceMutation } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON } from '@/shared/rules/tags';
import { reassignInAbsenceSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values { toUserId: number | ''; lockNumber: string; holderNotOnSite: boolean; contactAttempts: string; reason: string }

/**
 * A supervisor moves a tag whose holder cannot be reached, with the evidence of a clearance in absence
 * (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)); the holder is told by e-mail and in the app, and must acknowledge.
 */
export function ReassignInAbsenceForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const reassign = useReassignInAbsenceMutation(tag.id);
  const options = useColleagueOptions(tag.holder.id);
  const holder = tag.holder.name;
  return (
    <Formik<Values>
      initialValues={{ toUserId: '', lockNumber: '', holderNotOnSite: false, contactAttempts: '', reason: '' }}
      validate={validateWithSchema(reassignInAbsenceSchema, undefined, { kind: tag.kind })}
      onSubmit={async (values, helpers) => {
        const body = { ...values, toUserId: Number(values.toUserId), lockNumber: values.lockNumber.trim(), reason: values.reason.trim(), contactAttempts: values.contactAttempts.trim() };
        if (await submitForm(helpers, () => reassign.mutateAsync(body))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="reassign-form">
          <Notice tone="mandatory" title="reassignment in the holder’s absence">
            {`Only when ${holder} cannot be reached: confirm they are not on site and record every attempt to reach them. The new holder puts their own lock on before ${holder}’s is removed under the site procedure. ${holder} is told by e-mail and in the app, and must acknowledge before they work again.`}
          </Notice>
          <FormSelectField<number> name="toUserId" label="New holder" options={options} placeholder="Choose a colleague…" testID="reassign-to" />
          {tag.kind === 'isolation' ? <FormTextField name="lockNumber" label="New holder’s lock number" autoCapitalize="characters" testID="reassign-lock" /> : null}
          <FormCheckField name="holderNotOnSite" label={`I have confirmed that ${holder} is not on site`} testID="reassign-not-on-site" />
          <FormReasonField name="contactAttempts" label="Attempts made to reach the holder" hint="Who tried, how and when." min={MIN_CLEARANCE_REASON} testID="reassign-attempts" />
          <FormReasonField name="reason" label="Reason for reassigning" min={MIN_CLEARANCE_REASON} testID="reassign-reason" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Reassign in holder’s absence" danger busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="reassign" />
        </View>
      )}
    </Formik>
  );
}
