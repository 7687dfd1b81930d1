import { Formik } from 'formik';
import { View } from 'react-native';
import { FormCheckField } from '@/components/forms/check-field';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormReasonField } from '@/components/forms/reason-field';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ReleaseChecks, noChecks, type ChecksValue } from '@/components/tags/release-checks';
import { useClearInAbsenceMutation } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON } from '@/shared/rules/tags';
import { clearInAbsenceSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values {
  holderNotOnSite: boolean;
  contactAttempts: string;
  reason: string;
  checks: ChecksValue;
}

/**
 * A supervisor clears someone else's tag when the holder is away (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)):
 * the holder is confirmed not on site, the attempts to reach them are recorded, and they are told before they resume work.
 */
export function ClearInAbsenceForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const clear = useClearInAbsenceMutation(tag.id);
  const holder = tag.holder.name;
  return (
    <Formik<Values>
      initialValues={{ holderNotOnSite: false, contactAttempts: '', reason: '', checks: noChecks() }}
      validate={validateWithSchema(clearInAbsenceSchema, undefined, { kind: tag.kind })}
      onSubmit={async (values, helpers) => {
        const body = { ...values, reason: values.reason.trim(), contactAttempts: values.contactAttempts.trim() };
        if (await submitForm(helpers, () => clear.mutateAsync(body))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="clear-in-absence-form">
          <Notice tone="mandatory" title="clearance in the holder’s absence">
            {`Only when ${holder} cannot remove it: confirm they are not on site and record every attempt to reach them. ${holder} will be told the tag was cleared, and must be told before they resume work.`}
          </Notice>
          <FormCheckField name="holderNotOnSite" label={`I have confirmed that ${holder} is not on site`} testID="absence-not-on-site" />
          <FormReasonField name="contactAttempts" label="Attempts made to reach the holder" hint="Who tried, how and when: calls, messages, the site office." min={MIN_CLEARANCE_REASON} testID="absence-attempts" />
          <FormReasonField name="reason" label="Reason for clearing" hint="Why the tag must come off now, and what was checked." min={MIN_CLEARANCE_REASON} testID="absence-reason" />
          {tag.kind === 'isolation' ? <ReleaseChecks /> : null}
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Clear in holder’s absence" danger busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="absence" />
        </View>
      )}
    </Formik>
  );
}
