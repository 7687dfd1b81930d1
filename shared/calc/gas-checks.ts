// Gas pressures at a boiler or burner and the flue-gas analysis, against the limits usual in
// commissioning and servicing gas appliances. Every limit here is from memory of the documents
// named in its source text and has not been checked against a copy: the appliance manufacturer's
// figures, the site's procedures and local gas regulations take precedence.
import { formatNumber as f, isReading, type CheckResult } from '@/shared/calc/check-result';
import { paToMbar } from '@/shared/calc/units';

export type GasFamily = 'natural-gas' | 'lpg';

/** Appliance inlet pressures by gas family, mbar. */
export const GAS_INLET_PRESSURES: Record<GasFamily, { nominal: number; min: number; max: number; source: string }> = {
  'natural-gas': {
    nominal: 20, min: 17, max: 25,
    source: 'EN 437 test pressures for natural gas, group 2H: nominal 20 mbar, minimum 17 mbar, maximum 25 mbar (from memory).',
  },
  lpg: {
    nominal: 37, min: 25, max: 45,
    source: 'EN 437 test pressures for propane at 37 mbar (category 3P): minimum 25 mbar, maximum 45 mbar (from memory).',
  },
};

/** Highest CO₂ in dry flue gas at stoichiometric combustion, %. */
export const MAX_CO2_PERCENT: Record<GasFamily, number> = { 'natural-gas': 11.7, lpg: 13.7 };
const MAX_CO2_SOURCE = 'CO₂ = CO₂,max · (20.9 − O₂)/20.9, with CO₂,max 11.7 % for natural gas and 13.7 % for propane (from memory).';
const AIR_O2_PERCENT = 20.9;

export const FLUE_LIMITS = {
  /** Ratio at or below which combustion is taken as sound when the manufacturer gives no figure. */
  ratioSound: 0.004,
  /** Ratio above which a boiler is not left in use. */
  ratioAction: 0.008,
  /** CO in the flue, ppm, when the manufacturer gives no figure. */
  coMaxPpm: 350,
};
export const FLUE_LIMITS_SOURCE =
  'BS 7967:2015 combustion action levels, as applied in commissioning and servicing commercial gas appliances ' +
  '(IGEM/UP/4): CO/CO₂ ratio above 0.008 on a boiler means action before it is left in use; ' +
  'where the manufacturer states no figure, industry guidance for condensing boilers gives CO ≤ 350 ppm and ratio ≤ 0.004 (from memory).';

/** Said with every gas flag: who may act on it, in our own words. */
export const GAS_WORK_CAUTION =
  'Gas work only by a competent person registered as local law requires; the manufacturer’s instructions and the site’s procedures come first.';
export const UNSAFE_APPLIANCE_TEXT =
  'The appliance is not to be left in use until this is put right: make it safe and record it under the local procedure for unsafe gas situations, ' +
  'tell the responsible person, and follow the site’s procedures. ' + GAS_WORK_CAUTION;

export interface GasReadings {
  gasStandingPressurePa?: number | null;
  gasWorkingPressurePa?: number | null;
  burnerPressurePa?: number | null;
  flueO2Percent?: number | null;
  flueCo2Percent?: number | null;
  flueCoPpm?: number | null;
}

/** What the register says about the appliance. */
export interface GasAppliance {
  family: GasFamily | null;
  /** Burner pressure from the data plate or commissioning sheet, mbar. */
  burnerPressureSettingMbar?: number | null;
}

// common practice, no published source: a burner pressure more than 10 % off its setting is looked into.
const BURNER_TOLERANCE_FRACTION = 0.1;

function inletCheck(key: 'gas-standing-pressure' | 'gas-working-pressure', label: string, pa: number, family: GasFamily): CheckResult {
  const p = GAS_INLET_PRESSURES[family];
  const mbar = paToMbar(pa);
  const result: CheckResult = {
    key, label, formula: `p_min ≤ p ≤ p_max`,
    inputs: [{ label, value: mbar, unit: 'mbar' }, { label: 'Minimum', value: p.min, unit: 'mbar' }, { label: 'Maximum', value: p.max, unit: 'mbar' }],
    value: mbar, unit: 'mbar', limit: `${f(p.min)}–${f(p.max)} mbar (nominal ${f(p.nominal)} mbar)`, source: p.source,
  };
  if (mbar > p.max) {
    result.flag = { level: 'caution', message: `${label} ${f(mbar)} mbar is above ${f(p.max)} mbar: check the regulator and its lock-up. ${GAS_WORK_CAUTION}` };
  } else if (key === 'gas-working-pressure' && mbar < p.min) {
    result.flag = {
      level: 'caution',
      message: `Working pressure ${f(mbar)} mbar is below ${f(p.min)} mbar: look for an undersized or obstructed supply or a faulty regulator, and tell the gas supplier where the fault is upstream. ${GAS_WORK_CAUTION}`,
    };
  }
  return result;
}

function burnerCheck(pa: number, settingMbar: number): CheckResult {
  const mbar = paToMbar(pa);
  const band = settingMbar * BURNER_TOLERANCE_FRACTION;
  const result: CheckResult = {
    key: 'burner-pressure', label: 'Burner pressure', formula: '|p_burner − p_setting| ≤ 10 % of p_setting',
    inputs: [{ label: 'Burner pressure', value: mbar, unit: 'mbar' }, { label: 'Setting (register)', value: settingMbar, unit: 'mbar' }],
    value: mbar, unit: 'mbar', limit: `${f(settingMbar - band)}–${f(settingMbar + band)} mbar`,
    source: 'Manufacturer’s setting from the register; the ±10 % band is common practice, no published source.',
  };
  if (Math.abs(mbar - settingMbar) > band + 1e-9) {
    result.flag = { level: 'caution', message: `Burner pressure is off its ${f(settingMbar)} mbar setting: set it to the manufacturer’s figure. ${GAS_WORK_CAUTION}` };
  }
  return result;
}

/** CO₂ as read, or worked out from O₂ when only O₂ was read. */
function flueCo2(r: GasReadings, family: GasFamily): CheckResult | undefined {
  if (isReading(r.flueCo2Percent)) return undefined;
  if (!isReading(r.flueO2Percent)) return undefined;
  const max = MAX_CO2_PERCENT[family];
  const co2 = (max * (AIR_O2_PERCENT - r.flueO2Percent)) / AIR_O2_PERCENT;
  return {
    key: 'flue-co2', label: 'CO₂ worked out from O₂', formula: 'CO₂ = CO₂,max · (20.9 − O₂) / 20.9',
    inputs: [{ label: 'O₂', value: r.flueO2Percent, unit: '%' }, { label: 'CO₂,max', value: max, unit: '%' }],
    value: co2, unit: '%', source: MAX_CO2_SOURCE,
  };
}

function flueChecks(r: GasReadings, family: GasFamily): CheckResult[] {
  const results: CheckResult[] = [];
  const derived = flueCo2(r, family);
  if (derived) results.push(derived);
  const co2 = isReading(r.flueCo2Percent) ? r.flueCo2Percent : derived?.value;
  if (!isReading(r.flueCoPpm)) return results;
  const co: CheckResult = {
    key: 'flue-co', label: 'CO in the flue', formula: `CO ≤ ${f(FLUE_LIMITS.coMaxPpm)} ppm`,
    inputs: [{ label: 'CO', value: r.flueCoPpm, unit: 'ppm' }], value: r.flueCoPpm, unit: 'ppm',
    limit: `${f(FLUE_LIMITS.coMaxPpm)} ppm or less unless the manufacturer states otherwise`, source: FLUE_LIMITS_SOURCE,
  };
  if (r.flueCoPpm > FLUE_LIMITS.coMaxPpm) {
    co.flag = { level: 'caution', message: `CO ${f(r.flueCoPpm)} ppm is above ${f(FLUE_LIMITS.coMaxPpm)} ppm: check against the manufacturer’s figure, then the burner, air supply and flue. ${GAS_WORK_CAUTION}` };
  }
  results.push(co);
  if (!isReading(co2) || co2 <= 0) return results;
  const ratio = r.flueCoPpm / 10_000 / co2;
  const ratioCheck: CheckResult = {
    key: 'flue-co-co2-ratio', label: 'CO/CO₂ ratio', formula: 'ratio = (CO ppm / 10 000) / CO₂ %',
    inputs: [{ label: 'CO', value: r.flueCoPpm, unit: 'ppm' }, { label: 'CO₂', value: co2, unit: '%' }],
    value: ratio, unit: '', limit: `${FLUE_LIMITS.ratioSound} or less; above ${FLUE_LIMITS.ratioAction} the boiler is not left in use`,
    source: FLUE_LIMITS_SOURCE,
  };
  if (ratio > FLUE_LIMITS.ratioAction) {
    ratioCheck.flag = { level: 'danger', message: `CO/CO₂ ratio ${f(ratio, 3)} is above ${FLUE_LIMITS.ratioAction}. ${UNSAFE_APPLIANCE_TEXT}` };
  } else if (ratio > FLUE_LIMITS.ratioSound) {
    ratioCheck.flag = {
      level: 'caution',
      message: `CO/CO₂ ratio ${f(ratio, 3)} is above ${FLUE_LIMITS.ratioSound}: service the burner and check the air supply and flue to the manufacturer’s instructions, then analyse again. ${GAS_WORK_CAUTION}`,
    };
  }
  results.push(ratioCheck);
  return results;
}

/** Gas pressure and flue-gas checks for a gas appliance; none for other fuels or when the fuel is not recorded. */
export function gasChecks(r: GasReadings, appliance: GasAppliance): CheckResult[] {
  const family = appliance.family;
  if (!family) return [];
  const results: CheckResult[] = [];
  if (isReading(r.gasStandingPressurePa)) results.push(inletCheck('gas-standing-pressure', 'Standing gas pressure', r.gasStandingPressurePa, family));
  if (isReading(r.gasWorkingPressurePa)) results.push(inletCheck('gas-working-pressure', 'Working gas pressure at the inlet', r.gasWorkingPressurePa, family));
  if (isReading(r.burnerPressurePa) && isReading(appliance.burnerPressureSettingMbar)) {
    results.push(burnerCheck(r.burnerPressurePa, appliance.burnerPressureSettingMbar));
  }
  return [...results, ...flueChecks(r, family)];
}
