import { View } from 'react-native';
import { space } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { ProofDraft } from '@/components/tags/raise-form-values';
import { PROOF_METHODS, PROOF_METHOD_LABELS, PROOF_NEEDS_INSTRUMENT } from '@/shared/rules/tag-isolation';

/**
 * How the isolation was proved (OSHA 29 CFR 1910.147(d)(6); HSE HSG253): the method, the tester or gauge, the
 * reading. Who and when are taken from the session and the server's clock.
 */
export function ProofFields({ value, onChange, errors, optional }: { value: ProofDraft; onChange: (next: ProofDraft) => void; errors: Record<string, string | undefined>; optional?: boolean }) {
  const set = <K extends keyof ProofDraft>(k: K, v: ProofDraft[K]) => onChange({ ...value, [k]: v });
  const needsInstrument = !!value.method && PROOF_NEEDS_INSTRUMENT.includes(value.method);
  return (
    <View style={{ gap: space.sm }} testID="proof-fields">
      <Text variant="label" bold>How you proved it</Text>
      {optional ? <Text variant="small" muted>If you have not proved it yet, leave this empty and record it from the tag before work starts.</Text> : null}
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
        {PROOF_METHODS.map((m) => (
          <Chip key={m} label={PROOF_METHOD_LABELS[m]} selected={value.method === m} onPress={() => set('method', value.method === m && optional ? '' : m)} testID={`proof-${m}`} />
        ))}
      </View>
      {errors['proof.method'] ?? errors.method ? <Text variant="small">{`⚠ ${errors['proof.method'] ?? errors.method}`}</Text> : null}
      {value.method ? (
        <>
          <TextField
            label={needsInstrument ? 'Tester or gauge used' : 'Tester or gauge used (if any)'}
            hint={value.method === 'pressure-at-zero' ? 'Name the gauge, e.g. “Gauge PG-3 on the pump suction”.' : 'e.g. “Two-pole tester TV-11, proved on a proving unit before and after”.'}
            value={value.instrument}
            onChangeText={(t) => set('instrument', t)}
            error={errors['proof.instrument'] ?? errors.instrument}
            testID="proof-instrument"
          />
          <TextField label="Reading" hint="e.g. 0 V L–N, L–E, N–E; 0.0 bar" value={value.reading} onChangeText={(t) => set('reading', t)} error={errors['proof.reading'] ?? errors.reading} testID="proof-reading" />
          <TextField label={value.method === 'other' ? 'How it was proved' : 'Note (optional)'} value={value.note} onChangeText={(t) => set('note', t)} error={errors['proof.note'] ?? errors.note} testID="proof-note" />
        </>
      ) : null}
    </View>
  );
}
