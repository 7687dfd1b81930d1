import { Formik } from 'formik';
import { View } from 'react-native';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormReasonField } from '@/components/forms/reason-field';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { FormExpiryField } from '@/components/tags/expiry-picker';
import { useExtendTagMutation } from '@/hooks/api/use-tags';
import type { Role } from '@/shared/rules/roles';
import { MIN_RAISE_REASON } from '@/shared/rules/tags';
import { extendTagSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values {
  expiresAt: string;
  reason: string;
}

/** The holder or a supervisor moves the expiry, with a reason; both expiries stay in the history. */
export function ExtendTagForm({ tag, role, onDone, onCancel }: { tag: Tag; role: Role; onDone: () => void; onCancel?: () => void }) {
  const extend = useExtendTagMutation(tag.id);
  return (
    <Formik<Values>
      initialValues={{ expiresAt: tag.expiresAt, reason: '' }}
      // The role's expiry limit is checked again on the server, on its own clock.
      validate={validateWithSchema<Values>(extendTagSchema, undefined, () => ({ role, now: new Date(), currentExpiry: tag.expiresAt }))}
      onSubmit={async (values, helpers) => {
        if (await submitForm(helpers, () => extend.mutateAsync({ expiresAt: new Date(values.expiresAt), reason: values.reason.trim() }))) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="extend-tag-form">
          <FormExpiryField name="expiresAt" timeZone={tag.asset.timeZone} role={role} testID="extend-expiry" />
          <FormReasonField name="reason" label="Reason for extending" hint="e.g. Parts delayed until tomorrow morning." min={MIN_RAISE_REASON} testID="extend-reason" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Extend expiry" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="extend" />
        </View>
      )}
    </Formik>
  );
}
