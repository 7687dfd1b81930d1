import type { Transaction } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { HeatingSystem } from '@/server/models/heating-system.model';
import { Reading } from '@/server/models/reading.model';
import { Site } from '@/server/models/site.model';
import type { User } from '@/server/models/user.model';
import { computedRow } from '@/server/services/readings.service';
import { DEMO_SITES } from '@/server/seed/demo-register-data';
import { seedDemoVisitReadings } from '@/server/seed/demo-visit-readings';
import { barToPa, litresPerSecondToM3PerS } from '@/shared/calc';
import type { ReadingSetInput } from '@/shared/schemas/readings';

const SYSTEM = 'LTHW primary';
const DAY_MS = 86_400_000;

// Invented design values for the demo school's primary circuit (three 320 kW boilers, 11 K design ΔT).
const DESIGN = {
  designDeltaTK: 11,
  flowSetpointC: null,
  fillPressureGaugePa: null,
  safetyValveSettingGaugePa: barToPa(3),
  systemVolumeM3: 1.6,
  staticHeightM: 11,
  maxFlowTemperatureC: 82,
  fillTemperatureC: 10,
  preChargeMarginBar: null,
};

// Weekly rounds on the duty primary pump: [days ago, flow °C, return °C, system bar, inlet bar, outlet bar, L/s, motor casing °C].
const ROUNDS: [number, number, number, number, number, number, number, number][] = [
  [42, 79.5, 68.8, 2.05, 1.95, 3.05, 6.9, 44],
  [35, 80.2, 69.0, 2.1, 1.98, 3.08, 6.8, 45],
  [28, 78.9, 69.9, 2.0, 1.92, 3.0, 6.6, 46],
  [21, 80.4, 66.0, 1.95, 1.7, 2.9, 5.1, 47],
  [14, 79.8, 70.1, 1.9, 1.83, 2.95, 6.4, 45],
  [7, 80.1, 69.4, 1.85, 1.78, 2.9, 6.7, 44],
  [1, 80.0, 69.1, 1.8, 1.74, 2.86, 6.8, 45],
];

/**
 * Seeds design values for the first demo site's primary circuit and a few weeks of readings on its duty
 * pump, including one set corrected by its author, so the trend and the correction history have
 * something to show. Once only: does nothing when the organisation already has readings.
 */
export async function seedDemoReadings(opts: { organisationId: number; authors: { engineer: User; engineer2: User }; transaction: Transaction; now?: Date }) {
  const { organisationId, authors, transaction } = opts;
  const now = (opts.now ?? new Date()).getTime();
  const site = await Site.findOne({ where: { organisationId, name: DEMO_SITES[0].name }, transaction });
  if (!site) return false;
  const pump = await Asset.findOne({ where: { organisationId, siteId: site.id, plantId: 'P-01A' }, transaction });
  if (!pump || (await Reading.count({ where: { assetId: pump.id }, transaction }))) return false;
  if (!(await HeatingSystem.count({ where: { siteId: site.id, name: SYSTEM }, transaction }))) {
    await HeatingSystem.create({ organisationId, siteId: site.id, name: SYSTEM, ...DESIGN, updatedBy: authors.engineer.id }, { transaction });
  }
  const log = async (input: ReadingSetInput, by: User, extra: { supersedesId?: number; correctionReason?: string } = {}) =>
    Reading.create(
      {
        assetId: pump.id, takenAt: input.takenAt!, ...(await computedRow(pump, input, transaction)),
        supersedesId: extra.supersedesId ?? null, correctionReason: extra.correctionReason ?? null, createdBy: by.id,
      },
      { transaction },
    );
  for (const [i, [daysAgo, flow, ret, sys, inlet, outlet, lps, casing]] of ROUNDS.entries()) {
    const by = i % 2 ? authors.engineer2 : authors.engineer;
    const takenAt = new Date(now - daysAgo * DAY_MS);
    const input: ReadingSetInput = {
      takenAt, flowTemperatureC: flow, returnTemperatureC: ret, flowRateM3PerS: litresPerSecondToM3PerS(lps),
      systemPressureGaugePa: barToPa(sys), pumpInletPressureGaugePa: barToPa(inlet), pumpOutletPressureGaugePa: barToPa(outlet),
      surfaceTemperatures: [{ location: 'Pump motor casing', temperatureC: casing }],
      note: daysAgo === 21 ? 'Strainer on the primary return partly blocked; reported to the supervisor.' : '',
    };
    if (daysAgo !== 14) {
      await log(input, by);
      continue;
    }
    // A slip of the finger, then the author's correction: the original stays on record.
    const typo = await log({ ...input, systemPressureGaugePa: barToPa(19) }, by);
    await log(input, by, { supersedesId: typo.id, correctionReason: 'Typed 19 for 1.9 bar.' });
  }
  await seedDemoVisitReadings({ organisationId, siteId: site.id, by: authors.engineer, transaction, now });
  return true;
}
