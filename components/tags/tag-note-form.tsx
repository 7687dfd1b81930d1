import { Formik, type FormikErrors } from 'formik';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { TextField } from '@/components/ui/text-field';
import { ActionButtons, ActionStatusNotice, actionFailed, visibleErrors, type ActionStatus } from '@/components/tags/action-support';
import { multilineStyle } from '@/components/tags/form-pieces';
import { validateWith } from '@/components/tags/validate-with';
import { useAddTagNoteMutation } from '@/hooks/api/use-tags';
import { tagNoteSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

/** A note on a live tag's history: anyone but a viewer. Notes are added, never edited. */
export function TagNoteForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const add = useAddTagNoteMutation(tag.id);
  return (
    <Formik<{ text: string }>
      initialValues={{ text: '' }}
      validate={async (v) => (await validateWith(tagNoteSchema, v)) as FormikErrors<{ text: string }>}
      onSubmit={async (values, { setErrors, setStatus, resetForm }) => {
        setStatus(undefined);
        try {
          await add.mutateAsync({ text: values.text.trim() });
          resetForm();
          onDone();
        } catch (err) {
          actionFailed(err, setErrors, setStatus);
        }
      }}
    >
      {({ values, errors, touched, submitCount, handleChange, handleBlur, submitForm, isSubmitting, status }) => {
        const shown = visibleErrors(errors, touched, submitCount);
        return (
          <View style={{ gap: space.sm }} testID="tag-note-form">
            <TextField label="Note" hint="It joins the tag’s history with your name and the time; it cannot be changed later." value={values.text} onChangeText={handleChange('text')} onBlur={handleBlur('text')} multiline numberOfLines={3} style={multilineStyle} error={shown.text} testID="note-text" />
            <ActionStatusNotice status={status as ActionStatus | undefined} />
            <ActionButtons submitTitle="Add note" busy={isSubmitting} onSubmit={() => void submitForm()} onCancel={onCancel} testID="note" />
          </View>
        );
      }}
    </Formik>
  );
}
