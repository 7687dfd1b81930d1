// Turns an item's reading sets into chart series, one per measured or computed quantity,
// in the units engineers read them in. Plain TypeScript so it can be tested without a screen.
import { isReading, m3PerSToLitresPerSecond, paToBar, type HeatingCheckKey } from '@/shared/calc';
import type { CheckSettings, ReadingSet } from '@/shared/types/readings';

export type TrendGroupKey = 'temperature' | 'delta-t' | 'pressure' | 'flow' | 'heat' | 'pump-head';

export interface TrendGroup {
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

const resultValue = (key: HeatingCheckKey) => (r: ReadingSet) => r.results.find((x) => x.key === key)?.value;
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
