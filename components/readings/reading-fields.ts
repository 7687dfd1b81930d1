// The reading form's fields: what each measures, the units offered, and the
// conversion between what was typed and the SI values the API stores.
import { formatNumber, fromSi, toSi, UNIT_OPTIONS, type PhysicalQuantity } from '@/shared/calc';
import type { ReadingValueKey } from '@/shared/rules/readings';
import type { ReadingValues } from '@/shared/types/readings';

export interface MeasurementDef<K extends string = string> {
  key: K;
  label: string;
  quantity: PhysicalQuantity;
  hint?: string;
}

export const READING_FIELDS: MeasurementDef<ReadingValueKey>[] = [
  { key: 'flowTemperatureC', label: 'Flow temperature', quantity: 'temperature' },
  { key: 'returnTemperatureC', label: 'Return temperature', quantity: 'temperature' },
  { key: 'flowSetpointC', label: 'Setpoint', quantity: 'temperature', hint: 'Flow setpoint shown on the controller.' },
  { key: 'systemPressureGaugePa', label: 'System pressure', quantity: 'pressure', hint: 'Gauge pressure.' },
  { key: 'pumpInletPressureGaugePa', label: 'Pump inlet pressure', quantity: 'pressure' },
  { key: 'pumpOutletPressureGaugePa', label: 'Pump outlet pressure', quantity: 'pressure' },
  { key: 'flowRateM3PerS', label: 'Flow rate', quantity: 'flow', hint: 'Only where a meter is fitted.' },
];

export type UnitChoice = Record<string, string>;

export const defaultUnit = (quantity: PhysicalQuantity): string => UNIT_OPTIONS[quantity][0].key;
export const unitLabel = (quantity: PhysicalQuantity, unit: string): string =>
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
  return toSi(quantity, unit as never, n);
}

/** An SI value → text in a unit, for prefilling a form. */
export function siToEntry(value: number | null | undefined, quantity: PhysicalQuantity, unit: string): string {
  if (value === null || value === undefined) return '';
  return formatNumber(fromSi(quantity, unit as never, value), 5);
}

export interface ReadingFormValues {
  entries: Record<ReadingValueKey, string>;
  units: UnitChoice;
  surfaceTemperatures: { location: string; temperatureC: string }[];
  note: string;
  reason: string;
}

export function initialReadingForm(from?: ReadingValues | null, note = ''): ReadingFormValues {
  const units: UnitChoice = {};
  const entries = {} as Record<ReadingValueKey, string>;
  for (const f of READING_FIELDS) {
    units[f.key] = defaultUnit(f.quantity);
    entries[f.key] = siToEntry(from?.[f.key], f.quantity, units[f.key]);
  }
  return {
    entries,
    units,
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
  if ((READING_FIELDS as { key: string }[]).some((f) => f.key === apiPath)) return `entries.${apiPath}`;
  // yup writes array items as surfaceTemperatures[0].location; formik uses dots.
  return apiPath.replace(/\[(\d+)\]/g, '.$1');
}

/** The set's values as engineers read them (°C, bar, L/s), for a compact summary. */
export function describeValues(values: ReadingValues): { label: string; text: string }[] {
  const out: { label: string; text: string }[] = [];
  for (const f of READING_FIELDS) {
    const v = values[f.key];
    if (v === null || v === undefined) continue;
    const unit = defaultUnit(f.quantity);
    out.push({ label: f.label, text: `${formatNumber(fromSi(f.quantity, unit as never, v), 4)} ${unitLabel(f.quantity, unit)}` });
  }
  for (const s of values.surfaceTemperatures) out.push({ label: s.location, text: `${formatNumber(s.temperatureC, 4)} °C` });
  return out;
}
