// Expansion vessel check for a sealed heating system, by the method of
// EN 12828:2012+A1:2014 Annex D. Pressures are bar gauge; volumes are litres.
import { formatNumber as f, type WorkingStep } from '@/shared/calc/check-result';
import {
  DEFAULT_EXPANSION_VESSEL_SETTINGS,
  METRES_WATER_PER_BAR,
  NOMINAL_VOLUME_SOURCE,
  safetyValveClosingMarginBar,
  SAFETY_VALVE_MARGIN_SOURCE,
  VAPOUR_PRESSURE_SOURCE,
  WATER_RESERVE_SOURCE,
  type ExpansionVesselSettings,
} from '@/shared/calc/expansion-vessel-rules';
import { paToBar, STANDARD_ATMOSPHERE_PA } from '@/shared/calc/units';
import { saturationPressureAbsPa, waterDensityKgPerM3 } from '@/shared/calc/water';

export interface ExpansionVesselInputs {
  systemVolumeL: number;
  fillTemperatureC: number;
  maxFlowTemperatureC: number;
  /** Height of the highest point of the system above the vessel. */
  staticHeightM: number;
  safetyValveSettingBarGauge: number;
  /** Pre-charge actually set on the vessel(s); when absent the minimum pre-charge is used. */
  preChargeBarGauge?: number | null;
  /** Nominal volume of each installed vessel. */
  installedVesselVolumesL: number[];
}

export interface ExpansionVesselResult {
  verdict: 'pass' | 'fail';
  /** Why the verdict is a fail; empty on a pass. */
  reasons: string[];
  densityAtFillKgPerM3: number;
  densityAtMaxKgPerM3: number;
  expansionCoefficient: number;
  expansionVolumeL: number;
  waterReserveL: number;
  staticPressureBarGauge: number;
  vapourPressureBarGauge: number;
  minimumPreChargeBarGauge: number;
  preChargeBarGauge: number;
  safetyValveClosingMarginBar: number;
  finalPressureBarGauge: number;
  /** Null when p_e ≤ p_0: no vessel of any size works. */
  requiredNominalVolumeL: number | null;
  installedNominalVolumeL: number;
  /** Initial (cold fill) pressure p_a with the installed vessels; null when they cannot hold the water reserve. */
  fillPressureBarGauge: number | null;
  /** Initial pressure p_a for a vessel of exactly the required volume. */
  fillPressureAtRequiredVolumeBarGauge: number | null;
  working: WorkingStep[];
}

// Readings are entered to 0.01 bar; keeps float noise from failing an exact minimum.
const SLACK = 1e-9;

function assertInputs(inputs: ExpansionVesselInputs): void {
  const positive: [string, number][] = [
    ['System volume', inputs.systemVolumeL],
    ['Safety valve setting', inputs.safetyValveSettingBarGauge],
  ];
  for (const [label, value] of positive) {
    if (!Number.isFinite(value) || value <= 0) throw new RangeError(`${label} must be a positive number, got ${value}.`);
  }
  if (!Number.isFinite(inputs.staticHeightM) || inputs.staticHeightM < 0) {
    throw new RangeError(`Static height must be zero or more metres, got ${inputs.staticHeightM}.`);
  }
  if (!(inputs.maxFlowTemperatureC > inputs.fillTemperatureC)) {
    throw new RangeError(
      `Maximum flow temperature (${inputs.maxFlowTemperatureC} °C) must be above the fill temperature (${inputs.fillTemperatureC} °C).`,
    );
  }
  const preCharge = inputs.preChargeBarGauge;
  if (preCharge !== null && preCharge !== undefined && (!Number.isFinite(preCharge) || preCharge < 0)) {
    throw new RangeError(`Pre-charge must be zero or more bar, got ${preCharge}.`);
  }
  if (inputs.installedVesselVolumesL.some((v) => !Number.isFinite(v) || v <= 0)) {
    throw new RangeError('Each installed vessel volume must be a positive number of litres.');
  }
}

/** p_a from Boyle's law on the gas side: (p_0 + 1)·V_n = (p + 1)·(V_n − V_water). */
function gasSidePressureBar(preChargeBar: number, nominalL: number, waterInVesselL: number): number | null {
  if (nominalL <= waterInVesselL) return null;
  return ((preChargeBar + 1) * nominalL) / (nominalL - waterInVesselL) - 1;
}

export function checkExpansionVessel(
  inputs: ExpansionVesselInputs,
  settings: ExpansionVesselSettings = DEFAULT_EXPANSION_VESSEL_SETTINGS,
): ExpansionVesselResult {
  assertInputs(inputs);
  const { systemVolumeL: volumeL, fillTemperatureC: fillC, maxFlowTemperatureC: maxC } = inputs;
  const working: WorkingStep[] = [];
  const reasons: string[] = [];
  const step = (s: WorkingStep): number => {
    working.push(s);
    return s.value;
  };

  // Densities at the default liquid pressure: the pressure effect on e is far below 0.1 %.
  const rhoFill = waterDensityKgPerM3(fillC);
  const rhoMax = waterDensityKgPerM3(maxC);
  const e = step({
    key: 'expansion-coefficient', label: 'Expansion coefficient', formula: 'e = ρ(T_fill)/ρ(T_max) − 1',
    substituted: `e = ${f(rhoFill, 7)}/${f(rhoMax, 7)} − 1`, value: rhoFill / rhoMax - 1, unit: '',
    source: 'Densities from IAPWS-IF97 region 1',
  });
  const expansionL = step({
    key: 'expansion-volume', label: 'Expansion volume', formula: 'V_e = e · V_system',
    substituted: `V_e = ${f(e)} · ${f(volumeL)} L`, value: e * volumeL, unit: 'L',
  });
  const reserveL = step({
    key: 'water-reserve', label: 'Water reserve',
    formula: `V_WR = max(${f(settings.waterReserveFraction)} · V_system, ${f(settings.waterReserveMinL)} L)`,
    substituted: `V_WR = max(${f(settings.waterReserveFraction)} · ${f(volumeL)} L, ${f(settings.waterReserveMinL)} L)`,
    value: Math.max(settings.waterReserveFraction * volumeL, settings.waterReserveMinL), unit: 'L',
    source: WATER_RESERVE_SOURCE,
  });
  const staticBar = step({
    key: 'static-pressure', label: 'Static pressure at the vessel', formula: 'p_st = h / 10.197 m/bar',
    substituted: `p_st = ${f(inputs.staticHeightM)} m / ${f(METRES_WATER_PER_BAR, 5)} m/bar`,
    value: inputs.staticHeightM / METRES_WATER_PER_BAR, unit: 'bar',
    source: '1 bar of water at 1000 kg/m³ and g_n = 9.80665 m/s²',
  });
  const saturationBarAbs = paToBar(saturationPressureAbsPa(maxC));
  const atmosphereBar = paToBar(STANDARD_ATMOSPHERE_PA);
  const vapourBar = step({
    key: 'vapour-pressure', label: 'Vapour pressure at maximum temperature', formula: 'p_D = max(0, p_sat(T_max) − p_atm)',
    substituted: `p_D = max(0, ${f(saturationBarAbs)} − ${f(atmosphereBar, 6)}) bar`,
    value: Math.max(0, saturationBarAbs - atmosphereBar), unit: 'bar', source: VAPOUR_PRESSURE_SOURCE,
  });
  const minPreChargeBar = step({
    key: 'minimum-pre-charge', label: 'Minimum pre-charge', formula: 'p_0,min = p_st + p_D + margin',
    substituted: `p_0,min = ${f(staticBar)} + ${f(vapourBar)} + ${f(settings.preChargeMarginBar)} bar`,
    value: staticBar + vapourBar + settings.preChargeMarginBar, unit: 'bar', source: settings.preChargeMarginSource,
  });
  const givenPreCharge = inputs.preChargeBarGauge;
  const preChargeBar = givenPreCharge ?? minPreChargeBar;
  if (givenPreCharge !== null && givenPreCharge !== undefined && givenPreCharge < minPreChargeBar - SLACK) {
    reasons.push(
      `Pre-charge ${f(givenPreCharge)} bar is below the minimum ${f(minPreChargeBar)} bar: ` +
        'the top of the system can fall below atmospheric and draw in air.',
    );
  }
  const svBar = inputs.safetyValveSettingBarGauge;
  const marginBar = safetyValveClosingMarginBar(svBar);
  const finalBar = step({
    key: 'final-pressure', label: 'Final pressure', formula: 'p_e = p_SV − Δp_SVc',
    substituted: `p_e = ${f(svBar)} − ${f(marginBar)} bar`, value: svBar - marginBar, unit: 'bar',
    source: SAFETY_VALVE_MARGIN_SOURCE,
  });
  const installedL = inputs.installedVesselVolumesL.reduce((sum, v) => sum + v, 0);

  let requiredL: number | null = null;
  if (finalBar <= preChargeBar + SLACK) {
    reasons.unshift(
      `Final pressure p_e = ${f(finalBar)} bar is not above the pre-charge p_0 = ${f(preChargeBar)} bar, ` +
        'so no vessel size can work: a higher-rated safety valve or less static height is needed.',
    );
  } else {
    requiredL = step({
      key: 'required-nominal-volume', label: 'Required nominal volume',
      formula: 'V_n,min = (V_e + V_WR) · (p_e + 1) / (p_e − p_0)',
      substituted: `V_n,min = (${f(expansionL)} + ${f(reserveL)}) L · (${f(finalBar)} + 1) / (${f(finalBar)} − ${f(preChargeBar)})`,
      value: ((expansionL + reserveL) * (finalBar + 1)) / (finalBar - preChargeBar), unit: 'L',
      source: NOMINAL_VOLUME_SOURCE,
    });
  }
  step({
    key: 'installed-nominal-volume', label: 'Installed nominal volume', formula: 'V_n = Σ V_vessel',
    substituted: `V_n = ${inputs.installedVesselVolumesL.map((v) => `${f(v)}`).join(' + ') || '0'} L`,
    value: installedL, unit: 'L',
  });
  if (requiredL !== null && installedL < requiredL - SLACK) {
    reasons.push(`Installed ${f(installedL)} L is less than the required ${f(requiredL)} L.`);
  }

  const fillBar = gasSidePressureBar(preChargeBar, installedL, reserveL);
  if (fillBar !== null) {
    step({
      key: 'fill-pressure', label: 'Fill pressure with installed vessels',
      formula: 'p_a = (p_0 + 1) · V_n / (V_n − V_WR) − 1',
      substituted: `p_a = (${f(preChargeBar)} + 1) · ${f(installedL)} / (${f(installedL)} − ${f(reserveL)}) − 1`,
      value: fillBar, unit: 'bar',
    });
  }
  return {
    verdict: reasons.length === 0 ? 'pass' : 'fail',
    reasons,
    densityAtFillKgPerM3: rhoFill,
    densityAtMaxKgPerM3: rhoMax,
    expansionCoefficient: e,
    expansionVolumeL: expansionL,
    waterReserveL: reserveL,
    staticPressureBarGauge: staticBar,
    vapourPressureBarGauge: vapourBar,
    minimumPreChargeBarGauge: minPreChargeBar,
    preChargeBarGauge: preChargeBar,
    safetyValveClosingMarginBar: marginBar,
    finalPressureBarGauge: finalBar,
    requiredNominalVolumeL: requiredL,
    installedNominalVolumeL: installedL,
    fillPressureBarGauge: fillBar,
    fillPressureAtRequiredVolumeBarGauge: requiredL === null ? null : gasSidePressureBar(preChargeBar, requiredL, reserveL),
    working,
  };
}
