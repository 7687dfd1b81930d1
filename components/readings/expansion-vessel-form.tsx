import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Formik, getIn, setIn, type FormikErrors } from 'formik';
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { ValidationError } from 'yup';
import { initialVesselForm, vesselFormPath, vesselFormToRequest, type VesselFormValues } from '@/components/readings/expansion-vessel-fields';
import { GlycolChoice } from '@/components/readings/glycol-choice';
import { ExpansionVesselResultView } from '@/components/readings/expansion-vessel-result';
import { MarginChoice } from '@/components/readings/margin-choice';
import { FormMeasurementField } from '@/components/readings/measurement-field';
import { colors, layout, space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useExpansionVesselCheckMutation } from '@/hooks/api/use-calc';
import { Chip } from '@/components/ui/chip';
import { GLYCOL_SOURCE, UNIT_OPTIONS, type ExpansionVesselInputs } from '@/shared/calc';
import { expansionVesselRequestSchema, type ExpansionVesselRequest } from '@/shared/schemas/readings';

type Errors = FormikErrors<VesselFormValues>;
const LITRES = [{ key: 'L', label: 'L' }];
const CELSIUS = UNIT_OPTIONS.temperature;
const METRES = UNIT_OPTIONS.length;
const PERCENT = UNIT_OPTIONS.percent;

async function validateVessel(values: VesselFormValues): Promise<Errors> {
  const { body, unreadable } = vesselFormToRequest(values);
  let errors: Errors = {};
  try {
    await expansionVesselRequestSchema.validate(body, { abortEarly: false });
  } catch (err) {
    if (!(err instanceof ValidationError)) throw err;
    for (const e of err.inner.length ? err.inner : [err]) {
      const path = vesselFormPath(e.path ?? '');
      if (path && !getIn(errors, path)) errors = setIn(errors, path, e.message);
    }
  }
  for (const [path, message] of Object.entries(unreadable)) errors = setIn(errors, path, message);
  return errors;
}

/** The EN 12828 vessel calculator; `initial` prefills it, e.g. from a system and the register. */
export function ExpansionVesselForm({ initial, initialMarginBar }: { initial?: Partial<ExpansionVesselInputs> | null; initialMarginBar?: number | null }) {
  const { isWide } = useBreakpoints();
  const check = useExpansionVesselCheckMutation();
  const [checkedJson, setCheckedJson] = useState<string | null>(null);
  const initialValues = useMemo(() => initialVesselForm(initial, initialMarginBar), [initial, initialMarginBar]);
  return (
    <Formik<VesselFormValues>
      initialValues={initialValues}
      enableReinitialize
      validate={validateVessel}
      onSubmit={async (values, helpers) => {
        const checked = await submitForm(helpers, () => check.mutateAsync(vesselFormToRequest(values).body as ExpansionVesselRequest), vesselFormPath);
        if (checked) setCheckedJson(JSON.stringify(values));
      }}
    >
      {({ values, errors, touched, setFieldValue, handleSubmit, isSubmitting, submitCount }) => {
        const show = (path: string) => (submitCount > 0 || getIn(touched, path) ? (getIn(errors, path) as string | undefined) : undefined);
        const field = (name: keyof VesselFormValues, label: string, units: readonly { key: string; label: string }[], unitField?: keyof VesselFormValues, hint?: string) => (
          <View style={isWide ? styles.fieldWide : undefined}>
            <FormMeasurementField label={label} hint={hint} entry={name} unitField={unitField} units={units} testID={`vessel-${name}`} />
          </View>
        );
        const stale = check.data && checkedJson !== null && checkedJson !== JSON.stringify(values);
        return (
          <View style={{ gap: space.md }} testID="vessel-form">
            <View style={[isWide && styles.fieldsWide]}>
              {field('systemVolume', 'System water volume', UNIT_OPTIONS.volume, 'systemVolumeUnit', 'Boilers, pipework, emitters and calorifier coils.')}
              {field('staticHeightM', 'Static height', METRES, undefined, 'From the vessel up to the highest point of the system.')}
              {field('fillTemperatureC', 'Fill temperature', CELSIUS, undefined, 'Temperature of the water when the system is filled.')}
              {field('maxFlowTemperatureC', 'Maximum flow temperature', CELSIUS, undefined, 'The highest the water can reach (limit thermostat).')}
              {field('safetyValve', 'Safety valve setting', UNIT_OPTIONS.pressure, 'safetyValveUnit')}
              {field('preCharge', 'Vessel pre-charge (optional)', UNIT_OPTIONS.pressure, 'preChargeUnit', 'Leave empty to use the minimum pre-charge.')}
            </View>
            <View style={[isWide && styles.fieldsWide]}>
              <View style={isWide ? styles.fieldWide : styles.gap}>
                <GlycolChoice value={values.glycolKind} onChange={(v) => setFieldValue('glycolKind', v)} error={show('glycolKind')} testID="vessel-glycolKind" />
              </View>
              {values.glycolKind ? field('glycolPercent', 'Glycol concentration (by mass)', PERCENT, undefined, GLYCOL_SOURCE) : null}
              {field('measuredPressure', 'Pressure read at the vessel (optional)', UNIT_OPTIONS.pressure, 'measuredPressureUnit', 'Compared with the final design pressure and the safety valve setting.')}
            </View>
            <View style={styles.modeRow} role="radiogroup" aria-label="What to work out">
              <Chip label="Check the installed vessels" selected={!values.sizeOnly} onPress={() => setFieldValue('sizeOnly', false)} testID="vessel-mode-check" />
              <Chip label="Size only: no vessel yet" selected={values.sizeOnly} onPress={() => setFieldValue('sizeOnly', true)} testID="vessel-mode-size" />
            </View>
            <View style={{ gap: space.sm, display: values.sizeOnly ? 'none' : 'flex' }}>
              <Text variant="label" bold>Installed vessels (nominal volume)</Text>
              {values.vessels.map((_, i) => (
                <View key={i} style={styles.vesselRow}>
                  <View style={{ flex: 1 }}>
                    <FormMeasurementField label={`Vessel ${i + 1}`} entry={`vessels.${i}`} units={LITRES} testID={`vessel-volume-${i}`} />
                  </View>
                  {values.vessels.length > 1 ? (
                    <Pressable onPress={() => setFieldValue('vessels', values.vessels.filter((_, j) => j !== i))} accessibilityRole="button" accessibilityLabel={`Remove vessel ${i + 1}`} style={styles.remove}>
                      <MaterialCommunityIcons name="close" size={24} color={colors.ink} />
                    </Pressable>
                  ) : null}
                </View>
              ))}
              <Button title="Add a vessel" variant="secondary" onPress={() => setFieldValue('vessels', [...values.vessels, ''])} testID="vessel-add" />
            </View>
            <MarginChoice value={values.preChargeMarginBar} onChange={(v) => setFieldValue('preChargeMarginBar', v)} />
            <FormStatusBanner word="Not checked" />
            <Button title={values.sizeOnly ? 'Size the vessel' : 'Check the vessel size'} onPress={() => handleSubmit()} busy={isSubmitting} testID="vessel-check" />
            {stale ? <Notice tone="info" word="Inputs changed">The result below is for the previous inputs. Check again to update it.</Notice> : null}
            {check.data ? <ExpansionVesselResultView result={check.data.result} settings={check.data.settings} /> : null}
          </View>
        );
      }}
    </Formik>
  );
}

const styles = StyleSheet.create({
  fieldsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
  fieldWide: { flexBasis: 320, flexGrow: 1 },
  vesselRow: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  gap: { marginBottom: space.sm },
  modeRow: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  remove: { minWidth: layout.minTouch, minHeight: layout.minTouch, marginTop: space.xl, alignItems: 'center', justifyContent: 'center' },
});
