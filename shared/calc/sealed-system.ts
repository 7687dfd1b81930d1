// A sealed system's pressures: the system gauge corrected to the reference level, against the
// cold fill pressure and the safety valve, and the pressurisation unit's cut-in and cut-out.
import { DEFAULT_HEATING_CHECK_BANDS, type HeatingCheckBands } from '@/shared/calc/check-bands';
import { formatNumber as f, isReading, type CheckResult } from '@/shared/calc/check-result';
import { safetyValveClosingMarginBar, SAFETY_VALVE_MARGIN_SOURCE } from '@/shared/calc/expansion-vessel-rules';
import { headMToPa, paToBar } from '@/shared/calc/units';

// Readings are entered to 0.01 bar; this keeps 3 − 0.5 from missing 2.5 by float noise.
const SLACK_BAR = 1e-9;

/** Shown with every danger flag: the product records readings, it never makes plant safe. */
export const SAFETY_VALVE_DANGER_TEXT =
  'Stop and make safe: follow site procedures and the manufacturer’s instructions. ' +
  'Local codes and the requirements for competent persons take precedence over this check.';

/** 1 m of water = ρ·g·h = 1000 kg/m³ · 9.80665 m/s² · 1 m = 9806.65 Pa = 0.0981 bar (about 0.1 bar). */
export const BAR_PER_METRE_WATER = paToBar(headMToPa(1));
export const GAUGE_HEIGHT_SOURCE =
  'p = ρ·g·h with ρ = 1000 kg/m³ and g_n = 9.80665 m/s²: 1 m of water = 0.0981 bar (about 0.1 bar).';

export interface SealedSystemSettings {
  fillPressureGaugePa?: number | null;
  safetyValveSettingGaugePa?: number | null;
  /** The lowest pre-charge recorded on the system's vessels. */
  vesselPreChargeGaugePa?: number | null;
}

/** A gauge reading moved to the reference level (the vessel or the pressurisation unit): gauge above it reads low. */
export function pressureAtReferenceBar(gaugeBar: number, gaugeHeightM: number | null | undefined): number {
  return isReading(gaugeHeightM) ? gaugeBar + gaugeHeightM * BAR_PER_METRE_WATER : gaugeBar;
}

/**
 * System pressure against the cold fill pressure (low → caution), the final design pressure
 * p_e = p_SV − Δp_SVc of EN 12828 Annex D (at or above it → caution: waterlogged vessel or
 * overfilled system) and the safety valve setting (at or above → danger).
 */
export function systemPressureCheck(
  reading: { systemPressureGaugePa?: number | null; gaugeHeightM?: number | null },
  settings: SealedSystemSettings,
  bands: HeatingCheckBands = DEFAULT_HEATING_CHECK_BANDS,
): CheckResult | undefined {
  const { systemPressureGaugePa: systemPa, gaugeHeightM } = reading;
  const { fillPressureGaugePa: fillPa, safetyValveSettingGaugePa: valvePa } = settings;
  if (!isReading(systemPa) || (!isReading(fillPa) && !isReading(valvePa))) return undefined;
  const gaugeBar = paToBar(systemPa);
  const systemBar = pressureAtReferenceBar(gaugeBar, gaugeHeightM);
  const corrected = isReading(gaugeHeightM) && gaugeHeightM !== 0;
  const result: CheckResult = {
    key: 'system-pressure',
    label: 'System pressure',
    formula: corrected ? 'p = p_gauge + h · 0.0981 bar/m; p_fill − tolerance ≤ p < p_e = p_SV − Δp_SVc' : 'p_fill − tolerance ≤ p < p_e = p_SV − Δp_SVc',
    inputs: [{ label: 'System pressure at the gauge', value: gaugeBar, unit: 'bar' }],
    value: systemBar,
    unit: 'bar',
    source: corrected ? `${SAFETY_VALVE_MARGIN_SOURCE} Height correction: ${GAUGE_HEIGHT_SOURCE}` : SAFETY_VALVE_MARGIN_SOURCE,
  };
  if (corrected) result.inputs.push({ label: 'Gauge height above the reference point', value: gaugeHeightM, unit: 'm' });
  const limits: string[] = [];
  if (isReading(fillPa)) {
    result.inputs.push({ label: 'Fill pressure', value: paToBar(fillPa), unit: 'bar' });
    limits.push(`at least ${f(paToBar(fillPa) - bands.lowPressureToleranceBar)} bar`);
  }
  if (isReading(valvePa)) {
    const valveBar = paToBar(valvePa);
    const finalBar = valveBar - safetyValveClosingMarginBar(valveBar);
    result.inputs.push({ label: 'Safety valve setting', value: valveBar, unit: 'bar' }, { label: 'Final design pressure p_e', value: finalBar, unit: 'bar' });
    limits.push(`below ${f(finalBar)} bar`);
    result.limit = limits.join(' and ');
    if (systemBar >= valveBar - SLACK_BAR) {
      result.flag = {
        level: 'danger',
        message: `System pressure ${f(systemBar)} bar is at or above the safety valve setting (${f(valveBar)} bar). ${SAFETY_VALVE_DANGER_TEXT}`,
      };
      return result;
    }
    if (systemBar >= finalBar - SLACK_BAR) {
      result.flag = {
        level: 'caution',
        message: `System pressure ${f(systemBar)} bar is between the final design pressure (${f(finalBar)} bar) and the safety valve setting (${f(valveBar)} bar): ` +
          'the expansion vessel may be waterlogged (pre-charge lost) or the system overfilled. Check the vessel pre-charge with the water side isolated and relieved, following site procedures.',
      };
      return result;
    }
  }
  result.limit = limits.join(' and ');
  if (isReading(fillPa) && systemBar < paToBar(fillPa) - bands.lowPressureToleranceBar - SLACK_BAR) {
    result.flag = {
      level: 'caution',
      message: 'System pressure is below the cold fill pressure: water may have been lost or the vessel ' +
        'pre-charge may be low. Find the cause before topping up, following site procedures.',
    };
  }
  return result;
}

export interface UnitPressures {
  unitCutInPressureGaugePa?: number | null;
  unitCutOutPressureGaugePa?: number | null;
}

const UNIT_SOURCE =
  'EN 12828 Annex D: the initial pressure p_a must stay above the vessel pre-charge p_0 so the vessel holds its water reserve, ' +
  'and the highest working pressure must stay below p_e = p_SV − Δp_SVc (from memory). Cut-out above cut-in is common practice, no published source.';

/** The pressurisation unit's pump cut-in and cut-out against the vessel pre-charge and p_e. */
export function unitPressureChecks(r: UnitPressures, settings: SealedSystemSettings): CheckResult[] {
  const results: CheckResult[] = [];
  const cutIn = isReading(r.unitCutInPressureGaugePa) ? paToBar(r.unitCutInPressureGaugePa) : null;
  const cutOut = isReading(r.unitCutOutPressureGaugePa) ? paToBar(r.unitCutOutPressureGaugePa) : null;
  const preCharge = isReading(settings.vesselPreChargeGaugePa) ? paToBar(settings.vesselPreChargeGaugePa) : null;
  const valve = isReading(settings.safetyValveSettingGaugePa) ? paToBar(settings.safetyValveSettingGaugePa) : null;
  const finalBar = valve === null ? null : valve - safetyValveClosingMarginBar(valve);
  if (cutIn !== null) {
    const result: CheckResult = {
      key: 'unit-cut-in', label: 'Pressurisation unit cut-in', formula: 'p_cut-in > p_0',
      inputs: [{ label: 'Cut-in', value: cutIn, unit: 'bar' }], value: cutIn, unit: 'bar', source: UNIT_SOURCE,
    };
    if (preCharge !== null) {
      result.inputs.push({ label: 'Vessel pre-charge p_0 (register)', value: preCharge, unit: 'bar' });
      result.limit = `above ${f(preCharge)} bar`;
      if (cutIn <= preCharge + SLACK_BAR) {
        result.flag = { level: 'caution', message: `Cut-in ${f(cutIn)} bar is not above the vessel pre-charge (${f(preCharge)} bar): the vessel can empty before the unit tops up, and air can get in at the top of the system.` };
      }
    }
    if (cutOut !== null && cutOut <= cutIn + SLACK_BAR) {
      result.flag = { level: 'caution', message: `Cut-out ${f(cutOut)} bar is not above cut-in ${f(cutIn)} bar: check the unit’s settings and its pressure sensor.` };
    }
    results.push(result);
  }
  if (cutOut !== null) {
    const result: CheckResult = {
      key: 'unit-cut-out', label: 'Pressurisation unit cut-out', formula: 'p_cut-out < p_e = p_SV − Δp_SVc',
      inputs: [{ label: 'Cut-out', value: cutOut, unit: 'bar' }], value: cutOut, unit: 'bar', source: UNIT_SOURCE,
    };
    if (valve !== null && finalBar !== null) {
      result.inputs.push({ label: 'Safety valve setting', value: valve, unit: 'bar' }, { label: 'Final design pressure p_e', value: finalBar, unit: 'bar' });
      result.limit = `below ${f(finalBar)} bar`;
      if (cutOut >= finalBar - SLACK_BAR) {
        result.flag = { level: 'caution', message: `Cut-out ${f(cutOut)} bar is at or above the final design pressure (${f(finalBar)} bar): once hot, the system can reach the safety valve setting. Reset the unit to the site’s figures.` };
      }
    }
    results.push(result);
  }
  return results;
}
