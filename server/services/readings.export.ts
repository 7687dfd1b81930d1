// Latest readings for the register CSV: one current (not superseded) set per item.
import { literal } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { Reading } from '@/server/models/reading.model';
import { User } from '@/server/models/user.model';
import { readingValues } from '@/server/services/readings.dto';
import { formatNumber, m3PerSToLitresPerSecond, paToBar } from '@/shared/calc';
import type { LatestReadingExport } from '@/shared/types/readings';

/** Per asset id, the most recently taken current reading set of the organisation's items. */
export async function latestReadingsForExport(organisationId: number): Promise<Map<number, LatestReadingExport>> {
  const rows = await Reading.findAll({
    include: [
      { model: Asset, as: 'asset', attributes: [], where: { organisationId }, required: true },
      { model: User, as: 'creator', attributes: ['id', 'name'] },
    ],
    // A set that has a correction is history, not the latest reading.
    where: literal('NOT EXISTS (SELECT 1 FROM readings AS c WHERE c.supersedes_id = `Reading`.`id`)'),
    order: [['assetId', 'ASC'], ['takenAt', 'DESC'], ['id', 'DESC']],
  });
  const latest = new Map<number, LatestReadingExport>();
  for (const r of rows) {
    if (latest.has(r.assetId)) continue;
    latest.set(r.assetId, {
      assetId: r.assetId,
      readingId: r.id,
      takenAt: r.takenAt.toISOString(),
      takenBy: r.creator?.name ?? '',
      values: readingValues(r),
      flags: r.flags,
      note: r.note,
    });
  }
  return latest;
}

const num = (v: number | null, f: (n: number) => number = (n) => n) => (v === null ? '' : formatNumber(f(v), 4));

/** CSV columns for the latest readings, in the units engineers read (°C, bar, L/s). */
export const READING_EXPORT_COLUMNS: { header: string; value: (r: LatestReadingExport | undefined) => string }[] = [
  { header: 'Readings taken at (UTC)', value: (r) => r?.takenAt ?? '' },
  { header: 'Readings taken by', value: (r) => r?.takenBy ?? '' },
  { header: 'Flow temperature (°C)', value: (r) => (r ? num(r.values.flowTemperatureC) : '') },
  { header: 'Return temperature (°C)', value: (r) => (r ? num(r.values.returnTemperatureC) : '') },
  { header: 'Setpoint (°C)', value: (r) => (r ? num(r.values.flowSetpointC) : '') },
  { header: 'System pressure (bar)', value: (r) => (r ? num(r.values.systemPressureGaugePa, paToBar) : '') },
  { header: 'Pump inlet pressure (bar)', value: (r) => (r ? num(r.values.pumpInletPressureGaugePa, paToBar) : '') },
  { header: 'Pump outlet pressure (bar)', value: (r) => (r ? num(r.values.pumpOutletPressureGaugePa, paToBar) : '') },
  { header: 'Flow rate (L/s)', value: (r) => (r ? num(r.values.flowRateM3PerS, m3PerSToLitresPerSecond) : '') },
  {
    header: 'Surface temperatures (°C)',
    value: (r) => (r ? r.values.surfaceTemperatures.map((s) => `${s.location}: ${formatNumber(s.temperatureC, 4)}`).join('; ') : ''),
  },
  { header: 'Reading flags', value: (r) => (r ? r.flags.map((f) => `${f.level}: ${f.message}`).join(' | ') : '') },
  { header: 'Reading note', value: (r) => r?.note ?? '' },
];
