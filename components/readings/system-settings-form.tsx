import { Formik, type FormikErrors } from 'formik';
import { StyleSheet, View } from 'react-native';
import { GlycolChoice } from '@/components/readings/glycol-choice';
import { MarginChoice } from '@/components/readings/margin-choice';
import { FormMeasurementField, type UnitOption } from '@/components/readings/measurement-field';
import { defaultUnit, entryToSi, parseEntry, siToEntry, validateMeasurements } from '@/components/readings/reading-fields';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useSaveHeatingSystemMutation } from '@/hooks/api/use-heating-systems';
import { formatNumber, UNIT_OPTIONS, type GlycolKind, type PhysicalQuantity } from '@/shared/calc';
import { heatingSystemSchema, type HeatingSystemInput } from '@/shared/schemas/readings';
import type { HeatingSystem } from '@/shared/types/readings';

type Key = Exclude<keyof HeatingSystemInput, 'preChargeMarginBar' | 'glycolKind'>;
interface FieldDef {
  key: Key;
  label: string;
  /** Null for design ΔT, which is entered in kelvin only. */
  quantity: PhysicalQuantity | null;
  hint?: string;
}

const FIELDS: FieldDef[] = [
  { key: 'designDeltaTK', label: 'Design ΔT', quantity: null, hint: 'Flow − return at design, for example 11 K or 20 K.' },
  { key: 'flowSetpointC', label: 'Flow setpoint', quantity: 'temperature' },
  { key: 'safetyValveSettingGaugePa', label: 'Safety valve setting', quantity: 'pressure', hint: 'As marked on the valve.' },
  { key: 'fillPressureGaugePa', label: 'Fill pressure', quantity: 'pressure', hint: 'Leave empty to use the pressurisation unit recorded on this system.' },
  { key: 'systemVolumeM3', label: 'System water volume', quantity: 'volume' },
  { key: 'staticHeightM', label: 'Static height', quantity: 'length', hint: 'From the vessel up to the highest point.' },
  { key: 'maxFlowTemperatureC', label: 'Maximum flow temperature', quantity: 'temperature' },
  { key: 'fillTemperatureC', label: 'Fill temperature', quantity: 'temperature' },
  { key: 'glycolPercent', label: 'Glycol concentration', quantity: 'percent', hint: 'By mass, with the glycol chosen below; empty for plain water.' },
  { key: 'compensationOutsideLowC', label: 'Compensation: cold-day outside temperature', quantity: 'temperature', hint: 'Leave the four curve values empty for a fixed setpoint.' },
  { key: 'compensationFlowAtLowC', label: 'Compensation: flow on the cold day', quantity: 'temperature' },
  { key: 'compensationOutsideHighC', label: 'Compensation: mild-day outside temperature', quantity: 'temperature' },
  { key: 'compensationFlowAtHighC', label: 'Compensation: flow on the mild day', quantity: 'temperature' },
];
const KELVIN: UnitOption[] = [{ key: 'K', label: 'K' }];

interface Values {
  entries: Record<Key, string>;
  units: Record<Key, string>;
  preChargeMarginBar: number | null;
  glycolKind: GlycolKind | null;
}

function initial(system: HeatingSystem): Values {
  const entries = {} as Record<Key, string>;
  const units = {} as Record<Key, string>;
  for (const f of FIELDS) {
    units[f.key] = f.quantity ? defaultUnit(f.quantity) : 'K';
    const v = system[f.key] as number | null;
    entries[f.key] = f.quantity ? siToEntry(v, f.quantity, units[f.key]) : v === null ? '' : formatNumber(v, 5);
  }
  return { entries, units, preChargeMarginBar: system.preChargeMarginBar, glycolKind: system.glycolKind };
}

function toBody(values: Values): { body: HeatingSystemInput; unreadable: Record<string, string> } {
  const body: Record<string, number | string | null> = { preChargeMarginBar: values.preChargeMarginBar, glycolKind: values.glycolKind };
  const unreadable: Record<string, string> = {};
  for (const f of FIELDS) {
    const text = values.entries[f.key];
    const v = f.quantity ? entryToSi(text, f.quantity, values.units[f.key]) : parseEntry(text);
    if (Number.isNaN(v)) unreadable[`entries.${f.key}`] = 'Enter a number.';
    body[f.key] = v === null || Number.isNaN(v) ? null : v;
  }
  return { body: body as unknown as HeatingSystemInput, unreadable };
}

const formPath = (apiPath: string) => (apiPath && !['_', 'preChargeMarginBar', 'glycolKind'].includes(apiPath) ? `entries.${apiPath}` : apiPath || '_');

/** Design values of one heating system; checks of every item on it use them from the next set on. */
export function SystemSettingsForm({ system, onDone }: { system: HeatingSystem; onDone: () => void }) {
  const { isWide } = useBreakpoints();
  const save = useSaveHeatingSystemMutation(system.siteId);
  return (
    <Formik<Values>
      initialValues={initial(system)}
      validate={(values) => validateMeasurements<Values>(heatingSystemSchema, toBody(values), formPath)}
      onSubmit={async (values, helpers) => {
        const saved = await submitForm(helpers, () => save.mutateAsync({ name: system.name, input: toBody(values).body }), formPath);
        if (saved) onDone();
      }}
    >
      {({ values, errors, setFieldValue, handleSubmit, isSubmitting, submitCount }) => {
        const errs = errors as FormikErrors<Values> & { _?: string };
        return (
          <View style={{ gap: space.sm }} testID="system-settings-form">
            <View style={[isWide && styles.wide]}>
              {FIELDS.map((f) => (
                <View key={f.key} style={isWide ? styles.fieldWide : undefined}>
                  <FormMeasurementField label={f.label} hint={f.hint} entry={`entries.${f.key}`} unitField={`units.${f.key}`} units={f.quantity ? UNIT_OPTIONS[f.quantity] : KELVIN} testID={`system-${f.key}`} />
                </View>
              ))}
            </View>
            <GlycolChoice value={values.glycolKind} onChange={(v) => setFieldValue('glycolKind', v)} error={submitCount > 0 && errs.glycolKind} testID="system-glycolKind" />
            <MarginChoice value={values.preChargeMarginBar} onChange={(v) => setFieldValue('preChargeMarginBar', v)} />
            {submitCount > 0 && errs._ ? <Notice tone="caution" word="Check">{errs._}</Notice> : null}
            <FormStatusBanner word="Not saved" />
            <Button title="Save system values" onPress={() => handleSubmit()} busy={isSubmitting} testID="system-save" />
          </View>
        );
      }}
    </Formik>
  );
}

const styles = StyleSheet.create({
  wide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg },
  fieldWide: { flexBasis: 280, flexGrow: 1 },
});
