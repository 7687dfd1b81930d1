// Checks on one set of heating-plant readings. Each check runs only when the
// readings and system settings it needs are present; missing inputs omit it.
import { DEFAULT_HEATING_CHECK_BANDS, type HeatingCheckBands } from '@/shared/calc/check-bands';
import { isReading, type CheckResult } from '@/shared/calc/check-result';
import type { CompensationSettings } from '@/shared/calc/compensation';
import { GLYCOL_LABELS, GLYCOL_SOURCE, glycolDensityKgPerM3, glycolSpecificHeatJPerKgK, type GlycolKind, type GlycolMix } from '@/shared/calc/glycol';
import { pumpHeadCheck } from '@/shared/calc/pressure-checks';
import { systemPressureCheck } from '@/shared/calc/sealed-system';
import { m3PerSToLitresPerSecond, gaugeToAbsolutePa } from '@/shared/calc/units';
import { defaultLiquidPressureAbsPa, liquidWaterProperties, LIQUID_WATER_RANGE_C } from '@/shared/calc/water';

/** One set of readings, stored in SI (temperatures in °C, pressures gauge in Pa). */
export interface HeatingReadings {
  flowTemperatureC?: number | null;
  returnTemperatureC?: number | null;
  flowRateM3PerS?: number | null;
  systemPressureGaugePa?: number | null;
  pumpInletPressureGaugePa?: number | null;
  pumpOutletPressureGaugePa?: number | null;
  /** Height of the system gauge above the vessel or reference point; the pressure is corrected to that level. */
  gaugeHeightM?: number | null;
}

/** Design values kept per heating system. */
export interface HeatingSystemSettings {
  /** Design flow − return difference, e.g. 11 K or 20 K. */
  designDeltaTK?: number | null;
  flowSetpointC?: number | null;
  /** Cold fill pressure set at the pressurisation unit. */
  fillPressureGaugePa?: number | null;
  safetyValveSettingGaugePa?: number | null;
  /** Lowest pre-charge recorded on the system's expansion vessels. */
  vesselPreChargeGaugePa?: number | null;
  glycolKind?: GlycolKind | null;
  /** Glycol by mass, %. */
  glycolPercent?: number | null;
}

/** Everything a reading set is checked against: design values plus the weather-compensation curve. */
export type CheckSettingsValues = HeatingSystemSettings & CompensationSettings;

export const glycolMixOf = (s: HeatingSystemSettings): GlycolMix | null =>
  s.glycolKind && isReading(s.glycolPercent) && s.glycolPercent > 0 ? { kind: s.glycolKind, percent: s.glycolPercent } : null;

const BANDS_SOURCE = 'Common practice, no published source (a site setting).';

function assertTemperature(label: string, value: number | null | undefined): void {
  if (value === null || value === undefined) return;
  const { min, max } = LIQUID_WATER_RANGE_C;
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new RangeError(`${label} ${value} °C is outside the supported range ${min}–${max} °C.`);
  }
}

function assertPositive(label: string, value: number | null | undefined, allowZero: boolean): void {
  if (value === null || value === undefined) return;
  if (!Number.isFinite(value) || value < 0 || (!allowZero && value === 0)) {
    throw new RangeError(`${label} must be a ${allowZero ? 'non-negative' : 'positive'} number, got ${value}.`);
  }
}

export function deltaTCheck(
  flowC: number,
  returnC: number,
  designDeltaTK: number | null | undefined,
  bands: HeatingCheckBands = DEFAULT_HEATING_CHECK_BANDS,
): CheckResult {
  const deltaT = flowC - returnC;
  const result: CheckResult = {
    key: 'delta-t',
    label: 'Flow − return temperature difference',
    formula: 'ΔT = T_flow − T_return',
    inputs: [
      { label: 'Flow temperature', value: flowC, unit: '°C' },
      { label: 'Return temperature', value: returnC, unit: '°C' },
    ],
    value: deltaT,
    unit: 'K',
  };
  if (deltaT <= 0) {
    result.flag = {
      level: 'caution',
      message: 'Return is at or above flow: check sensor positions and whether the plant is firing.',
    };
    return result;
  }
  if (!isReading(designDeltaTK)) return result;
  result.inputs.push({ label: 'Design ΔT', value: designDeltaTK, unit: 'K' });
  result.formula = 'ΔT = T_flow − T_return, compared with design ΔT';
  result.limit = `design ΔT ± ${Math.round(bands.deltaTToleranceFraction * 100)} %`;
  result.source = BANDS_SOURCE;
  const deviation = (deltaT - designDeltaTK) / designDeltaTK;
  const percent = Math.round(Math.abs(deviation) * 100);
  if (deviation > bands.deltaTToleranceFraction) {
    result.flag = {
      level: 'caution',
      message: `ΔT is ${percent} % above design: flow may be too low (pump, valves, strainers, air).`,
    };
  } else if (deviation < -bands.deltaTToleranceFraction) {
    result.flag = {
      level: 'caution',
      message: `ΔT is ${percent} % below design: flow may be too high or water is bypassing the load.`,
    };
  }
  return result;
}

/** Q = ṁ·c_p·ΔT with ṁ = V̇·ρ; ρ and c_p at the mean water temperature (IAPWS-IF97). */
export function heatDeliveredCheck(
  flowC: number,
  returnC: number,
  flowRateM3PerS: number,
  systemPressureGaugePa?: number | null,
  glycol?: GlycolMix | null,
): CheckResult {
  const meanC = (flowC + returnC) / 2;
  const liquidPa = defaultLiquidPressureAbsPa(meanC);
  const pressureAbsPa = isReading(systemPressureGaugePa)
    ? Math.max(gaugeToAbsolutePa(systemPressureGaugePa), liquidPa)
    : liquidPa;
  const water = glycol
    ? { densityKgPerM3: glycolDensityKgPerM3(glycol, meanC), specificHeatJPerKgK: glycolSpecificHeatJPerKgK(glycol, meanC) }
    : liquidWaterProperties(meanC, pressureAbsPa);
  const fluid = glycol ? `${GLYCOL_LABELS[glycol.kind]} ${glycol.percent} %` : 'IAPWS-IF97';
  const deltaT = flowC - returnC;
  const massFlowKgPerS = flowRateM3PerS * water.densityKgPerM3;
  const heatW = massFlowKgPerS * water.specificHeatJPerKgK * deltaT;
  const result: CheckResult = {
    key: 'heat-delivered',
    label: 'Heat delivered',
    formula: 'Q = V̇ · ρ(T_mean) · c_p(T_mean) · (T_flow − T_return)',
    inputs: [
      { label: 'Flow rate', value: m3PerSToLitresPerSecond(flowRateM3PerS), unit: 'L/s' },
      { label: 'Mean water temperature', value: meanC, unit: '°C' },
      { label: `Density ρ (${fluid})`, value: water.densityKgPerM3, unit: 'kg/m³' },
      { label: `Specific heat c_p (${fluid})`, value: water.specificHeatJPerKgK / 1000, unit: 'kJ/(kg·K)' },
      { label: 'ΔT', value: deltaT, unit: 'K' },
    ],
    value: heatW / 1000,
    unit: 'kW',
    source: glycol ? GLYCOL_SOURCE : 'Water properties from IAPWS-IF97 region 1',
  };
  if (deltaT <= 0) {
    result.flag = { level: 'info', message: 'No heat is being delivered at this ΔT.' };
  }
  return result;
}

export function flowSetpointCheck(
  flowC: number,
  setpointC: number,
  bands: HeatingCheckBands = DEFAULT_HEATING_CHECK_BANDS,
  setpointSource?: string,
): CheckResult {
  const deviationK = flowC - setpointC;
  const result: CheckResult = {
    key: 'flow-setpoint-deviation',
    label: 'Flow temperature against setpoint',
    formula: 'deviation = T_flow − T_setpoint',
    inputs: [
      { label: 'Flow temperature', value: flowC, unit: '°C' },
      { label: 'Flow setpoint', value: setpointC, unit: '°C' },
    ],
    value: deviationK,
    unit: 'K',
    limit: `within ±${bands.setpointDeadbandK} K; caution beyond +${bands.setpointOvershootCautionK} K or −${bands.setpointShortfallCautionK} K`,
    source: setpointSource ? `Setpoint: ${setpointSource}. Bands: ${BANDS_SOURCE}` : BANDS_SOURCE,
  };
  const shortfall = -deviationK;
  if (deviationK > bands.setpointOvershootCautionK) {
    result.flag = {
      level: 'caution',
      message: 'Flow is well above setpoint: check the controls, sensor and limit thermostat.',
    };
  } else if (shortfall > bands.setpointShortfallCautionK) {
    result.flag = {
      level: 'caution',
      message: 'Flow is well below setpoint: if the plant has been running a while, check firing and controls.',
    };
  } else if (Math.abs(deviationK) > bands.setpointDeadbandK) {
    result.flag = {
      level: 'info',
      message:
        deviationK < 0
          ? 'Flow is a little below setpoint: usually still heating up, or the load is high. Recheck later.'
          : 'Flow is a little above setpoint: normal overshoot for on/off or staged control.',
    };
  }
  return result;
}

/** Runs every check the given readings and settings allow, in a fixed order. */
export function computeHeatingChecks(
  readings: HeatingReadings,
  system: HeatingSystemSettings = {},
  bands: HeatingCheckBands = DEFAULT_HEATING_CHECK_BANDS,
  setpointSource?: string,
): CheckResult[] {
  assertTemperature('Flow temperature', readings.flowTemperatureC);
  assertTemperature('Return temperature', readings.returnTemperatureC);
  assertTemperature('Flow setpoint', system.flowSetpointC);
  assertPositive('Flow rate', readings.flowRateM3PerS, true);
  assertPositive('Design ΔT', system.designDeltaTK, false);

  const { flowTemperatureC: flowC, returnTemperatureC: returnC, flowRateM3PerS } = readings;
  const results: CheckResult[] = [];
  const haveTemperatures = isReading(flowC) && isReading(returnC);
  if (haveTemperatures) {
    results.push(deltaTCheck(flowC, returnC, system.designDeltaTK, bands));
    if (isReading(flowRateM3PerS)) {
      results.push(heatDeliveredCheck(flowC, returnC, flowRateM3PerS, readings.systemPressureGaugePa, glycolMixOf(system)));
    }
  }
  const pumpHead = pumpHeadCheck(
    readings.pumpInletPressureGaugePa,
    readings.pumpOutletPressureGaugePa,
    haveTemperatures ? (flowC + returnC) / 2 : undefined,
  );
  if (pumpHead) results.push(pumpHead);
  if (isReading(flowC) && isReading(system.flowSetpointC)) {
    results.push(flowSetpointCheck(flowC, system.flowSetpointC, bands, setpointSource));
  }
  const pressure = systemPressureCheck(readings, system, bands);
  if (pressure) results.push(pressure);
  return results;
}
