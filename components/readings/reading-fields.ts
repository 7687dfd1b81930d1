// The reading form's fields: what each measures, the units offered, and the
// conversion between what was typed and the SI values the API stores.
import { setIn, type FormikErrors } from 'formik';
import type { AnySchema } from 'yup';
import { nestErrors, type FieldPathMap } from '@/components/forms/submit';
import { formatNumber, fromSi, INHIBITOR_LABELS, toSi, UNIT_OPTIONS, WATER_APPEARANCE_LABELS, type PhysicalQuantity, type UnitKey } from '@/shared/calc';
import { READING_CHOICE_KEYS, READING_NUMBER_KEYS, type ReadingChoiceKey, type ReadingNumberKey } from '@/shared/rules/reading-keys';
import { validateFields } from '@/shared/schemas/field-errors';
import type { ReadingValues } from '@/shared/types/readings';

interface MeasurementDef<K extends string = string> {
  key: K;
  label: string;
  quantity: PhysicalQuantity;
  hint?: string;
}

export const READING_FIELD_DEFS: Record<ReadingNumberKey, MeasurementDef<ReadingNumberKey>> = {
  flowTemperatureC: { key: 'flowTemperatureC', label: 'Flow temperature', quantity: 'temperature' },
  returnTemperatureC: { key: 'returnTemperatureC', label: 'Return temperature', quantity: 'temperature' },
  flowSetpointC: { key: 'flowSetpointC', label: 'Setpoint', quantity: 'temperature', hint: 'Flow setpoint shown on the controller.' },
  flowRateM3PerS: { key: 'flowRateM3PerS', label: 'Flow rate', quantity: 'flow', hint: 'Only where a meter is fitted.' },
  systemPressureGaugePa: { key: 'systemPressureGaugePa', label: 'System pressure', quantity: 'pressure', hint: 'Gauge pressure.' },
  gaugeHeightM: { key: 'gaugeHeightM', label: 'Gauge height above the vessel', quantity: 'length', hint: 'Negative when the gauge is below it. Each metre adds 0.0981 bar (1 m of water ≈ 0.1 bar).' },
  pumpInletPressureGaugePa: { key: 'pumpInletPressureGaugePa', label: 'Pump inlet pressure', quantity: 'pressure' },
  pumpOutletPressureGaugePa: { key: 'pumpOutletPressureGaugePa', label: 'Pump outlet pressure', quantity: 'pressure' },
  outsideTemperatureC: { key: 'outsideTemperatureC', label: 'Outside temperature', quantity: 'temperature', hint: 'For a weather-compensated system: the setpoint follows it.' },
  gasStandingPressurePa: { key: 'gasStandingPressurePa', label: 'Standing gas pressure', quantity: 'gasPressure', hint: 'At the appliance inlet, appliance off.' },
  gasWorkingPressurePa: { key: 'gasWorkingPressurePa', label: 'Working gas pressure', quantity: 'gasPressure', hint: 'At the appliance inlet, firing at full rate.' },
  burnerPressurePa: { key: 'burnerPressurePa', label: 'Burner pressure', quantity: 'gasPressure', hint: 'Where the appliance has a burner test point.' },
  flueO2Percent: { key: 'flueO2Percent', label: 'O₂', quantity: 'percent' },
  flueCo2Percent: { key: 'flueCo2Percent', label: 'CO₂', quantity: 'percent', hint: 'Leave empty to work it out from O₂.' },
  flueCoPpm: { key: 'flueCoPpm', label: 'CO', quantity: 'ppm' },
  flueTemperatureC: { key: 'flueTemperatureC', label: 'Flue temperature', quantity: 'temperature' },
  combustionEfficiencyPercent: { key: 'combustionEfficiencyPercent', label: 'Efficiency', quantity: 'percent', hint: 'When the analyser gives it.' },
  storeTemperatureC: { key: 'storeTemperatureC', label: 'Stored water temperature', quantity: 'temperature', hint: 'At the calorifier or cylinder outlet or its pocket.' },
  hotWaterReturnTemperatureC: { key: 'hotWaterReturnTemperatureC', label: 'Hot water return temperature', quantity: 'temperature', hint: 'Circulation return, as it enters the store.' },
  outletTemperatureC: { key: 'outletTemperatureC', label: 'Hot outlet temperature', quantity: 'temperature', hint: 'At a sentinel outlet.' },
  outletRunSeconds: { key: 'outletRunSeconds', label: 'Time run before reading', quantity: 'time', hint: 'Leave empty for the usual one minute.' },
  waterPh: { key: 'waterPh', label: 'pH', quantity: 'ph' },
  conductivityUSPerCm: { key: 'conductivityUSPerCm', label: 'Conductivity', quantity: 'conductivity' },
  unitCutInPressureGaugePa: { key: 'unitCutInPressureGaugePa', label: 'Cut-in pressure', quantity: 'pressure', hint: 'Where the unit’s pump starts.' },
  unitCutOutPressureGaugePa: { key: 'unitCutOutPressureGaugePa', label: 'Cut-out pressure', quantity: 'pressure', hint: 'Where the unit’s pump stops.' },
};

/** Every numeric field, in the order of the API keys. */
const READING_FIELDS: MeasurementDef<ReadingNumberKey>[] = READING_NUMBER_KEYS.map((k) => READING_FIELD_DEFS[k]);

export const CHOICE_FIELD_DEFS: Record<ReadingChoiceKey, { label: string; options: Record<string, string> }> = {
  inhibitorResult: { label: 'Inhibitor (test kit)', options: INHIBITOR_LABELS },
  waterAppearance: { label: 'Appearance of a sample', options: WATER_APPEARANCE_LABELS },
};

export const isChoiceKey = (key: string): key is ReadingChoiceKey => (READING_CHOICE_KEYS as readonly string[]).includes(key);

type UnitChoice = Record<string, string>;

export const defaultUnit = (quantity: PhysicalQuantity): string => UNIT_OPTIONS[quantity][0].key;
const unitLabel = (quantity: PhysicalQuantity, unit: string): string =>
  (UNIT_OPTIONS[quantity] as readonly { key: string; label: string }[]).find((u) => u.key === unit)?.label ?? unit;

/** Reads a typed number; a decimal comma is accepted. Empty → null; not a number → NaN. */
export function parseEntry(text: string): number | null {
  const trimmed = text.trim().replace(/\s+/g, '');
  if (trimmed === '') return null;
  const normalised = trimmed.replace(',', '.');
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(normalised) ? Number(normalised) : Number.NaN;
}

/** A typed value in its chosen unit → SI (null when empty, NaN when not a number). */
export function entryToSi(text: string, quantity: PhysicalQuantity, unit: string): number | null {
  const n = parseEntry(text);
  if (n === null || Number.isNaN(n)) return n;
  return toSi(quantity, unit as UnitKey<PhysicalQuantity>, n);
}

/** An SI value → text in a unit, for prefilling a form. */
export function siToEntry(value: number | null | undefined, quantity: PhysicalQuantity, unit: string): string {
  if (value === null || value === undefined) return '';
  return formatNumber(fromSi(quantity, unit as UnitKey<PhysicalQuantity>, value), 5);
}

export interface ReadingFormValues {
  entries: Record<ReadingNumberKey, string>;
  units: UnitChoice;
  choices: Record<ReadingChoiceKey, string | null>;
  surfaceTemperatures: { location: string; temperatureC: string }[];
  note: string;
  reason: string;
}

export function initialReadingForm(from?: ReadingValues | null, note = ''): ReadingFormValues {
  const units: UnitChoice = {};
  const entries = {} as Record<ReadingNumberKey, string>;
  for (const f of READING_FIELDS) {
    units[f.key] = defaultUnit(f.quantity);
    entries[f.key] = siToEntry(from?.[f.key], f.quantity, units[f.key]);
  }
  return {
    entries,
    units,
    choices: { inhibitorResult: from?.inhibitorResult ?? null, waterAppearance: from?.waterAppearance ?? null },
    surfaceTemperatures: (from?.surfaceTemperatures ?? []).map((s) => ({ location: s.location, temperatureC: formatNumber(s.temperatureC, 5) })),
    note,
    reason: '',
  };
}

/**
 * The form in SI, as the API takes it. Fields that are not numbers come back in `unreadable`
 * (the schema would otherwise see them as empty).
 */
export function readingFormToSi(values: ReadingFormValues): { body: Record<string, unknown>; unreadable: Record<string, string> } {
  const body: Record<string, unknown> = {};
  const unreadable: Record<string, string> = {};
  for (const f of READING_FIELDS) {
    const si = entryToSi(values.entries[f.key], f.quantity, values.units[f.key] ?? defaultUnit(f.quantity));
    if (Number.isNaN(si)) unreadable[`entries.${f.key}`] = 'Enter a number.';
    body[f.key] = Number.isNaN(si) ? null : si;
  }
  for (const k of READING_CHOICE_KEYS) body[k] = values.choices?.[k] || null; // '' when a choice is cleared
  body.surfaceTemperatures = values.surfaceTemperatures.map((s, i) => {
    const t = parseEntry(s.temperatureC);
    if (Number.isNaN(t)) unreadable[`surfaceTemperatures.${i}.temperatureC`] = 'Enter a number.';
    return { location: s.location, temperatureC: t === null || Number.isNaN(t) ? undefined : t };
  });
  body.note = values.note;
  if (values.reason) body.reason = values.reason;
  return { body, unreadable };
}

/** Maps an API or schema field path (SI names) onto the form's field path. */
export function formPathFor(apiPath: string): string {
  if ((READING_NUMBER_KEYS as readonly string[]).includes(apiPath)) return `entries.${apiPath}`;
  if (isChoiceKey(apiPath)) return `choices.${apiPath}`;
  // yup writes array items as surfaceTemperatures[0].location; formik uses dots.
  return apiPath.replace(/\[(\d+)\]/g, '.$1');
}

/** The set's values as engineers read them (°C, bar, mbar, L/s), for a compact summary. */
export function describeValues(values: ReadingValues): { label: string; text: string }[] {
  const out: { label: string; text: string }[] = [];
  for (const f of READING_FIELDS) {
    const v = values[f.key];
    if (v === null || v === undefined) continue;
    const unit = defaultUnit(f.quantity);
    const label = unitLabel(f.quantity, unit);
    out.push({ label: f.label, text: `${formatNumber(fromSi(f.quantity, unit as UnitKey<PhysicalQuantity>, v), 4)}${label === 'pH' ? '' : ` ${label}`}` });
  }
  for (const k of READING_CHOICE_KEYS) {
    const v = values[k];
    if (v) out.push({ label: CHOICE_FIELD_DEFS[k].label, text: CHOICE_FIELD_DEFS[k].options[v] ?? v });
  }
  for (const s of values.surfaceTemperatures) out.push({ label: s.location, text: `${formatNumber(s.temperatureC, 4)} °C` });
  return out;
}

/**
 * A form of typed measurements checked as the server checks it: the shared schema on the SI body, each message
 * put on the form's own field, and entries that are not numbers named too.
 */
export async function validateMeasurements<T>(schema: AnySchema, { body, unreadable }: { body: unknown; unreadable: Record<string, string> }, pathFor: FieldPathMap): Promise<FormikErrors<T> & { _?: string }> {
  let errors = nestErrors<T>(await validateFields(schema, body), pathFor);
  for (const [path, message] of Object.entries(unreadable)) errors = setIn(errors, path, message);
  return errors;
}
