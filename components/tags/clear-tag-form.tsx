import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { ReasonField, ReleaseChecks, noChecks, type ChecksValue } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useClearTagMutation } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON, RELEASE_CHECKS } from '@/shared/rules/tags';
import { clearTagSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values {
  reason: string;
  checks: ChecksValue;
}

/** The holder clears their own tag: a reason, and for an isolation the four release checks. */
export function ClearTagForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const clear = useClearTagMutation(tag.id);
  const isolation = tag.kind === 'isolation';
  return (
    <Formik<Values>
      initialValues={{ reason: '', checks: noChecks() }}
      validate={async (v) => {
        const errors = await validateWith(clearTagSchema, v);
        // The server refuses an isolation cleared without every check; say so before it has to.
        if (isolation) for (const k of RELEASE_CHECKS) if (!v.checks[k]) errors[`checks.${k}`] = 'Confirm this before clearing.';
        return errors as FormikErrors<Values>;
      }}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await clear.mutateAsync({ reason: values.reason.trim(), checks: values.checks });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, setFieldValue, setFieldTouched, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="clear-tag-form">
            {isolation ? (
              <Notice tone="caution" title="before the isolation comes off">
                Follow the site’s procedure for restoring energy. Clearing this record does not restore anything by itself.
              </Notice>
            ) : (
              <Notice tone="info" word="Before you clear">Put the item back to its normal state first: {tag.normalState}.</Notice>
            )}
            <ReasonField
              label="Reason for clearing"
              hint="What was done, and why the tag can come off."
              value={values.reason}
              onChange={(t) => void setFieldValue('reason', t)}
              onBlur={() => void setFieldTouched('reason', true)}
              min={MIN_CLEARANCE_REASON}
              error={shown.reason}
              testID="clear-reason"
            />
            {isolation ? <ReleaseChecks value={values.checks} onChange={(c) => void setFieldValue('checks', c)} errors={shown} showErrors={submitCount > 0} /> : null}
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Clear this tag" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="clear" />
          </View>
        );
      }}
    </Formik>
  );
}
