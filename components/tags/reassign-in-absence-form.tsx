import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { CheckRow, ReasonField } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useReassignInAbsenceMutation, useTagColleaguesQuery } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON } from '@/shared/rules/tags';
import { reassignInAbsenceSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values { toUserId: number | null; lockNumber: string; holderNotOnSite: boolean; contactAttempts: string; reason: string }

/**
 * A supervisor moves a tag whose holder cannot be reached, with the evidence of a clearance in absence
 * (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)); the holder is told by e-mail and in the app, and must acknowledge.
 */
export function ReassignInAbsenceForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const reassign = useReassignInAbsenceMutation(tag.id);
  const colleagues = useTagColleaguesQuery();
  const isolation = tag.kind === 'isolation';
  const holder = tag.holder.name;
  const options = (colleagues.data ?? []).filter((c) => c.id !== tag.holder.id).map((c) => ({ value: c.id, label: c.name }));
  return (
    <Formik<Values>
      initialValues={{ toUserId: null, lockNumber: '', holderNotOnSite: false, contactAttempts: '', reason: '' }}
      validate={async (v) => {
        const errors = await validateWith(reassignInAbsenceSchema, v);
        if (isolation && !v.lockNumber.trim()) errors.lockNumber = 'The new holder’s lock number.';
        return errors as FormikErrors<Values>;
      }}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await reassign.mutateAsync({ ...values, toUserId: values.toUserId!, lockNumber: values.lockNumber.trim(), reason: values.reason.trim(), contactAttempts: values.contactAttempts.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, setFieldValue, setFieldTouched, handleChange, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="reassign-form">
            <Notice tone="mandatory" title="reassignment in the holder’s absence">
              {`Only when ${holder} cannot be reached: confirm they are not on site and record every attempt to reach them. The new holder puts their own lock on before ${holder}’s is removed under the site procedure. ${holder} is told by e-mail and in the app, and must acknowledge before they work again.`}
            </Notice>
            <SelectField<number> label="New holder" value={values.toUserId} options={options} onChange={(v) => void setFieldValue('toUserId', v)} placeholder="Choose a colleague…" error={shown.toUserId} testID="reassign-to" />
            {isolation ? <TextField label="New holder’s lock number" value={values.lockNumber} onChangeText={handleChange('lockNumber')} autoCapitalize="characters" error={shown.lockNumber} testID="reassign-lock" /> : null}
            <CheckRow label={`I have confirmed that ${holder} is not on site`} checked={values.holderNotOnSite} onChange={(v) => void setFieldValue('holderNotOnSite', v)} error={shown.holderNotOnSite} testID="reassign-not-on-site" />
            <ReasonField label="Attempts made to reach the holder" hint="Who tried, how and when." value={values.contactAttempts} onChange={(t) => void setFieldValue('contactAttempts', t)} onBlur={() => void setFieldTouched('contactAttempts', true)} min={MIN_CLEARANCE_REASON} error={shown.contactAttempts} testID="reassign-attempts" />
            <ReasonField label="Reason for reassigning" value={values.reason} onChange={(t) => void setFieldValue('reason', t)} onBlur={() => void setFieldTouched('reason', true)} min={MIN_CLEARANCE_REASON} error={shown.reason} testID="reassign-reason" />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Reassign in holder’s absence" danger busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="reassign" />
          </View>
        );
      }}
    </Formik>
  );
}
