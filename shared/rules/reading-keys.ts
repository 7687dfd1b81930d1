// The readings a set can carry, by API key. Numbers are SI as stored (°C, Pa gauge, m³/s, m);
// percentages, ppm, pH, µS/cm and seconds as the trade reads them. Two are categories.
import type { ReadingValues } from '@/shared/types/readings';

export const READING_NUMBER_KEYS = [
  'flowTemperatureC',
  'returnTemperatureC',
  'flowSetpointC',
  'flowRateM3PerS',
  'systemPressureGaugePa',
  'pumpInletPressureGaugePa',
  'pumpOutletPressureGaugePa',
  'gaugeHeightM',
  'outsideTemperatureC',
  'gasStandingPressurePa',
  'gasWorkingPressurePa',
  'burnerPressurePa',
  'flueO2Percent',
  'flueCo2Percent',
  'flueCoPpm',
  'flueTemperatureC',
  'combustionEfficiencyPercent',
  'storeTemperatureC',
  'hotWaterReturnTemperatureC',
  'outletTemperatureC',
  'outletRunSeconds',
  'waterPh',
  'conductivityUSPerCm',
  'unitCutInPressureGaugePa',
  'unitCutOutPressureGaugePa',
] as const satisfies readonly (keyof ReadingValues)[];
export type ReadingNumberKey = (typeof READING_NUMBER_KEYS)[number];

export const READING_CHOICE_KEYS = ['inhibitorResult', 'waterAppearance'] as const satisfies readonly (keyof ReadingValues)[];
export type ReadingChoiceKey = (typeof READING_CHOICE_KEYS)[number];

export const READING_VALUE_KEYS = [...READING_NUMBER_KEYS, ...READING_CHOICE_KEYS] as const;
export type ReadingValueKey = (typeof READING_VALUE_KEYS)[number];

export const emptyReadingValues = (): ReadingValues => ({
  ...(Object.fromEntries(READING_VALUE_KEYS.map((k) => [k, null])) as Omit<ReadingValues, 'surfaceTemperatures'>),
  surfaceTemperatures: [],
});

/** The set's values from a body or a row: every key, null where not read. */
export function pickReadingValues(source: Partial<Record<ReadingValueKey, unknown>>): Omit<ReadingValues, 'surfaceTemperatures'> {
  return Object.fromEntries(READING_VALUE_KEYS.map((k) => [k, source[k] ?? null])) as Omit<ReadingValues, 'surfaceTemperatures'>;
}
