import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { ExpiryPicker } from '@/components/tags/expiry-picker';
import { ReasonField } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useExtendTagMutation } from '@/hooks/api/use-tags';
import type { Role } from '@/shared/rules/roles';
import { MIN_RAISE_REASON, expiryProblem } from '@/shared/rules/tags';
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
      validate={async (v) => {
        const errors = await validateWith(extendTagSchema, v);
        if (!errors.expiresAt) {
          const problem = expiryProblem(new Date(v.expiresAt), new Date(), role);
          if (problem) errors.expiresAt = problem;
          else if (v.expiresAt === tag.expiresAt) errors.expiresAt = 'Choose a new expiry.';
        }
        return errors as FormikErrors<Values>;
      }}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await extend.mutateAsync({ expiresAt: new Date(values.expiresAt), reason: values.reason.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, setFieldValue, setFieldTouched, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="extend-tag-form">
            <ExpiryPicker
              value={values.expiresAt}
              onChange={(iso) => { void setFieldValue('expiresAt', iso); void setFieldTouched('expiresAt', true, false); }}
              timeZone={tag.asset.timeZone}
              role={role}
              error={shown.expiresAt}
              testID="extend-expiry"
            />
            <ReasonField
              label="Reason for extending"
              hint="e.g. Parts delayed until tomorrow morning."
              value={values.reason}
              onChange={(t) => void setFieldValue('reason', t)}
              onBlur={() => void setFieldTouched('reason', true)}
              min={MIN_RAISE_REASON}
              error={shown.reason}
              testID="extend-reason"
            />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Extend expiry" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="extend" />
          </View>
        );
      }}
    </Formik>
  );
}
