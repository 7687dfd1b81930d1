// Validation shared by forms and the API, so both sides accept and refuse the same values.
import { array, mixed, number, object } from 'yup';

import { GLYCOL_KINDS, GLYCOL_RANGE, type GlycolKind } from '@/shared/calc/glycol';

import { LIQUID_WATER_RANGE_C } from '@/shared/calc/water';
import { STANDARD_ATMOSPHERE_PA } from '@/shared/calc/units';

const { min: minC, max: maxC } = LIQUID_WATER_RANGE_C;
// Upper bounds catch unit slips (kPa typed as Pa, L/s as m³/s), not plant limits.
const MAX_GAUGE_PRESSURE_PA = 100e5;
const MAX_FLOW_M3_PER_S = 10;

const temperatureC = (label: string) =>
  number()
    .label(label)
    .min(minC, `${label} must be at least ${minC} °C`)
    .max(maxC, `${label} must be at most ${maxC} °C`);

// A gauge pressure cannot be below a full vacuum.
const gaugePressurePa = (label: string) =>
  number()
    .label(label)
    .min(-STANDARD_ATMOSPHERE_PA, `${label} cannot be below a full vacuum`)
    .max(MAX_GAUGE_PRESSURE_PA, `${label} must be at most 100 bar`);

/** One set of heating readings in SI: °C, m³/s, Pa gauge. Every reading is optional. */
export const heatingReadingsSchema = object({
  flowTemperatureC: temperatureC('Flow temperature').nullable().optional(),
  returnTemperatureC: temperatureC('Return temperature').nullable().optional(),
  flowRateM3PerS: number()
    .label('Flow rate')
    .min(0, 'Flow rate cannot be negative')
    .max(MAX_FLOW_M3_PER_S, 'Flow rate is implausibly high')
    .nullable()
    .optional(),
  systemPressureGaugePa: gaugePressurePa('System pressure').nullable().optional(),
  pumpInletPressureGaugePa: gaugePressurePa('Pump inlet pressure').nullable().optional(),
  pumpOutletPressureGaugePa: gaugePressurePa('Pump outlet pressure').nullable().optional(),
});

/** Design values for one heating system, in SI. */
export const heatingSystemSettingsSchema = object({
  designDeltaTK: number().label('Design ΔT').moreThan(0, 'Design ΔT must be above 0 K').max(100).nullable().optional(),
  flowSetpointC: temperatureC('Flow setpoint').nullable().optional(),
  fillPressureGaugePa: gaugePressurePa('Fill pressure')
    .min(0, 'Fill pressure cannot be negative')
    .nullable()
    .optional(),
  safetyValveSettingGaugePa: gaugePressurePa('Safety valve setting')
    .moreThan(0, 'Safety valve setting must be above 0')
    .nullable()
    .optional(),
}).test('fill-below-valve', 'Fill pressure must be below the safety valve setting', (value) => {
  const { fillPressureGaugePa: fill, safetyValveSettingGaugePa: valve } = value ?? {};
  return fill === null || fill === undefined || valve === null || valve === undefined || fill < valve;
});

/** Inputs of the expansion vessel check: litres, °C, metres, bar gauge. */
export const expansionVesselInputsSchema = object({
  systemVolumeL: number().label('System volume').required().moreThan(0, 'System volume must be above 0 L'),
  fillTemperatureC: temperatureC('Fill temperature').required(),
  maxFlowTemperatureC: temperatureC('Maximum flow temperature')
    .required()
    .test('above-fill', 'Maximum flow temperature must be above the fill temperature', function check(value) {
      const fill = this.parent.fillTemperatureC as number | undefined;
      return fill === undefined || fill === null || value === undefined || value > fill;
    }),
  staticHeightM: number().label('Static height').required().min(0, 'Static height cannot be negative').max(300),
  safetyValveSettingBarGauge: number()
    .label('Safety valve setting')
    .required()
    .moreThan(0, 'Safety valve setting must be above 0 bar')
    .max(100),
  preChargeBarGauge: number().label('Pre-charge').min(0, 'Pre-charge cannot be negative').max(100).nullable().optional(),
  installedVesselVolumesL: array(
    number().label('Vessel volume').required().moreThan(0, 'Each vessel volume must be above 0 L'),
  )
    .required()
    .default([]),
  mode: mixed<'check' | 'size'>().oneOf(['check', 'size'], 'Choose check or size only.').default('check'),
  glycol: object({
    kind: mixed<GlycolKind>().oneOf([...GLYCOL_KINDS], 'Choose propylene or ethylene glycol.').required('Choose the glycol.'),
    percent: number()
      .label('Glycol concentration')
      .required('Give the concentration.')
      .min(0, 'At least 0 %')
      .max(GLYCOL_RANGE.maxPercent, `At most ${GLYCOL_RANGE.maxPercent} % by mass`),
  })
    .nullable()
    .optional()
    .default(null),
  measuredPressureBarGauge: number().label('Measured pressure').min(0, 'Measured pressure cannot be negative').max(100).nullable().optional(),
});
