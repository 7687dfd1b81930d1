import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { ActionButtons, ActionStatusNotice, actionFailed, type ActionStatus } from '@/components/tags/action-support';
import { ProofFields } from '@/components/tags/proof-fields';
import { noProof } from '@/components/tags/raise-form-values';
import { validateWith, type FieldErrors } from '@/components/tags/validate-with';
import { useProveTagMutation } from '@/hooks/api/use-tags';
import { proofSchema } from '@/shared/schemas/tags';
import type { Tag } from '@/shared/types/tags';

/** The holder records how they proved the isolation (OSHA 29 CFR 1910.147(d)(6); HSE HSG253). */
export function ProveForm({ tag, onDone, onCancel }: { tag: Tag; onDone: () => void; onCancel?: () => void }) {
  const prove = useProveTagMutation(tag.id);
  const [value, setValue] = useState(noProof());
  const [errors, setErrors] = useState<FieldErrors>({});
  const [status, setStatus] = useState<ActionStatus | undefined>();
  const submit = async () => {
    setStatus(undefined);
    const body = { method: value.method || undefined, instrument: value.instrument.trim(), reading: value.reading.trim(), note: value.note.trim() };
    const found = await validateWith(proofSchema, body);
    setErrors(found);
    if (Object.keys(found).length) return;
    try {
      await prove.mutateAsync(body as Parameters<typeof prove.mutateAsync>[0]);
      onDone();
    } catch (err) {
      actionFailed<FieldErrors>(err, (e) => setErrors(e as FieldErrors), setStatus);
    }
  };
  return (
    <View style={{ gap: space.sm }} testID="prove-form">
      <Notice tone="mandatory" title="prove before you touch">
        Test for dead with a tester proved on a known source before and after; check the gauge reads zero; try the start controls and return them to off. Record what you did and what it read.
      </Notice>
      <ProofFields value={value} onChange={setValue} errors={errors} />
      <ActionStatusNotice status={status} />
      <ActionButtons submitTitle="Record the proof" busy={prove.isPending} onSubmit={() => void submit()} onCancel={onCancel} testID="prove" />
    </View>
  );
}
