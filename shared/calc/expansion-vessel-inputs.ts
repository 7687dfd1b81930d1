// Inputs and result of the expansion vessel check (EN 12828:2012+A1:2014 Annex D), and the
// refusal of inputs the arithmetic cannot use. Pressures bar gauge, volumes litres.
import type { WorkingStep } from '@/shared/calc/check-result';
import { GLYCOL_RANGE, type GlycolMix } from '@/shared/calc/glycol';

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
  /** 'size' when no vessel is installed yet: the required vessel is worked out, nothing is failed for its absence. */
  mode?: 'check' | 'size';
  /** A water–glycol fill instead of plain water. */
  glycol?: GlycolMix | null;
  /** System pressure read at the vessel's level, hot or cold, to compare with p_e and the safety valve. */
  measuredPressureBarGauge?: number | null;
}

export interface ExpansionVesselResult {
  /** 'sized' in size-only mode when a vessel size exists. */
  verdict: 'pass' | 'fail' | 'sized';
  /** Why the verdict is a fail; empty otherwise. */
  reasons: string[];
  /** Cautions that do not fail the sizing (a measured pressure in the p_e–p_SV band). */
  cautions: string[];
  /** Remarks for the engineer (a pre-charge that meets the standard but not the site's practice). */
  notes: string[];
  densityAtFillKgPerM3: number;
  densityAtMaxKgPerM3: number;
  /** c_p of the fill at the mean of fill and maximum temperature, J/(kg·K). */
  specificHeatJPerKgK: number;
  expansionCoefficient: number;
  expansionVolumeL: number;
  waterReserveL: number;
  staticPressureBarGauge: number;
  vapourPressureBarGauge: number;
  /** EN 12828's own minimum, p_st + p_D + 0.2 bar. */
  standardMinimumPreChargeBarGauge: number;
  /** The minimum with the chosen margin (the standard's or the site's). */
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

export function assertVesselInputs(inputs: ExpansionVesselInputs): void {
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
  if (inputs.glycol && inputs.maxFlowTemperatureC > GLYCOL_RANGE.maxC) {
    throw new RangeError(`With glycol the maximum flow temperature must be at most ${GLYCOL_RANGE.maxC} °C, got ${inputs.maxFlowTemperatureC} °C.`);
  }
}
