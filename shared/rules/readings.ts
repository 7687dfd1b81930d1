// How a reading set is checked: which design values apply (system settings, the
// register, the reading itself) and which flags follow. Used by the server when a set
// is stored and by the form for live checks while typing, so both give the same answer.
import {
  barToPa,
  computeHeatingChecks,
  isReading,
  m3ToLitres,
  paToBar,
  type CheckResult,
  type ExpansionVesselInputs,
  type HeatingSystemSettings,
} from '@/shared/calc';
import type {
  CheckSettings,
  HeatingSystem,
  ReadingFlag,
  ReadingValues,
  RegisterVessel,
  SystemExpansionCheck,
} from '@/shared/types/readings';

export const READING_VALUE_KEYS = [
  'flowTemperatureC',
  'returnTemperatureC',
  'flowSetpointC',
  'flowRateM3PerS',
  'systemPressureGaugePa',
  'pumpInletPressureGaugePa',
  'pumpOutletPressureGaugePa',
] as const satisfies readonly (keyof ReadingValues)[];
export type ReadingValueKey = (typeof READING_VALUE_KEYS)[number];

export const emptyReadingValues = (): ReadingValues => ({
  flowTemperatureC: null,
  returnTemperatureC: null,
  flowSetpointC: null,
  flowRateM3PerS: null,
  systemPressureGaugePa: null,
  pumpInletPressureGaugePa: null,
  pumpOutletPressureGaugePa: null,
  surfaceTemperatures: [],
});

/** Register facts that feed the checks of one item. */
export interface RegisterContext {
  siteId: number;
  systemName: string | null;
  system: HeatingSystem | null;
  /** Pressurisation units on the same site and system, with their recorded fill pressure. */
  pressurisationUnits: { plantId: string; fillPressureBar: number | null }[];
  /** The item's own flow setpoint (boilers record one in the register). */
  assetFlowSetpointC: number | null;
}

/** The design values a new set on an item is checked against, each with where it came from. */
export function resolveCheckSettings(ctx: RegisterContext): CheckSettings {
  const settings: HeatingSystemSettings = {};
  const sources: CheckSettings['sources'] = {};
  const s = ctx.system;
  const label = ctx.systemName ? `System settings (${ctx.systemName})` : 'System settings';
  if (s && isReading(s.designDeltaTK)) {
    settings.designDeltaTK = s.designDeltaTK;
    sources.designDeltaTK = label;
  }
  if (isReading(ctx.assetFlowSetpointC)) {
    settings.flowSetpointC = ctx.assetFlowSetpointC;
    sources.flowSetpointC = 'This item in the register';
  } else if (s && isReading(s.flowSetpointC)) {
    settings.flowSetpointC = s.flowSetpointC;
    sources.flowSetpointC = label;
  }
  if (s && isReading(s.safetyValveSettingGaugePa)) {
    settings.safetyValveSettingGaugePa = s.safetyValveSettingGaugePa;
    sources.safetyValveSettingGaugePa = label;
  }
  const unit = ctx.pressurisationUnits.find((u) => isReading(u.fillPressureBar));
  if (s && isReading(s.fillPressureGaugePa)) {
    settings.fillPressureGaugePa = s.fillPressureGaugePa;
    sources.fillPressureGaugePa = `${label}, set by hand`;
  } else if (unit && isReading(unit.fillPressureBar)) {
    settings.fillPressureGaugePa = barToPa(unit.fillPressureBar);
    sources.fillPressureGaugePa = `Pressurisation unit ${unit.plantId} in the register`;
  }
  return { siteId: ctx.siteId, systemName: ctx.systemName, settings, sources };
}

/** Runs the heating checks on one set; a setpoint written on the set wins over the stored one. */
export function runReadingChecks(
  values: ReadingValues,
  base: CheckSettings,
): { results: CheckResult[]; flags: ReadingFlag[]; settingsUsed: CheckSettings } {
  const settingsUsed: CheckSettings = { ...base, settings: { ...base.settings }, sources: { ...base.sources } };
  if (isReading(values.flowSetpointC)) {
    settingsUsed.settings.flowSetpointC = values.flowSetpointC;
    settingsUsed.sources.flowSetpointC = 'This reading';
  }
  const results = computeHeatingChecks(values, settingsUsed.settings);
  const flags: ReadingFlag[] = results.flatMap((r) => (r.flag ? [{ key: r.key, level: r.flag.level, message: r.flag.message }] : []));
  return { results, flags, settingsUsed };
}

/** Expansion vessel inputs for a system from its settings and the register's vessels. */
export function expansionInputsFor(
  system: HeatingSystem,
  vessels: RegisterVessel[],
): Pick<SystemExpansionCheck, 'inputs' | 'missing'> & { complete: ExpansionVesselInputs | null } {
  const missing: string[] = [];
  const inputs: SystemExpansionCheck['inputs'] = { installedVesselVolumesL: [] };
  if (isReading(system.systemVolumeM3)) inputs.systemVolumeL = m3ToLitres(system.systemVolumeM3);
  else missing.push('System water volume (system settings)');
  if (isReading(system.fillTemperatureC)) inputs.fillTemperatureC = system.fillTemperatureC;
  else missing.push('Fill temperature (system settings)');
  if (isReading(system.maxFlowTemperatureC)) inputs.maxFlowTemperatureC = system.maxFlowTemperatureC;
  else missing.push('Maximum flow temperature (system settings)');
  if (isReading(system.staticHeightM)) inputs.staticHeightM = system.staticHeightM;
  else missing.push('Static height (system settings)');
  if (isReading(system.safetyValveSettingGaugePa)) inputs.safetyValveSettingBarGauge = paToBar(system.safetyValveSettingGaugePa);
  else missing.push('Safety valve setting (system settings)');
  for (const v of vessels) {
    if (isReading(v.capacityL) && v.capacityL > 0) inputs.installedVesselVolumesL.push(v.capacityL);
    else missing.push(`Capacity of vessel ${v.plantId} (register)`);
  }
  // With several vessels the lowest recorded pre-charge is the one that lets air in first.
  const preCharges = vessels.map((v) => v.preChargeBar).filter(isReading);
  if (preCharges.length) inputs.preChargeBarGauge = Math.min(...preCharges);
  const complete =
    missing.length === 0
      ? {
          systemVolumeL: inputs.systemVolumeL!,
          fillTemperatureC: inputs.fillTemperatureC!,
          maxFlowTemperatureC: inputs.maxFlowTemperatureC!,
          staticHeightM: inputs.staticHeightM!,
          safetyValveSettingBarGauge: inputs.safetyValveSettingBarGauge!,
          preChargeBarGauge: inputs.preChargeBarGauge ?? null,
          installedVesselVolumesL: inputs.installedVesselVolumesL,
        }
      : null;
  return { inputs, missing, complete };
}
