import { Formik } from 'formik';
import { View } from 'react-native';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormReasonField } from '@/components/forms/reason-field';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ReleaseChecks, noChecks, type ChecksValue } from '@/components/tags/release-checks';
import { useClearTagMutation } from '@/hooks/api/use-tags';
import { MIN_CLEARANCE_REASON } from '@/shared/rules/tags';
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
      // The server refuses an isolation cleared without every check; the same schema says so before it has to.
      validate={validateWithSchema(clearTagSchema, undefined, { kind: tag.kind })}
      onSubmit={async (values, helpers) => {
        if (await submitForm(helpers, () => clear.mutateAsync({ reason: values.reason.trim(), checks: values.checks }))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="clear-tag-form">
          {isolation ? (
            <Notice tone="caution" title="before the isolation comes off">
              Follow the site’s procedure for restoring energy. Clearing this record does not restore anything by itself.
            </Notice>
          ) : (
            <Notice tone="info" word="Before you clear">{`Put the item back to its normal state first: ${tag.normalState}.`}</Notice>
          )}
          <FormReasonField name="reason" label="Reason for clearing" hint="What was done, and why the tag can come off." min={MIN_CLEARANCE_REASON} testID="clear-reason" />
          {isolation ? <ReleaseChecks /> : null}
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Clear this tag" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="clear" />
        </View>
      )}
    </Formik>
  );
}
