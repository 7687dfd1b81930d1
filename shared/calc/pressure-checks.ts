// Pressure checks on heating readings: pump differential head and system pressure
// against the pressurisation unit's fill pressure and the safety valve setting.
import { DEFAULT_HEATING_CHECK_BANDS, type HeatingCheckBands } from '@/shared/calc/check-bands';
import { formatNumber, isReading, type CheckResult } from '@/shared/calc/check-result';
import {
  NOMINAL_WATER_DENSITY_KG_PER_M3,
  paToBar,
  paToHeadM,
  STANDARD_GRAVITY_M_PER_S2,
} from '@/shared/calc/units';
import { waterDensityKgPerM3 } from '@/shared/calc/water';

// Readings are entered to 0.01 bar; this keeps 3 − 0.3 from missing 2.7 by float noise.
const COMPARISON_SLACK_BAR = 1e-9;

/** Shown with every danger flag: the product records readings, it never makes plant safe. */
export const SAFETY_VALVE_DANGER_TEXT =
  'Stop and make safe: follow site procedures and the manufacturer’s instructions. ' +
  'Local codes and the requirements for competent persons take precedence over this check.';

/**
 * Pump differential head H = Δp / (ρ·g). ρ is taken at the mean water temperature
 * when it is known, otherwise the nominal 1000 kg/m³ the trade uses for gauge heads.
 */
export function pumpHeadCheck(
  inletGaugePa: number | null | undefined,
  outletGaugePa: number | null | undefined,
  meanWaterTemperatureC?: number,
): CheckResult | undefined {
  if (!isReading(inletGaugePa) || !isReading(outletGaugePa)) return undefined;
  const densityKgPerM3 = isReading(meanWaterTemperatureC)
    ? waterDensityKgPerM3(meanWaterTemperatureC)
    : NOMINAL_WATER_DENSITY_KG_PER_M3;
  const differentialPa = outletGaugePa - inletGaugePa;
  const result: CheckResult = {
    key: 'pump-head',
    label: 'Pump differential head',
    formula: 'H = (p_outlet − p_inlet) / (ρ · g)',
    inputs: [
      { label: 'Inlet pressure', value: paToBar(inletGaugePa), unit: 'bar' },
      { label: 'Outlet pressure', value: paToBar(outletGaugePa), unit: 'bar' },
      {
        label: isReading(meanWaterTemperatureC) ? 'Density ρ at mean water temperature (IAPWS-IF97)' : 'Density ρ (nominal)',
        value: densityKgPerM3,
        unit: 'kg/m³',
      },
      { label: 'Standard gravity g', value: STANDARD_GRAVITY_M_PER_S2, unit: 'm/s²' },
    ],
    value: paToHeadM(differentialPa, densityKgPerM3),
    unit: 'm',
  };
  if (differentialPa <= 0) {
    result.flag = {
      level: 'caution',
      message: 'Outlet is not above inlet: check the gauges, that the pump is running and its direction.',
    };
  } else if (inletGaugePa < 0) {
    result.flag = {
      level: 'caution',
      message: 'Pump inlet is below atmospheric pressure: air can be drawn in and the pump may cavitate.',
    };
  }
  return result;
}

/**
 * System pressure against the cold fill pressure (low → caution) and the safety
 * valve setting (at or within the approach band of it → danger). Needs the reading
 * and at least one of the two settings.
 */
export function systemPressureCheck(
  systemGaugePa: number | null | undefined,
  fillGaugePa: number | null | undefined,
  safetyValveGaugePa: number | null | undefined,
  bands: HeatingCheckBands = DEFAULT_HEATING_CHECK_BANDS,
): CheckResult | undefined {
  if (!isReading(systemGaugePa)) return undefined;
  if (!isReading(fillGaugePa) && !isReading(safetyValveGaugePa)) return undefined;
  const systemBar = paToBar(systemGaugePa);
  const result: CheckResult = {
    key: 'system-pressure',
    label: 'System pressure',
    formula: 'p_fill − tolerance ≤ p_system < p_safety valve − approach band',
    inputs: [{ label: 'System pressure', value: systemBar, unit: 'bar' }],
    value: systemBar,
    unit: 'bar',
  };
  if (isReading(fillGaugePa)) {
    result.inputs.push({ label: 'Fill pressure', value: paToBar(fillGaugePa), unit: 'bar' });
  }
  if (isReading(safetyValveGaugePa)) {
    const valveBar = paToBar(safetyValveGaugePa);
    result.inputs.push({ label: 'Safety valve setting', value: valveBar, unit: 'bar' });
    if (systemBar >= valveBar - bands.safetyValveApproachBar - COMPARISON_SLACK_BAR) {
      const where = systemBar >= valveBar ? 'at or above' : `within ${formatNumber(bands.safetyValveApproachBar)} bar of`;
      result.flag = {
        level: 'danger',
        message: `System pressure ${formatNumber(systemBar)} bar is ${where} the safety valve setting ` +
          `(${formatNumber(valveBar)} bar). ${SAFETY_VALVE_DANGER_TEXT}`,
      };
      return result;
    }
  }
  if (isReading(fillGaugePa) && systemBar < paToBar(fillGaugePa) - bands.lowPressureToleranceBar - COMPARISON_SLACK_BAR) {
    result.flag = {
      level: 'caution',
      message: 'System pressure is below the cold fill pressure: water may have been lost or the vessel ' +
        'pre-charge may be low. Find the cause before topping up, following site procedures.',
    };
  }
  return result;
}
