import type { Transaction } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import type { User } from '@/server/models/user.model';
import { computedRow } from '@/server/services/readings.service';
import { barToPa, mbarToPa } from '@/shared/calc';
import type { ReadingSetInput } from '@/shared/schemas/readings';

const DAY_MS = 86_400_000;

// Invented visit readings on the demo school's main boiler house: [days ago, readings].
type Entered = Partial<ReadingSetInput>;
const VISITS: { plantId: string; sets: [number, Entered][] }[] = [
  {
    plantId: 'B-01',
    sets: [
      [42, { flowTemperatureC: 80.4, returnTemperatureC: 69.5, gasStandingPressurePa: mbarToPa(21.2), gasWorkingPressurePa: mbarToPa(19.8), burnerPressurePa: mbarToPa(9.1), flueO2Percent: 4.1, flueCoPpm: 45, flueTemperatureC: 63, combustionEfficiencyPercent: 96.9 }],
      [21, { flowTemperatureC: 79.8, returnTemperatureC: 69.1, gasStandingPressurePa: mbarToPa(21.0), gasWorkingPressurePa: mbarToPa(19.5), burnerPressurePa: mbarToPa(9.0), flueO2Percent: 4.4, flueCoPpm: 62, flueTemperatureC: 65, combustionEfficiencyPercent: 96.6 }],
      [1, { flowTemperatureC: 80.1, returnTemperatureC: 69.8, gasStandingPressurePa: mbarToPa(21.1), gasWorkingPressurePa: mbarToPa(19.4), burnerPressurePa: mbarToPa(8.9), flueO2Percent: 4.9, flueCoPpm: 96, flueTemperatureC: 68, combustionEfficiencyPercent: 96.1, note: 'CO creeping up since the last service; burner clean booked with the service.' }],
    ],
  },
  {
    plantId: 'CAL-01',
    sets: [
      [42, { storeTemperatureC: 62.5, hotWaterReturnTemperatureC: 55.0, outletTemperatureC: 56.0, outletRunSeconds: 35 }],
      [21, { storeTemperatureC: 61.0, hotWaterReturnTemperatureC: 53.5, outletTemperatureC: 54.5, outletRunSeconds: 40 }],
      [1, { storeTemperatureC: 57.5, hotWaterReturnTemperatureC: 51.0, outletTemperatureC: 52.0, outletRunSeconds: 50, note: 'Primary valve to the calorifier slow to open; reported.' }],
    ],
  },
  {
    plantId: 'PU-01',
    sets: [
      [42, { systemPressureGaugePa: barToPa(1.85), gaugeHeightM: 0, unitCutInPressureGaugePa: barToPa(1.7), unitCutOutPressureGaugePa: barToPa(2.1), inhibitorResult: 'in-range', waterPh: 8.6, conductivityUSPerCm: 610, waterAppearance: 'clear' }],
      [21, { systemPressureGaugePa: barToPa(1.8), gaugeHeightM: 0, unitCutInPressureGaugePa: barToPa(1.7), unitCutOutPressureGaugePa: barToPa(2.1), inhibitorResult: 'in-range', waterPh: 8.5, conductivityUSPerCm: 640, waterAppearance: 'clear' }],
      [1, { systemPressureGaugePa: barToPa(1.8), gaugeHeightM: 0, unitCutInPressureGaugePa: barToPa(1.7), unitCutOutPressureGaugePa: barToPa(2.1), inhibitorResult: 'low', waterPh: 8.3, conductivityUSPerCm: 710, waterAppearance: 'cloudy', note: 'Make-up counter up 40 L since the last visit.' }],
    ],
  },
];

/** A boiler, a calorifier and a pressurisation unit with three visits' readings each, checked by the server. */
export async function seedDemoVisitReadings(opts: { organisationId: number; siteId: number; by: User; transaction: Transaction; now: number }) {
  const { organisationId, siteId, by, transaction, now } = opts;
  for (const { plantId, sets } of VISITS) {
    const asset = await Asset.findOne({ where: { organisationId, siteId, plantId }, transaction });
    if (!asset || (await Reading.count({ where: { assetId: asset.id }, transaction }))) continue;
    for (const [daysAgo, input] of sets) {
      const takenAt = new Date(now - daysAgo * DAY_MS);
      await Reading.create(
        { assetId: asset.id, takenAt, ...(await computedRow(asset, { surfaceTemperatures: [], note: '', ...input, takenAt }, transaction)), supersedesId: null, correctionReason: null, createdBy: by.id },
        { transaction },
      );
    }
  }
}
