import { Formik } from 'formik';
import { View } from 'react-native';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { useAddTagNoteMutation } from '@/hooks/api/use-tags';
import { tagNoteSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

/** A note on a live tag's history: anyone but a viewer. Notes are added, never edited. */
export function TagNoteForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const add = useAddTagNoteMutation(tag.id);
  return (
    <Formik<{ text: string }>
      initialValues={{ text: '' }}
      validate={validateWithSchema(tagNoteSchema)}
      onSubmit={async (values, helpers) => {
        if (!(await submitForm(helpers, () => add.mutateAsync({ text: values.text.trim() })))) return;
        helpers.resetForm();
        onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="tag-note-form">
          <FormTextField name="text" label="Note" hint="It joins the tag’s history with your name and the time; it cannot be changed later." multiline testID="note-text" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Add note" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="note" />
        </View>
      )}
    </Formik>
  );
}
