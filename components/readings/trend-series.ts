// Turns an item's reading sets into chart series, one per measured or computed quantity,
// in the units engineers read them in. Plain TypeScript so it can be tested without a screen.
import { FLUE_LIMITS, isReading, LEGIONELLA_LIMITS, m3PerSToLitresPerSecond, paToBar, paToMbar, type CheckKey } from '@/shared/calc';
import type { CheckSettings, ReadingSet } from '@/shared/types/readings';

export type TrendGroupKey =
  | 'temperature' | 'delta-t' | 'pressure' | 'flow' | 'heat' | 'pump-head'
  | 'gas-pressure' | 'flue-gas' | 'flue-co' | 'flue-ratio' | 'flue-temperature' | 'efficiency' | 'ph' | 'conductivity';

interface TrendGroup {
  key: TrendGroupKey;
  label: string;
  unit: string;
}

// Series on one chart share an axis, so each group holds one unit only.
export const TREND_GROUPS: TrendGroup[] = [
  { key: 'temperature', label: 'Temperatures', unit: '°C' },
  { key: 'delta-t', label: 'ΔT', unit: 'K' },
  { key: 'pressure', label: 'Pressures', unit: 'bar' },
  { key: 'flow', label: 'Flow rate', unit: 'L/s' },
  { key: 'heat', label: 'Heat delivered', unit: 'kW' },
  { key: 'pump-head', label: 'Pump head', unit: 'm' },
  { key: 'gas-pressure', label: 'Gas pressures', unit: 'mbar' },
  { key: 'flue-gas', label: 'O₂ and CO₂', unit: '%' },
  { key: 'flue-co', label: 'CO in the flue', unit: 'ppm' },
  { key: 'flue-ratio', label: 'CO/CO₂ ratio', unit: '' },
  { key: 'flue-temperature', label: 'Flue temperature', unit: '°C' },
  { key: 'efficiency', label: 'Efficiency', unit: '%' },
  { key: 'ph', label: 'pH', unit: 'pH' },
  { key: 'conductivity', label: 'Conductivity', unit: 'µS/cm' },
];

export interface TrendPoint {
  t: Date;
  v: number;
  readingId: number;
}

export interface TrendSeries {
  key: string;
  group: TrendGroupKey;
  label: string;
  points: TrendPoint[];
}

export interface ReferenceLine {
  group: TrendGroupKey;
  label: string;
  value: number;
  tone: 'danger' | 'neutral';
}

interface ValueSeriesDef {
  key: string;
  group: TrendGroupKey;
  label: string;
  read: (r: ReadingSet) => number | null | undefined;
}

const resultValue = (key: CheckKey) => (r: ReadingSet) => r.results.find((x) => x.key === key)?.value;
const scaled = (v: number | null, f: (n: number) => number) => (isReading(v) ? f(v) : null);

const VALUE_SERIES: ValueSeriesDef[] = [
  { key: 'flow-temperature', group: 'temperature', label: 'Flow', read: (r) => r.values.flowTemperatureC },
  { key: 'return-temperature', group: 'temperature', label: 'Return', read: (r) => r.values.returnTemperatureC },
  { key: 'setpoint', group: 'temperature', label: 'Setpoint', read: (r) => r.values.flowSetpointC },
  { key: 'delta-t', group: 'delta-t', label: 'ΔT', read: resultValue('delta-t') },
  { key: 'system-pressure', group: 'pressure', label: 'System', read: (r) => scaled(r.values.systemPressureGaugePa, paToBar) },
  { key: 'pump-inlet', group: 'pressure', label: 'Pump inlet', read: (r) => scaled(r.values.pumpInletPressureGaugePa, paToBar) },
  { key: 'pump-outlet', group: 'pressure', label: 'Pump outlet', read: (r) => scaled(r.values.pumpOutletPressureGaugePa, paToBar) },
  { key: 'flow-rate', group: 'flow', label: 'Flow rate', read: (r) => scaled(r.values.flowRateM3PerS, m3PerSToLitresPerSecond) },
  { key: 'heat', group: 'heat', label: 'Heat delivered', read: resultValue('heat-delivered') },
  { key: 'pump-head', group: 'pump-head', label: 'Pump head', read: resultValue('pump-head') },
  { key: 'store', group: 'temperature', label: 'Stored hot water', read: (r) => r.values.storeTemperatureC },
  { key: 'hw-return', group: 'temperature', label: 'Hot water return', read: (r) => r.values.hotWaterReturnTemperatureC },
  { key: 'outlet', group: 'temperature', label: 'Hot outlet', read: (r) => r.values.outletTemperatureC },
  { key: 'outside', group: 'temperature', label: 'Outside', read: (r) => r.values.outsideTemperatureC },
  { key: 'unit-cut-in', group: 'pressure', label: 'Unit cut-in', read: (r) => scaled(r.values.unitCutInPressureGaugePa, paToBar) },
  { key: 'unit-cut-out', group: 'pressure', label: 'Unit cut-out', read: (r) => scaled(r.values.unitCutOutPressureGaugePa, paToBar) },
  { key: 'gas-standing', group: 'gas-pressure', label: 'Standing', read: (r) => scaled(r.values.gasStandingPressurePa, paToMbar) },
  { key: 'gas-working', group: 'gas-pressure', label: 'Working', read: (r) => scaled(r.values.gasWorkingPressurePa, paToMbar) },
  { key: 'burner', group: 'gas-pressure', label: 'Burner', read: (r) => scaled(r.values.burnerPressurePa, paToMbar) },
  { key: 'o2', group: 'flue-gas', label: 'O₂', read: (r) => r.values.flueO2Percent },
  { key: 'co2', group: 'flue-gas', label: 'CO₂', read: (r) => r.values.flueCo2Percent ?? resultValue('flue-co2')(r) },
  { key: 'co', group: 'flue-co', label: 'CO', read: (r) => r.values.flueCoPpm },
  { key: 'ratio', group: 'flue-ratio', label: 'CO/CO₂', read: resultValue('flue-co-co2-ratio') },
  { key: 'flue-temperature', group: 'flue-temperature', label: 'Flue', read: (r) => r.values.flueTemperatureC },
  { key: 'efficiency', group: 'efficiency', label: 'Efficiency', read: (r) => r.values.combustionEfficiencyPercent },
  { key: 'ph', group: 'ph', label: 'pH', read: (r) => r.values.waterPh },
  { key: 'conductivity', group: 'conductivity', label: 'Conductivity', read: (r) => r.values.conductivityUSPerCm },
];

/** Series of the current (not superseded) sets, oldest first; empty series are left out. */
export function buildTrendSeries(readings: ReadingSet[]): TrendSeries[] {
  const current = readings
    .filter((r) => !r.supersededBy)
    .sort((a, b) => Date.parse(a.takenAt) - Date.parse(b.takenAt) || a.id - b.id);
  const series: TrendSeries[] = VALUE_SERIES.map((def) => ({
    key: def.key,
    group: def.group,
    label: def.label,
    points: current.flatMap((r) => {
      const v = def.read(r);
      return isReading(v) ? [{ t: new Date(r.takenAt), v, readingId: r.id }] : [];
    }),
  }));
  // One series per surface location, matched regardless of case and spacing.
  const surfaces = new Map<string, TrendSeries>();
  for (const r of current) {
    for (const s of r.values.surfaceTemperatures) {
      const id = s.location.trim().toLowerCase().replace(/\s+/g, ' ');
      if (!surfaces.has(id)) {
        surfaces.set(id, { key: `surface:${id}`, group: 'temperature', label: `Surface: ${s.location.trim()}`, points: [] });
      }
      surfaces.get(id)!.points.push({ t: new Date(r.takenAt), v: s.temperatureC, readingId: r.id });
    }
  }
  return [...series, ...surfaces.values()].filter((s) => s.points.length > 0);
}

/** Design values drawn across the chart so a reading can be seen against them. */
export function referenceLines(settings: CheckSettings | null | undefined): ReferenceLine[] {
  const s = settings?.settings;
  if (!s) return [];
  const lines: ReferenceLine[] = [];
  if (isReading(s.safetyValveSettingGaugePa)) {
    lines.push({ group: 'pressure', label: 'Safety valve', value: paToBar(s.safetyValveSettingGaugePa), tone: 'danger' });
  }
  if (isReading(s.fillPressureGaugePa)) lines.push({ group: 'pressure', label: 'Fill', value: paToBar(s.fillPressureGaugePa), tone: 'neutral' });
  if (isReading(s.designDeltaTK)) lines.push({ group: 'delta-t', label: 'Design', value: s.designDeltaTK, tone: 'neutral' });
  if (isReading(s.flowSetpointC)) lines.push({ group: 'temperature', label: 'Setpoint', value: s.flowSetpointC, tone: 'neutral' });
  return lines;
}

/** Published limits drawn on the charts where the readings they apply to are shown. */
export function limitLines(series: TrendSeries[]): ReferenceLine[] {
  const has = (key: string) => series.some((s) => s.key === key);
  const lines: ReferenceLine[] = [];
  if (has('store')) lines.push({ group: 'temperature', label: 'Store minimum (HSE L8)', value: LEGIONELLA_LIMITS.storeMinC, tone: 'danger' });
  if (has('hw-return') || has('outlet')) lines.push({ group: 'temperature', label: 'Return and outlet minimum (HSG274)', value: LEGIONELLA_LIMITS.returnMinC, tone: 'danger' });
  if (has('ratio')) {
    lines.push({ group: 'flue-ratio', label: 'Sound combustion', value: FLUE_LIMITS.ratioSound, tone: 'neutral' });
    lines.push({ group: 'flue-ratio', label: 'Not left in use', value: FLUE_LIMITS.ratioAction, tone: 'danger' });
  }
  if (has('co')) lines.push({ group: 'flue-co', label: 'CO limit', value: FLUE_LIMITS.coMaxPpm, tone: 'neutral' });
  return lines;
}

/** y-axis domain covering the points and reference lines, padded so nothing sits on the frame. */
export function valueDomain(values: number[]): [number, number] {
  if (!values.length) return [0, 1];
  let lo = Math.min(...values);
  let hi = Math.max(...values);
  if (lo === hi) {
    const pad = Math.abs(lo) * 0.1 || 1;
    return [lo - pad, hi + pad];
  }
  const pad = (hi - lo) * 0.08;
  lo -= pad;
  hi += pad;
  return [lo, hi];
}

/** x-axis domain; a single set gets an hour either side so its point sits mid-chart. */
export function timeDomain(times: Date[]): [Date, Date] {
  if (!times.length) return [new Date(0), new Date(3_600_000)];
  const lo = Math.min(...times.map((t) => t.getTime()));
  const hi = Math.max(...times.map((t) => t.getTime()));
  const HOUR = 3_600_000;
  return lo === hi ? [new Date(lo - HOUR), new Date(hi + HOUR)] : [new Date(lo), new Date(hi)];
}
