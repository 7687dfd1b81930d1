import { View } from 'react-native';
import { FieldMessage, FormTextField } from '@/components/forms/bound-fields';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ENERGY_SOURCE_ICONS } from '@/components/register/register-vocabulary';
import { PointEditor } from '@/components/tags/point-editor';
import { ProofFields } from '@/components/tags/proof-fields';
import { newPoint } from '@/components/tags/raise-form-values';
import { useRaiseForm } from '@/components/tags/raise-steps-kind';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { MIN_OMISSION_REASON } from '@/shared/rules/tag-isolation';
import type { Asset } from '@/shared/types/register';

/** Step 2 of an isolation: which of the item's own energy sources, and where and how each is isolated. */
function IsolationDetails({ asset }: { asset: Asset }) {
  const { values, set } = useRaiseForm();
  const toggle = (s: (typeof values.energySources)[number]) =>
    set('energySources', values.energySources.includes(s) ? values.energySources.filter((x) => x !== s) : asset.energySources.filter((x) => x === s || values.energySources.includes(x)));
  return (
    <View style={{ gap: space.md }}>
      <View style={{ gap: space.sm }}>
        <Text variant="label" bold>Energy sources isolated</Text>
        {asset.energySources.length ? (
          <>
            <Text variant="small" muted>{`The sources recorded for ${asset.plantId}. Choose every one you have isolated.`}</Text>
            <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
              {asset.energySources.map((s) => (
                <Chip key={s} label={ENERGY_SOURCE_LABELS[s]} icon={ENERGY_SOURCE_ICONS[s]} selected={values.energySources.includes(s)} onPress={() => toggle(s)} testID={`source-${s}`} />
              ))}
            </View>
          </>
        ) : (
          <Notice tone="caution" word="No energy sources recorded">
            This item’s record lists no energy sources, so an isolation cannot be recorded against it. Ask for the item’s record to be completed first.
          </Notice>
        )}
        {asset.energySources.filter((s) => !values.energySources.includes(s)).map((s) => (
          <FormTextField
            key={s}
            name={`omitted.${s}`}
            label={`${ENERGY_SOURCE_LABELS[s]} — not isolated: why is it safe?`}
            hint={`At least ${MIN_OMISSION_REASON} characters, e.g. “drained down at the valves either side”.`}
            testID={`omit-${s}`}
          />
        ))}
        <FieldMessage name="energySources" />
        <FieldMessage name="omittedSources" />
      </View>
      <View style={{ gap: space.sm }}>
        <Text variant="label" bold>Isolation points and methods</Text>
        <Text variant="small" muted>Where the energy is isolated: another plant item such as a valve or an electrical isolator, or a described point such as a distribution board way.</Text>
        {values.points.map((p, i) => (
          <PointEditor
            key={p.key}
            index={i}
            point={p}
            siteId={asset.siteId}
            excludeAssetId={asset.id}
            onChange={(next) => set('points', values.points.map((x) => (x.key === p.key ? next : x)))}
            onRemove={values.points.length > 1 ? () => set('points', values.points.filter((x) => x.key !== p.key)) : undefined}
          />
        ))}
        <FieldMessage name="points" />
        <Button title="Add another point" variant="secondary" onPress={() => set('points', [...values.points, newPoint()])} testID="add-point" />
      </View>
      <Notice tone="mandatory" title="prove it before work">
        Test for dead with a proved tester, check the gauge reads zero, or try the start controls. A wrong breaker, a back-feed or a passing valve is only found by proving.
      </Notice>
      <ProofFields name="proof" optional />
    </View>
  );
}

/** Step 2 of an override: the normal state and the state it was left in. */
function OverrideDetails() {
  return (
    <View style={{ gap: space.sm }}>
      <FormTextField name="normalState" label="Normal state" hint="e.g. Flow setpoint 80 °C, actuator on auto" testID="raise-normal-state" />
      <FormTextField name="leftState" label="State it was left in" hint="e.g. Flow setpoint 85 °C, actuator on manual at 40 %" testID="raise-left-state" />
    </View>
  );
}

export function DetailsStep({ asset }: { asset: Asset }) {
  const { values } = useRaiseForm();
  const isolation = values.kind === 'isolation';
  return (
    <View style={{ gap: space.md }}>
      {isolation ? <IsolationDetails asset={asset} /> : <OverrideDetails />}
      <FormTextField
        name="lockNumber"
        label={isolation ? 'Your personal lock number' : 'Lock or tag number (optional)'}
        hint={isolation ? 'Required: the number on the lock you have put on. Not a plant or switchgear reference.' : 'Optional.'}
        autoCapitalize="characters"
        testID="raise-lock-number"
      />
    </View>
  );
}
