// Pump differential head from the pressures either side of a pump.
import { isReading, type CheckResult } from '@/shared/calc/check-result';
import {
  NOMINAL_WATER_DENSITY_KG_PER_M3,
  paToBar,
  paToHeadM,
  STANDARD_GRAVITY_M_PER_S2,
} from '@/shared/calc/units';
import { waterDensityKgPerM3 } from '@/shared/calc/water';

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
