import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { CheckRow, ReasonField, ReleaseChecks, noChecks, type ChecksValue } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useClearInAbsenceMutation } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON, RELEASE_CHECKS } from '@/shared/rules/tags';
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
  const isolation = tag.kind === 'isolation';
  const holder = tag.holder.name;
  return (
    <Formik<Values>
      initialValues={{ holderNotOnSite: false, contactAttempts: '', reason: '', checks: noChecks() }}
      validate={async (v) => {
        const errors = await validateWith(clearInAbsenceSchema, v);
        if (isolation) for (const k of RELEASE_CHECKS) if (!v.checks[k]) errors[`checks.${k}`] = 'Confirm this before clearing.';
        return errors as FormikErrors<Values>;
      }}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await clear.mutateAsync({ ...values, reason: values.reason.trim(), contactAttempts: values.contactAttempts.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, setFieldValue, setFieldTouched, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="clear-in-absence-form">
            <Notice tone="mandatory" title="clearance in the holder’s absence">
              {`Only when ${holder} cannot remove it: confirm they are not on site and record every attempt to reach them. ${holder} will be told the tag was cleared, and must be told before they resume work.`}
            </Notice>
            <CheckRow
              label={`I have confirmed that ${holder} is not on site`}
              checked={values.holderNotOnSite}
              onChange={(v) => void setFieldValue('holderNotOnSite', v)}
              error={shown.holderNotOnSite}
              testID="absence-not-on-site"
            />
            <ReasonField
              label="Attempts made to reach the holder"
              hint="Who tried, how and when: calls, messages, the site office."
              value={values.contactAttempts}
              onChange={(t) => void setFieldValue('contactAttempts', t)}
              onBlur={() => void setFieldTouched('contactAttempts', true)}
              min={MIN_CLEARANCE_REASON}
              error={shown.contactAttempts}
              testID="absence-attempts"
            />
            <ReasonField
              label="Reason for clearing"
              hint="Why the tag must come off now, and what was checked."
              value={values.reason}
              onChange={(t) => void setFieldValue('reason', t)}
              onBlur={() => void setFieldTouched('reason', true)}
              min={MIN_CLEARANCE_REASON}
              error={shown.reason}
              testID="absence-reason"
            />
            {isolation ? <ReleaseChecks value={values.checks} onChange={(c) => void setFieldValue('checks', c)} errors={shown} showErrors={submitCount > 0} /> : null}
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Clear in holder’s absence" danger busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="absence" />
          </View>
        );
      }}
    </Formik>
  );
}
