// Validation for reading sets, heating system settings and the expansion vessel
// calculator, built on the shared plant-check schemas so forms and API agree.
import { array, date, number, object, string, type InferType } from 'yup';

import {
  expansionVesselInputsSchema,
  heatingReadingsSchema,
  heatingSystemSettingsSchema,
  LIQUID_WATER_RANGE_C,
  PRE_CHARGE_MARGIN_CHOICES,
} from '@/shared/calc';

// A reading may be logged a little ahead of the server clock (phone clocks drift).
const CLOCK_SKEW_MS = 5 * 60_000;
// Infrared thermometers read far beyond water temperatures (flues, motors); these bounds catch typos only.
const SURFACE_MIN_C = -50;
const SURFACE_MAX_C = 600;
export const MAX_SURFACE_TEMPERATURES = 12;

const { min: minC, max: maxC } = LIQUID_WATER_RANGE_C;

export const surfaceTemperatureSchema = object({
  location: string().trim().required('Say where the temperature was taken.').max(80, 'At most 80 characters.'),
  temperatureC: number()
    .typeError('Enter a number.')
    .required('Enter the temperature.')
    .min(SURFACE_MIN_C, `At least ${SURFACE_MIN_C} °C.`)
    .max(SURFACE_MAX_C, `At most ${SURFACE_MAX_C} °C.`),
});

const READING_KEYS = [
  'flowTemperatureC',
  'returnTemperatureC',
  'flowSetpointC',
  'flowRateM3PerS',
  'systemPressureGaugePa',
  'pumpInletPressureGaugePa',
  'pumpOutletPressureGaugePa',
] as const;

/** One set of readings in SI (°C, m³/s, Pa gauge), with surface temperatures and a note. */
export const readingSetSchema = heatingReadingsSchema
  .shape({
    flowSetpointC: number()
      .label('Flow setpoint')
      .min(minC, `Flow setpoint must be at least ${minC} °C`)
      .max(maxC, `Flow setpoint must be at most ${maxC} °C`)
      .nullable()
      .optional(),
    surfaceTemperatures: array(surfaceTemperatureSchema.required())
      .max(MAX_SURFACE_TEMPERATURES, `At most ${MAX_SURFACE_TEMPERATURES} surface temperatures.`)
      .default([]),
    note: string().trim().max(2000, 'At most 2000 characters.').default(''),
    takenAt: date()
      .typeError('Use a date and time.')
      .test('not-future', 'The time taken cannot be in the future.', (v) => !v || v.getTime() <= Date.now() + CLOCK_SKEW_MS)
      .optional(),
  })
  .test('something-read', 'Enter at least one reading or a note.', (value) => {
    if (!value) return false;
    const v = value as Record<string, unknown>;
    return (
      READING_KEYS.some((k) => typeof v[k] === 'number') ||
      (Array.isArray(v.surfaceTemperatures) && v.surfaceTemperatures.length > 0) ||
      (typeof v.note === 'string' && v.note.trim().length > 0)
    );
  });
export type ReadingSetInput = InferType<typeof readingSetSchema>;

/** A correction: the whole set again, plus why the original was wrong. */
export const readingCorrectionSchema = readingSetSchema.shape({
  reason: string().trim().required('Say what was wrong with the original.').min(3, 'At least 3 characters.').max(500),
});
export type ReadingCorrectionInput = InferType<typeof readingCorrectionSchema>;

const preChargeMarginBar = number()
  .label('Pre-charge margin')
  .oneOf(PRE_CHARGE_MARGIN_CHOICES.map((c) => c.value), 'Choose one of the offered pre-charge margins.')
  .nullable()
  .optional();

/** Design values of one heating system (site + system name), in SI: Pa gauge, m³, m, °C, K. */
export const heatingSystemSchema = heatingSystemSettingsSchema.shape({
  systemVolumeM3: number().label('System volume').moreThan(0, 'System volume must be above 0').max(1000).nullable().optional(),
  staticHeightM: number().label('Static height').min(0, 'Static height cannot be negative').max(300).nullable().optional(),
  maxFlowTemperatureC: number().label('Maximum flow temperature').min(minC).max(maxC).nullable().optional(),
  fillTemperatureC: number().label('Fill temperature').min(minC).max(maxC).nullable().optional(),
  preChargeMarginBar,
}).test('max-above-fill', 'Maximum flow temperature must be above the fill temperature', function check(value) {
  const { fillTemperatureC: fill, maxFlowTemperatureC: max } = value ?? {};
  if (typeof fill !== 'number' || typeof max !== 'number' || max > fill) return true;
  return this.createError({ path: 'maxFlowTemperatureC', message: 'Maximum flow temperature must be above the fill temperature' });
});
export type HeatingSystemInput = InferType<typeof heatingSystemSchema>;

/** Calculator inputs (litres, °C, metres, bar gauge) with an optional choice of pre-charge margin. */
export const expansionVesselRequestSchema = expansionVesselInputsSchema.shape({ preChargeMarginBar });
export type ExpansionVesselRequest = InferType<typeof expansionVesselRequestSchema>;
