// The expansion vessel calculator: shared/calc does the arithmetic; this file picks the
// settings and turns an input the arithmetic refuses into a 422 the form can show.
import { unprocessable } from '@/server/lib/http-error';
import {
  checkExpansionVessel,
  DEFAULT_EXPANSION_VESSEL_SETTINGS,
  PRE_CHARGE_MARGIN_CHOICES,
  type ExpansionVesselInputs,
  type ExpansionVesselSettings,
} from '@/shared/calc';
import type { ExpansionSettingsUsed, ExpansionVesselCheckResponse } from '@/shared/types/readings';
import type { ExpansionVesselRequest } from '@/shared/schemas/readings';

/** The vessel settings for a chosen pre-charge margin; the default when none is chosen. */
export function expansionSettingsFor(preChargeMarginBar: number | null | undefined): ExpansionVesselSettings {
  const choice = PRE_CHARGE_MARGIN_CHOICES.find((c) => c.value === preChargeMarginBar);
  if (!choice) return DEFAULT_EXPANSION_VESSEL_SETTINGS;
  return { ...DEFAULT_EXPANSION_VESSEL_SETTINGS, preChargeMarginBar: choice.value, preChargeMarginSource: choice.source };
}

export const describeSettings = (settings: ExpansionVesselSettings): ExpansionSettingsUsed => ({
  preChargeMarginBar: settings.preChargeMarginBar,
  preChargeMarginSource: settings.preChargeMarginSource,
  choices: PRE_CHARGE_MARGIN_CHOICES,
});

/** Runs the check; a RangeError from the arithmetic (inputs the schema lets through) becomes a 422. */
export function runExpansionCheck(inputs: ExpansionVesselInputs, settings: ExpansionVesselSettings) {
  try {
    return checkExpansionVessel(inputs, settings);
  } catch (err) {
    if (err instanceof RangeError) throw unprocessable(err.message, { _: err.message });
    throw err;
  }
}

export function expansionVesselCheck(body: ExpansionVesselRequest): ExpansionVesselCheckResponse {
  const inputs: ExpansionVesselInputs = {
    systemVolumeL: body.systemVolumeL,
    fillTemperatureC: body.fillTemperatureC,
    maxFlowTemperatureC: body.maxFlowTemperatureC,
    staticHeightM: body.staticHeightM,
    safetyValveSettingBarGauge: body.safetyValveSettingBarGauge,
    preChargeBarGauge: body.preChargeBarGauge ?? null,
    installedVesselVolumesL: body.installedVesselVolumesL,
    mode: body.mode,
    glycol: body.glycol ?? null,
    measuredPressureBarGauge: body.measuredPressureBarGauge ?? null,
  };
  const settings = expansionSettingsFor(body.preChargeMarginBar);
  return { inputs, settings: describeSettings(settings), result: runExpansionCheck(inputs, settings) };
}
