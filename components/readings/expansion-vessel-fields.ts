// The calculator form's values, and their conversion to the calculator's inputs
// (litres, °C, metres, bar gauge) from whichever units were chosen on the form.
import { formatNumber, m3ToLitres, paToBar, PRE_CHARGE_MARGIN_CHOICES, type ExpansionVesselInputs, type GlycolKind } from '@/shared/calc';
import { entryToSi, parseEntry } from '@/components/readings/reading-fields';

export interface VesselFormValues {
  systemVolume: string;
  systemVolumeUnit: string;
  fillTemperatureC: string;
  maxFlowTemperatureC: string;
  staticHeightM: string;
  safetyValve: string;
  safetyValveUnit: string;
  preCharge: string;
  preChargeUnit: string;
  vessels: string[];
  preChargeMarginBar: number;
  /** Size only: no vessel installed yet. */
  sizeOnly: boolean;
  glycolKind: GlycolKind | null;
  glycolPercent: string;
  measuredPressure: string;
  measuredPressureUnit: string;
}

const text = (v: number | null | undefined) => (v === null || v === undefined ? '' : formatNumber(v, 6));

export function initialVesselForm(from?: Partial<ExpansionVesselInputs> | null, marginBar?: number | null): VesselFormValues {
  const vessels = (from?.installedVesselVolumesL ?? []).map((v) => text(v));
  return {
    systemVolume: text(from?.systemVolumeL),
    systemVolumeUnit: 'L',
    fillTemperatureC: text(from?.fillTemperatureC),
    maxFlowTemperatureC: text(from?.maxFlowTemperatureC),
    staticHeightM: text(from?.staticHeightM),
    safetyValve: text(from?.safetyValveSettingBarGauge),
    safetyValveUnit: 'bar',
    preCharge: text(from?.preChargeBarGauge),
    preChargeUnit: 'bar',
    vessels: vessels.length ? vessels : [''],
    preChargeMarginBar: marginBar ?? PRE_CHARGE_MARGIN_CHOICES[0].value,
    sizeOnly: false,
    glycolKind: from?.glycol?.kind ?? null,
    glycolPercent: text(from?.glycol?.percent),
    measuredPressure: '',
    measuredPressureUnit: 'bar',
  };
}

// Form field ← calculator input name, for putting server and schema errors on the right box.
const FORM_FIELD: Record<string, string> = {
  systemVolumeL: 'systemVolume',
  safetyValveSettingBarGauge: 'safetyValve',
  preChargeBarGauge: 'preCharge',
  'glycol.percent': 'glycolPercent',
  'glycol.kind': 'glycolKind',
  measuredPressureBarGauge: 'measuredPressure',
};

export function vesselFormPath(apiPath: string): string {
  const vessel = /^installedVesselVolumesL\[(\d+)\]$/.exec(apiPath);
  if (vessel) return `vessels.${vessel[1]}`;
  return FORM_FIELD[apiPath] ?? apiPath;
}

/** The request body; entries that are not numbers are listed in `unreadable` by form field. */
export function vesselFormToRequest(v: VesselFormValues) {
  const unreadable: Record<string, string> = {};
  const num = (field: string, value: number | null) => {
    if (Number.isNaN(value)) unreadable[field] = 'Enter a number.';
    return value === null || Number.isNaN(value) ? undefined : value;
  };
  const volumeM3 = entryToSi(v.systemVolume, 'volume', v.systemVolumeUnit);
  const valvePa = entryToSi(v.safetyValve, 'pressure', v.safetyValveUnit);
  const preChargePa = entryToSi(v.preCharge, 'pressure', v.preChargeUnit);
  const measuredPa = entryToSi(v.measuredPressure, 'pressure', v.measuredPressureUnit);
  const glycolPercent = parseEntry(v.glycolPercent);
  const vessels: number[] = [];
  v.vessels.forEach((entry, i) => {
    const litres = parseEntry(entry);
    // One empty row means "no vessel fitted"; indices then still match the schema's error paths.
    if (v.sizeOnly || (litres === null && v.vessels.length === 1)) return;
    if (litres === null) unreadable[`vessels.${i}`] = 'Enter the vessel volume or remove this row.';
    else if (Number.isNaN(litres)) unreadable[`vessels.${i}`] = 'Enter a number.';
    else vessels.push(litres);
  });
  const body = {
    systemVolumeL: num('systemVolume', volumeM3 === null || Number.isNaN(volumeM3) ? volumeM3 : m3ToLitres(volumeM3)),
    fillTemperatureC: num('fillTemperatureC', parseEntry(v.fillTemperatureC)),
    maxFlowTemperatureC: num('maxFlowTemperatureC', parseEntry(v.maxFlowTemperatureC)),
    staticHeightM: num('staticHeightM', parseEntry(v.staticHeightM)),
    safetyValveSettingBarGauge: num('safetyValve', valvePa === null || Number.isNaN(valvePa) ? valvePa : paToBar(valvePa)),
    preChargeBarGauge: num('preCharge', preChargePa === null || Number.isNaN(preChargePa) ? preChargePa : paToBar(preChargePa)) ?? null,
    installedVesselVolumesL: vessels,
    preChargeMarginBar: v.preChargeMarginBar,
    mode: v.sizeOnly ? ('size' as const) : ('check' as const),
    glycol: v.glycolKind ? { kind: v.glycolKind, percent: num('glycolPercent', glycolPercent) as number } : null,
    measuredPressureBarGauge: num('measuredPressure', measuredPa === null || Number.isNaN(measuredPa) ? measuredPa : paToBar(measuredPa)) ?? null,
  };
  return { body, unreadable };
}
