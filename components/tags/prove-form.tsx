import { Formik } from 'formik';
import { View } from 'react-native';
import * as yup from 'yup';
import { FormButtons } from '@/components/forms/form-buttons';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm, validateWithSchema } from '@/components/forms/submit';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ProofFields } from '@/components/tags/proof-fields';
import { noProof, proofInput, type ProofDraft } from '@/components/tags/raise-form-values';
import { useProveTagMutation } from '@/hooks/api/use-tags';
import { proofSchema, type ProofInput } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

interface Values { proof: ProofDraft }

// The form keeps the proof under `proof`, as the raise form does, so the same fields serve both.
const proveFormSchema = yup.object({ proof: proofSchema });

/** The holder records how they proved the isolation (OSHA 29 CFR 1910.147(d)(6); HSE HSG253). */
export function ProveForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const prove = useProveTagMutation(tag.id);
  return (
    <Formik<Values>
      initialValues={{ proof: noProof() }}
      validate={validateWithSchema(proveFormSchema, (v: Values) => ({ proof: proofInput(v.proof) }))}
      onSubmit={async (values, helpers) => {
        const sent = await submitForm(helpers, () => prove.mutateAsync(proofInput(values.proof) as ProofInput), (path) => `proof.${path}`);
        if (sent) onDone();
      }}
    >
      {({ submitForm: send, isSubmitting }) => (
        <View style={{ gap: space.sm }} testID="prove-form">
          <Notice tone="mandatory" title="prove before you touch">
            Test for dead with a tester proved on a known source before and after; check the gauge reads zero; try the start controls and return them to off. Record what you did and what it read.
          </Notice>
          <ProofFields name="proof" />
          <FormStatusBanner testID="action-refusal" />
          <FormButtons submitTitle="Record the proof" busy={isSubmitting} onSubmit={() => void send()} onCancel={onCancel} testID="prove" />
        </View>
      )}
    </Formik>
  );
}
