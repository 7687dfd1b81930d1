// Every check on one reading set, whatever the item: heating circuit, gas and flue gas,
// hot water against Legionella control, water treatment and the pressurisation unit.
import { DEFAULT_HEATING_CHECK_BANDS, type HeatingCheckBands } from '@/shared/calc/check-bands';
import type { CheckResult } from '@/shared/calc/check-result';
import { gasChecks, type GasAppliance, type GasReadings } from '@/shared/calc/gas-checks';
import { computeHeatingChecks, type HeatingReadings, type HeatingSystemSettings } from '@/shared/calc/heating-checks';
import { hotWaterChecks, type HotWaterReadings } from '@/shared/calc/hot-water';
import { unitPressureChecks, type UnitPressures } from '@/shared/calc/sealed-system';
import { waterTreatmentChecks, type WaterTreatmentReadings } from '@/shared/calc/water-treatment';

export type AllReadings = HeatingReadings & GasReadings & HotWaterReadings & WaterTreatmentReadings & UnitPressures;

export function computeReadingChecks(
  readings: AllReadings,
  settings: HeatingSystemSettings,
  appliance: GasAppliance,
  options: { bands?: HeatingCheckBands; setpointSource?: string } = {},
): CheckResult[] {
  return [
    ...computeHeatingChecks(readings, settings, options.bands ?? DEFAULT_HEATING_CHECK_BANDS, options.setpointSource),
    ...unitPressureChecks(readings, settings),
    ...gasChecks(readings, appliance),
    ...hotWaterChecks(readings),
    ...waterTreatmentChecks(readings),
  ];
}
