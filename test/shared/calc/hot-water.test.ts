import { describe, expect, it } from 'vitest';

import { hotWaterChecks, LEGIONELLA_ADVICE, LEGIONELLA_LIMITS } from '@/shared/calc/hot-water';

const one = (r: Parameters<typeof hotWaterChecks>[0]) => hotWaterChecks(r)[0];

describe('hot water against Legionella control', () => {
  it('uses the HSE temperatures', () => {
    // HSE ACOP L8 (2013) and HSG274 Part 2 (2014): store hot water at 60 °C or more
    expect(LEGIONELLA_LIMITS.storeMinC).toBe(60);
    // HSG274 Part 2: return from the circulating loop at 50 °C or more (55 °C in healthcare premises)
    expect(LEGIONELLA_LIMITS.returnMinC).toBe(50);
    // HSG274 Part 2: hot outlets at 50 °C or more within one minute
    expect(LEGIONELLA_LIMITS.outletMinC).toBe(50);
    expect(LEGIONELLA_LIMITS.outletWithinS).toBe(60);
    // HSE ACOP L8: Legionella bacteria multiply between 20 °C and 45 °C
    expect([LEGIONELLA_LIMITS.growthMinC, LEGIONELLA_LIMITS.growthMaxC]).toEqual([20, 45]);
  });

  it('flags a calorifier at 30 °C as a Legionella danger, with the advice', () => {
    // HSE ACOP L8: 30 °C is inside the 20–45 °C growth range and below the 60 °C store temperature
    const store = one({ storeTemperatureC: 30 });
    expect(store.key).toBe('store-temperature');
    expect(store.flag?.level).toBe('danger');
    expect(store.flag?.message).toMatch(/^Legionella risk: the stored hot water is at 30 °C/);
    expect(store.flag?.message).toMatch(/Raise the temperature/);
    expect(store.flag?.message).toMatch(/tell the duty holder/);
    expect(store.flag?.message).toMatch(/water-safety plan/);
    expect(store.flag?.message).toContain(LEGIONELLA_ADVICE);
    expect(store.source).toMatch(/HSE ACOP L8.*HSG274 Part 2/);
    expect(store.limit).toBe('60 °C or more');
  });

  it('cautions for a store below 60 °C but above the growth range, and is quiet at 60 °C', () => {
    // HSE ACOP L8 / HSG274 Part 2: 60 °C is the limit itself
    expect(one({ storeTemperatureC: 60 }).flag).toBeUndefined();
    expect(one({ storeTemperatureC: 55 }).flag?.level).toBe('caution');
  });

  it('checks the return at 50 °C', () => {
    // HSG274 Part 2: return at 50 °C or more
    expect(one({ hotWaterReturnTemperatureC: 50 }).flag).toBeUndefined();
    expect(one({ hotWaterReturnTemperatureC: 48 }).flag?.level).toBe('caution');
    expect(one({ hotWaterReturnTemperatureC: 42 }).flag?.level).toBe('danger');
  });

  it('checks the outlet reaches 50 °C within one minute', () => {
    // HSG274 Part 2: 50 °C within one minute
    expect(one({ outletTemperatureC: 52 }).flag).toBeUndefined();
    expect(one({ outletTemperatureC: 52, outletRunSeconds: 45 }).flag).toBeUndefined();
    const slow = one({ outletTemperatureC: 52, outletRunSeconds: 150 });
    expect(slow.flag?.level).toBe('caution');
    expect(slow.flag?.message).toMatch(/took 150 s/);
    const cold = one({ outletTemperatureC: 41, outletRunSeconds: 60 });
    expect(cold.flag?.level).toBe('danger');
    expect(cold.flag?.message).toMatch(/after 60 s of running/);
  });

  it('runs only the checks whose readings are there', () => {
    expect(hotWaterChecks({})).toEqual([]);
    expect(hotWaterChecks({ storeTemperatureC: 61, hotWaterReturnTemperatureC: 55 }).map((r) => r.key)).toEqual([
      'store-temperature',
      'hot-water-return-temperature',
    ]);
  });
});
