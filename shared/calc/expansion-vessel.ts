// Expansion vessel check for a sealed heating system, by the method of
// EN 12828:2012+A1:2014 Annex D. Pressures are bar gauge; volumes are litres.
import { formatNumber as f, isReading, type WorkingStep } from '@/shared/calc/check-result';
import { assertVesselInputs, type ExpansionVesselInputs, type ExpansionVesselResult } from '@/shared/calc/expansion-vessel-inputs';
import {
  DEFAULT_EXPANSION_VESSEL_SETTINGS,
  METRES_WATER_PER_BAR,
  NOMINAL_VOLUME_SOURCE,
  safetyValveClosingMarginBar,
  SAFETY_VALVE_MARGIN_SOURCE,
  STANDARD_PRE_CHARGE_MARGIN_BAR,
  STANDARD_PRE_CHARGE_SOURCE,
  VAPOUR_PRESSURE_SOURCE,
  WATER_RESERVE_SOURCE,
  type ExpansionVesselSettings,
} from '@/shared/calc/expansion-vessel-rules';
import { paToBar, STANDARD_ATMOSPHERE_PA } from '@/shared/calc/units';
import { GLYCOL_LABELS, GLYCOL_SOURCE, glycolDensityKgPerM3, glycolSpecificHeatJPerKgK, type GlycolMix } from '@/shared/calc/glycol';
import { saturationPressureAbsPa, waterDensityKgPerM3, waterSpecificHeatJPerKgK } from '@/shared/calc/water';

export type { ExpansionVesselInputs, ExpansionVesselResult } from '@/shared/calc/expansion-vessel-inputs';

/** Density and c_p of the fill: IAPWS-IF97 water, or the glycol mixture's correlation. */
function fillProperties(glycol: GlycolMix | null | undefined) {
  if (!glycol || glycol.percent === 0) {
    return { density: (c: number) => waterDensityKgPerM3(c), cp: (c: number) => waterSpecificHeatJPerKgK(c), source: 'Densities from IAPWS-IF97 region 1', name: 'water' };
  }
  return {
    density: (c: number) => glycolDensityKgPerM3(glycol, c),
    cp: (c: number) => glycolSpecificHeatJPerKgK(glycol, c),
    source: GLYCOL_SOURCE,
    name: `${f(glycol.percent)} % ${GLYCOL_LABELS[glycol.kind].toLowerCase()}`,
  };
}

// Readings are entered to 0.01 bar; keeps float noise from failing an exact minimum.
const SLACK = 1e-9;

/** p_a from Boyle's law on the gas side: (p_0 + 1)·V_n = (p + 1)·(V_n − V_water). */
function gasSidePressureBar(preChargeBar: number, nominalL: number, waterInVesselL: number): number | null {
  if (nominalL <= waterInVesselL) return null;
  return ((preChargeBar + 1) * nominalL) / (nominalL - waterInVesselL) - 1;
}

export function checkExpansionVessel(
  inputs: ExpansionVesselInputs,
  settings: ExpansionVesselSettings = DEFAULT_EXPANSION_VESSEL_SETTINGS,
): ExpansionVesselResult {
  assertVesselInputs(inputs);
  const { systemVolumeL: volumeL, fillTemperatureC: fillC, maxFlowTemperatureC: maxC } = inputs;
  const sizeOnly = inputs.mode === 'size';
  const working: WorkingStep[] = [];
  const reasons: string[] = [];
  const cautions: string[] = [];
  const notes: string[] = [];
  const fill = fillProperties(inputs.glycol);
  const step = (s: WorkingStep): number => {
    working.push(s);
    return s.value;
  };

  // Densities at the default liquid pressure: the pressure effect on e is far below 0.1 %.
  const rhoFill = fill.density(fillC);
  const rhoMax = fill.density(maxC);
  const e = step({
    key: 'expansion-coefficient', label: `Expansion coefficient of ${fill.name}`, formula: 'e = ρ(T_fill)/ρ(T_max) − 1',
    substituted: `e = ${f(rhoFill, 7)}/${f(rhoMax, 7)} − 1`, value: rhoFill / rhoMax - 1, unit: '',
    source: fill.source,
  });
  const meanC = (fillC + maxC) / 2;
  const cp = step({
    key: 'specific-heat', label: `Specific heat of ${fill.name} at the mean temperature`, formula: 'c_p((T_fill + T_max)/2)',
    substituted: `c_p = c_p(${f(meanC)} °C)`, value: fill.cp(meanC) / 1000, unit: 'kJ/(kg·K)',
    source: fill.source === GLYCOL_SOURCE ? GLYCOL_SOURCE : 'IAPWS-IF97 region 1',
  }) * 1000;
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
  const standardMinBar = staticBar + vapourBar + STANDARD_PRE_CHARGE_MARGIN_BAR;
  const minPreChargeBar = step({
    key: 'minimum-pre-charge', label: 'Minimum pre-charge', formula: 'p_0,min = p_st + p_D + margin',
    substituted: `p_0,min = ${f(staticBar)} + ${f(vapourBar)} + ${f(settings.preChargeMarginBar)} bar`,
    value: staticBar + vapourBar + settings.preChargeMarginBar, unit: 'bar', source: settings.preChargeMarginSource,
  });
  const givenPreCharge = inputs.preChargeBarGauge;
  const preChargeBar = givenPreCharge ?? minPreChargeBar;
  // Only the standard's own rule fails a pre-charge; a stricter site margin is a remark.
  if (isReading(givenPreCharge) && givenPreCharge < standardMinBar - SLACK) {
    reasons.push(
      `Pre-charge ${f(givenPreCharge)} bar is below the minimum ${f(standardMinBar)} bar (${STANDARD_PRE_CHARGE_SOURCE}): ` +
        'the top of the system can fall below atmospheric and draw in air.',
    );
  } else if (isReading(givenPreCharge) && givenPreCharge < minPreChargeBar - SLACK) {
    notes.push(
      `Pre-charge ${f(givenPreCharge)} bar meets the standard’s ${f(standardMinBar)} bar but not the site practice of ` +
        `${f(minPreChargeBar)} bar (${f(settings.preChargeMarginBar)} bar margin). It is not failed.`,
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
  if (!sizeOnly) step({
    key: 'installed-nominal-volume', label: 'Installed nominal volume', formula: 'V_n = Σ V_vessel',
    substituted: `V_n = ${inputs.installedVesselVolumesL.map((v) => `${f(v)}`).join(' + ') || '0'} L`,
    value: installedL, unit: 'L',
  });
  if (!sizeOnly && requiredL !== null && installedL < requiredL - SLACK) {
    reasons.push(`Installed ${f(installedL)} L is less than the required ${f(requiredL)} L.`);
  }
  const measured = inputs.measuredPressureBarGauge;
  if (isReading(measured) && measured >= svBar - SLACK) {
    cautions.push(`Measured pressure ${f(measured)} bar is at or above the safety valve setting (${f(svBar)} bar): stop and make safe, following site procedures.`);
  } else if (isReading(measured) && measured >= finalBar - SLACK) {
    cautions.push(
      `Measured pressure ${f(measured)} bar lies between the final design pressure p_e = ${f(finalBar)} bar and the safety valve setting ` +
        `${f(svBar)} bar: the vessel is waterlogged (pre-charge lost) or the system is overfilled.`,
    );
  }

  const fillBar = sizeOnly ? null : gasSidePressureBar(preChargeBar, installedL, reserveL);
  if (fillBar !== null) {
    step({
      key: 'fill-pressure', label: 'Fill pressure with installed vessels',
      formula: 'p_a = (p_0 + 1) · V_n / (V_n − V_WR) − 1',
      substituted: `p_a = (${f(preChargeBar)} + 1) · ${f(installedL)} / (${f(installedL)} − ${f(reserveL)}) − 1`,
      value: fillBar, unit: 'bar',
    });
  }
  return {
    verdict: reasons.length ? 'fail' : sizeOnly ? 'sized' : 'pass',
    reasons,
    cautions,
    notes,
    densityAtFillKgPerM3: rhoFill,
    densityAtMaxKgPerM3: rhoMax,
    specificHeatJPerKgK: cp,
    expansionCoefficient: e,
    expansionVolumeL: expansionL,
    waterReserveL: reserveL,
    staticPressureBarGauge: staticBar,
    vapourPressureBarGauge: vapourBar,
    standardMinimumPreChargeBarGauge: standardMinBar,
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
