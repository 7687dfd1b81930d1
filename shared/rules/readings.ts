// How a reading set is checked: which design values apply (system settings, the
// register, the reading itself) and which flags follow. Used by the server when a set
// is stored and by the form for live checks while typing, so both give the same answer.
import {
  barToPa,
  compensatedSetpointC,
  compensationCurve,
  computeReadingChecks,
  describeCurve,
  glycolMixOf,
  isReading,
  m3ToLitres,
  paToBar,
  type CheckResult,
  type CheckSettingsValues,
  type ExpansionVesselInputs,
  type GasFamily,
} from '@/shared/calc';
import type {
  CheckSettings,
  HeatingSystem,
  ReadingFlag,
  ReadingValues,
  RegisterVessel,
  SystemExpansionCheck,
} from '@/shared/types/readings';

export { emptyReadingValues, READING_VALUE_KEYS, type ReadingValueKey } from '@/shared/rules/reading-keys';

/** Register facts that feed the checks of one item. */
export interface RegisterContext {
  siteId: number;
  systemName: string | null;
  system: HeatingSystem | null;
  /** Pressurisation units on the same site and system, with their recorded fill pressure. */
  pressurisationUnits: { plantId: string; fillPressureBar: number | null }[];
  /** The item's own flow setpoint (boilers record one in the register). */
  assetFlowSetpointC: number | null;
  /** Lowest pre-charge of the expansion vessels on the same system, bar. */
  vesselPreChargeBar?: number | null;
  /** Gas family when the item burns gas (from its fuel in the register); null otherwise. */
  gasFamily?: GasFamily | null;
  burnerPressureSettingMbar?: number | null;
}

/** The system's glycol fill and weather-compensation curve. */
export const SYSTEM_FILL_AND_CURVE_KEYS = [
  'glycolKind',
  'glycolPercent',
  'compensationOutsideLowC',
  'compensationFlowAtLowC',
  'compensationOutsideHighC',
  'compensationFlowAtHighC',
] as const satisfies readonly (keyof CheckSettingsValues & keyof HeatingSystem)[];

/** System values the checks take as they are stored. */
const SYSTEM_KEYS = ['designDeltaTK', 'safetyValveSettingGaugePa', ...SYSTEM_FILL_AND_CURVE_KEYS] as const;

/** The design values a new set on an item is checked against, each with where it came from. */
export function resolveCheckSettings(ctx: RegisterContext): CheckSettings {
  const settings: CheckSettingsValues = {};
  const sources: CheckSettings['sources'] = {};
  const s = ctx.system;
  const label = ctx.systemName ? `System settings (${ctx.systemName})` : 'System settings';
  for (const key of SYSTEM_KEYS) {
    const v = s?.[key];
    if (v === null || v === undefined) continue;
    (settings as Record<string, unknown>)[key] = v;
    sources[key] = label;
  }
  if (isReading(ctx.assetFlowSetpointC)) {
    settings.flowSetpointC = ctx.assetFlowSetpointC;
    sources.flowSetpointC = 'This item in the register';
  } else if (s && isReading(s.flowSetpointC)) {
    settings.flowSetpointC = s.flowSetpointC;
    sources.flowSetpointC = label;
  }
  if (isReading(ctx.vesselPreChargeBar)) {
    settings.vesselPreChargeGaugePa = barToPa(ctx.vesselPreChargeBar);
    sources.vesselPreChargeGaugePa = 'Lowest vessel pre-charge on this system in the register';
  }
  const unit = ctx.pressurisationUnits.find((u) => isReading(u.fillPressureBar));
  if (s && isReading(s.fillPressureGaugePa)) {
    settings.fillPressureGaugePa = s.fillPressureGaugePa;
    sources.fillPressureGaugePa = `${label}, set by hand`;
  } else if (unit && isReading(unit.fillPressureBar)) {
    settings.fillPressureGaugePa = barToPa(unit.fillPressureBar);
    sources.fillPressureGaugePa = `Pressurisation unit ${unit.plantId} in the register`;
  }
  const appliance = { family: ctx.gasFamily ?? null, burnerPressureSettingMbar: ctx.burnerPressureSettingMbar ?? null };
  return { siteId: ctx.siteId, systemName: ctx.systemName, settings, sources, appliance };
}

/**
 * Runs every check on one set. The setpoint: one written on the set wins; on a weather-compensated
 * system the curve at the outside temperature read; a compensated system with no outside reading
 * gets no setpoint check, so a mild day is never flagged against the cold-day setpoint.
 */
export function runReadingChecks(
  values: ReadingValues,
  base: CheckSettings,
): { results: CheckResult[]; flags: ReadingFlag[]; settingsUsed: CheckSettings } {
  const settingsUsed: CheckSettings = { ...base, settings: { ...base.settings }, sources: { ...base.sources }, appliance: base.appliance ?? { family: null } };
  const curve = compensationCurve(base.settings);
  if (isReading(values.flowSetpointC)) {
    settingsUsed.settings.flowSetpointC = values.flowSetpointC;
    settingsUsed.sources.flowSetpointC = 'This reading';
  } else if (curve && isReading(values.outsideTemperatureC)) {
    settingsUsed.settings.flowSetpointC = compensatedSetpointC(curve, values.outsideTemperatureC);
    settingsUsed.sources.flowSetpointC = describeCurve(curve, values.outsideTemperatureC);
  } else if (curve) {
    delete settingsUsed.settings.flowSetpointC;
    settingsUsed.sources.flowSetpointC = 'Weather-compensated: enter the outside temperature to check the setpoint';
  }
  const results = computeReadingChecks(values, settingsUsed.settings, settingsUsed.appliance, {
    setpointSource: settingsUsed.sources.flowSetpointC,
  });
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
  inputs.glycol = glycolMixOf(system);
  const complete =
    missing.length === 0
      ? {
          glycol: inputs.glycol,
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
