import { View } from 'react-native';
import { FieldMessage, FormTextField, useBoundField } from '@/components/forms/bound-fields';
import { space } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import type { ProofDraft } from '@/components/tags/raise-form-values';
import { PROOF_METHODS, PROOF_METHOD_LABELS, PROOF_NEEDS_INSTRUMENT } from '@/shared/rules/tag-isolation';

/**
 * How the isolation was proved (OSHA 29 CFR 1910.147(d)(6); HSE HSG253), bound to the form's `name` field: the
 * method, the tester or gauge, the reading. Who and when are taken from the session and the server's clock.
 */
export function ProofFields({ name, optional }: { name: string; optional?: boolean }) {
  const method = useBoundField<ProofDraft['method']>(`${name}.method`);
  const needsInstrument = !!method.value && PROOF_NEEDS_INSTRUMENT.includes(method.value);
  return (
    <View style={{ gap: space.sm }} testID="proof-fields">
      <Text variant="label" bold>How you proved it</Text>
      {optional ? <Text variant="small" muted>If you have not proved it yet, leave this empty and record it from the tag before work starts.</Text> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        {PROOF_METHODS.map((m) => (
          <Chip key={m} label={PROOF_METHOD_LABELS[m]} selected={method.value === m} onPress={() => method.set(method.value === m && optional ? '' : m)} testID={`proof-${m}`} />
        ))}
      </View>
      <FieldMessage name={`${name}.method`} />
      {method.value ? (
        <>
          <FormTextField
            name={`${name}.instrument`}
            label={needsInstrument ? 'Tester or gauge used' : 'Tester or gauge used (if any)'}
            hint={method.value === 'pressure-at-zero' ? 'Name the gauge, e.g. “Gauge PG-3 on the pump suction”.' : 'e.g. “Two-pole tester TV-11, proved on a proving unit before and after”.'}
            testID="proof-instrument"
          />
          <FormTextField name={`${name}.reading`} label="Reading" hint="e.g. 0 V L–N, L–E, N–E; 0.0 bar" testID="proof-reading" />
          <FormTextField name={`${name}.note`} label={method.value === 'other' ? 'How it was proved' : 'Note (optional)'} testID="proof-note" />
        </>
      ) : null}
    </View>
  );
}
