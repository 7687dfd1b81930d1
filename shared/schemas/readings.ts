// Validation for reading sets, heating system settings and the expansion vessel
// calculator, built on the shared plant-check schemas so forms and API agree.
import { array, date, mixed, number, object, string, type InferType } from 'yup';

import {
  expansionVesselInputsSchema,
  GLYCOL_KINDS,
  GLYCOL_RANGE,
  heatingReadingsSchema,
  heatingSystemSettingsSchema,
  INHIBITOR_RESULTS,
  LIQUID_WATER_RANGE_C,
  PRE_CHARGE_MARGIN_CHOICES,
  WATER_APPEARANCES,
  type GlycolKind,
  type InhibitorResult,
  type WaterAppearance,
} from '@/shared/calc';
import { READING_VALUE_KEYS } from '@/shared/rules/reading-keys';
import { idField } from '@/shared/schemas/request';

// A reading may be logged a little ahead of the server clock (phone clocks drift).
const CLOCK_SKEW_MS = 5 * 60_000;
// Infrared thermometers read far beyond water temperatures (flues, motors); these bounds catch typos only.
const SURFACE_MIN_C = -50;
const SURFACE_MAX_C = 600;
export const MAX_SURFACE_TEMPERATURES = 12;

const { min: minC, max: maxC } = LIQUID_WATER_RANGE_C;

const surfaceTemperatureSchema = object({
  location: string().trim().required('Say where the temperature was taken.').max(80, 'At most 80 characters.'),
  temperatureC: number()
    .typeError('Enter a number.')
    .required('Enter the temperature.')
    .min(SURFACE_MIN_C, `At least ${SURFACE_MIN_C} °C.`)
    .max(SURFACE_MAX_C, `At most ${SURFACE_MAX_C} °C.`),
});

// Bounds catch typing slips (a pressure in the wrong unit, a misplaced point), not plant limits.
const ranged = (label: string, min: number, max: number, unit: string) =>
  number().label(label).min(min, `${label} must be at least ${min}${unit}`).max(max, `${label} must be at most ${max}${unit}`).nullable().optional();
const hotWaterC = (label: string) => ranged(label, 0, 100, ' °C');
// Up to 10 bar: commercial gas supplies can be at medium pressure ahead of the appliance governor.
const gasPa = (label: string) => ranged(label, 0, 1e6, ' Pa');
const unitPa = (label: string) => ranged(label, 0, 25e5, ' Pa');

/** Readings beyond the heating circuit: gas, flue gas, hot water, water treatment, the pressurisation unit. */
const visitReadingFields = {
  gaugeHeightM: ranged('Gauge height', -100, 300, ' m'),
  outsideTemperatureC: ranged('Outside temperature', -50, 60, ' °C'),
  gasStandingPressurePa: gasPa('Standing gas pressure'),
  gasWorkingPressurePa: gasPa('Working gas pressure'),
  burnerPressurePa: gasPa('Burner pressure'),
  flueO2Percent: ranged('O₂', 0, 21, ' %'),
  flueCo2Percent: ranged('CO₂', 0, 20, ' %'),
  flueCoPpm: ranged('CO', 0, 20000, ' ppm'),
  flueTemperatureC: ranged('Flue temperature', -20, 600, ' °C'),
  combustionEfficiencyPercent: ranged('Efficiency', 0, 120, ' %'),
  storeTemperatureC: hotWaterC('Store temperature'),
  hotWaterReturnTemperatureC: hotWaterC('Hot water return temperature'),
  outletTemperatureC: hotWaterC('Outlet temperature'),
  outletRunSeconds: ranged('Time run', 0, 3600, ' s'),
  inhibitorResult: mixed<InhibitorResult>().oneOf([...INHIBITOR_RESULTS], 'Choose one of the test kit’s results.').nullable().optional(),
  waterPh: ranged('pH', 0, 14, ''),
  conductivityUSPerCm: ranged('Conductivity', 0, 100000, ' µS/cm'),
  waterAppearance: mixed<WaterAppearance>().oneOf([...WATER_APPEARANCES], 'Choose how the sample looked.').nullable().optional(),
  unitCutInPressureGaugePa: unitPa('Cut-in pressure'),
  unitCutOutPressureGaugePa: unitPa('Cut-out pressure'),
};

/** One set of readings in SI (°C, m³/s, Pa gauge), with surface temperatures and a note. */
export const readingSetSchema = heatingReadingsSchema
  .shape({
    ...visitReadingFields,
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
      READING_VALUE_KEYS.some((k) => v[k] !== null && v[k] !== undefined) ||
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
  glycolKind: mixed<GlycolKind>().oneOf([...GLYCOL_KINDS], 'Choose propylene or ethylene glycol.').nullable().optional(),
  glycolPercent: ranged('Glycol concentration', 0, GLYCOL_RANGE.maxPercent, ' %'),
  compensationOutsideLowC: ranged('Outside temperature (cold end)', -50, 40, ' °C'),
  compensationFlowAtLowC: ranged('Flow at the cold end', minC, maxC, ' °C'),
  compensationOutsideHighC: ranged('Outside temperature (mild end)', -50, 40, ' °C'),
  compensationFlowAtHighC: ranged('Flow at the mild end', minC, maxC, ' °C'),
}).test('max-above-fill', 'Maximum flow temperature must be above the fill temperature', function check(value) {
  const { fillTemperatureC: fill, maxFlowTemperatureC: max } = value ?? {};
  if (typeof fill !== 'number' || typeof max !== 'number' || max > fill) return true;
  return this.createError({ path: 'maxFlowTemperatureC', message: 'Maximum flow temperature must be above the fill temperature' });
}).test('curve-order', 'The mild end must be warmer outside than the cold end', function check(value) {
  const { compensationOutsideLowC: low, compensationOutsideHighC: high } = value ?? {};
  if (typeof low !== 'number' || typeof high !== 'number' || high > low) return true;
  return this.createError({ path: 'compensationOutsideHighC', message: 'The mild end must be warmer outside than the cold end' });
}).test('glycol-both', 'Give the glycol and its concentration together', function check(value) {
  const { glycolKind: kind, glycolPercent: percent } = value ?? {};
  if (!kind === (percent === null || percent === undefined)) return true;
  return this.createError({ path: kind ? 'glycolPercent' : 'glycolKind', message: 'Give the glycol and its concentration together' });
});
export type HeatingSystemInput = InferType<typeof heatingSystemSchema>;

/** Calculator inputs (litres, °C, metres, bar gauge) with an optional choice of pre-charge margin. */
export const expansionVesselRequestSchema = expansionVesselInputsSchema.shape({ preChargeMarginBar });
export type ExpansionVesselRequest = InferType<typeof expansionVesselRequestSchema>;

/** `/sites/:id/systems/:name`: the system is the `system` text on the site's items, 1–120 characters. */
export const systemParams = object({
  id: idField().required(),
  name: string().trim().required('Name a system of up to 120 characters.').max(120, 'Name a system of up to 120 characters.'),
});
