import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { TextField } from '@/components/ui/text-field';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { multilineStyle } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useHandoverTagMutation } from '@/hooks/api/use-tags';
import { handoverSchema, type HandoverInput } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

/**
 * The on-coming person takes the tag over in one step (OSHA 29 CFR 1910.147(f)(4)): they become the holder at
 * once, so the tag is never without one, and both names go into the history.
 */
export function HandoverForm({ tag, myName, onDone, onCancel }: { tag: Tag; myName: string; onDone: () => void; onCancel?: () => void }) {
  const takeOver = useHandoverTagMutation(tag.id);
  const isolation = tag.kind === 'isolation';
  return (
    <Formik<HandoverInput>
      initialValues={{ note: '', contactPhone: '', lockNumber: '' }}
      validate={async (v) => (await validateWith(handoverSchema, v)) as FormikErrors<HandoverInput>}
      onSubmit={async (values, { setErrors, setStatus }) => {
        setStatus(undefined);
        try {
          await takeOver.mutateAsync({ note: values.note.trim(), contactPhone: values.contactPhone.trim(), lockNumber: values.lockNumber.trim() });
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, handleChange, handleBlur, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="handover-form">
            <Notice tone="mandatory" title="you become the holder">
              {`${myName}, you take this tag over from ${tag.author.name} now. From then on only you can clear it. ${isolation ? 'Agree the handover with them in person or by phone and follow the site procedure for swapping locks and tags.' : 'Agree the handover with them first.'}`}
            </Notice>
            <TextField label="Handover note" hint="What you agreed, e.g. lock swapped at shift change." value={values.note} onChangeText={handleChange('note')} onBlur={handleBlur('note')} multiline numberOfLines={3} style={multilineStyle} error={shown.note} testID="handover-note" />
            <TextField label="Your contact phone" hint={tag.contactPhone ? `Leave empty to keep ${tag.contactPhone}.` : 'Where you can be reached.'} value={values.contactPhone} onChangeText={handleChange('contactPhone')} keyboardType="phone-pad" error={shown.contactPhone} testID="handover-phone" />
            <TextField label="Your lock or tag number" hint={tag.lockNumber ? `Leave empty to keep ${tag.lockNumber}.` : 'If your lock or tag has one.'} value={values.lockNumber} onChangeText={handleChange('lockNumber')} autoCapitalize="characters" error={shown.lockNumber} testID="handover-lock" />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Take over this tag" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="handover" />
          </View>
        );
      }}
    </Formik>
  );
}
