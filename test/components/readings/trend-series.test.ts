import { describe, expect, it } from 'vitest';
import { buildTrendSeries, referenceLines, timeDomain, valueDomain } from '@/components/readings/trend-series';
import { barToPa } from '@/shared/calc';
import { emptyReadingValues } from '@/shared/rules/readings';
import type { ReadingSet } from '@/shared/types/readings';

const set = (id: number, takenAt: string, values: Partial<ReadingSet['values']>, over: Partial<ReadingSet> = {}): ReadingSet => ({
  id, assetId: 1, takenAt, values: { ...emptyReadingValues(), ...values }, note: '', results: [], flags: [],
  settingsUsed: { siteId: 1, systemName: null, settings: {}, sources: {}, appliance: { family: null } }, createdBy: { id: 1, name: 'A' }, createdAt: takenAt,
  supersedesId: null, correctionReason: null, supersededBy: null, ...over,
});

describe('buildTrendSeries', () => {
  const sets = [
    set(3, '2025-03-03T09:00:00Z', { flowTemperatureC: 78, systemPressureGaugePa: barToPa(1.6), surfaceTemperatures: [{ location: 'Pump casing', temperatureC: 45 }] }),
    set(1, '2025-03-01T09:00:00Z', { flowTemperatureC: 99 }, { supersededBy: { id: 2, at: '2025-03-01T10:00:00Z', by: { id: 1, name: 'A' } } }),
    set(2, '2025-03-01T09:00:00Z', { flowTemperatureC: 79, systemPressureGaugePa: barToPa(1.5), surfaceTemperatures: [{ location: ' pump  CASING', temperatureC: 44 }] }),
  ];

  it('charts current sets oldest first, in bar, leaving out superseded sets and empty series', () => {
    const series = buildTrendSeries(sets);
    const flow = series.find((s) => s.key === 'flow-temperature')!;
    expect(flow.points.map((p) => [p.readingId, p.v])).toEqual([[2, 79], [3, 78]]);
    expect(series.find((s) => s.key === 'system-pressure')!.points.map((p) => p.v)).toEqual([1.5, 1.6]);
    expect(series.some((s) => s.key === 'flow-rate')).toBe(false);
  });

  it('joins surface readings of one place written differently', () => {
    const surfaces = buildTrendSeries(sets).filter((s) => s.key.startsWith('surface:'));
    expect(surfaces).toHaveLength(1);
    expect(surfaces[0].points.map((p) => p.v)).toEqual([44, 45]);
  });
});

describe('chart scales', () => {
  it('draws the safety valve setting as a danger line on the pressure chart', () => {
    const lines = referenceLines({ siteId: 1, systemName: 'S', settings: { safetyValveSettingGaugePa: barToPa(3), designDeltaTK: 11 }, sources: {}, appliance: { family: null } });
    expect(lines).toContainEqual({ group: 'pressure', label: 'Safety valve', value: 3, tone: 'danger' });
    expect(lines).toContainEqual({ group: 'delta-t', label: 'Design', value: 11, tone: 'neutral' });
  });

  it('pads flat or single values so points never sit on the frame', () => {
    expect(valueDomain([2, 2])).toEqual([1.8, 2.2]);
    const [lo, hi] = valueDomain([10, 20]);
    expect(lo).toBeLessThan(10);
    expect(hi).toBeGreaterThan(20);
    const one = new Date('2025-03-01T09:00:00Z');
    const [t0, t1] = timeDomain([one]);
    expect(t1.getTime() - t0.getTime()).toBe(2 * 3_600_000);
  });
});
