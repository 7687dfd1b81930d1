import { describe, expect, it } from 'vitest';

import { FLUE_LIMITS, GAS_INLET_PRESSURES, gasChecks, GAS_WORK_CAUTION, MAX_CO2_PERCENT } from '@/shared/calc/gas-checks';
import { mbarToPa } from '@/shared/calc/units';

const natural = { family: 'natural-gas' as const, burnerPressureSettingMbar: 9 };
const byKey = (results: ReturnType<typeof gasChecks>, key: string) => results.find((r) => r.key === key);

describe('gas pressures', () => {
  it('uses the natural gas and propane inlet pressures', () => {
    // from memory: EN 437, group 2H natural gas test pressures 20 mbar nominal, 17 mbar minimum, 25 mbar maximum
    expect(GAS_INLET_PRESSURES['natural-gas']).toMatchObject({ nominal: 20, min: 17, max: 25 });
    // from memory: EN 437, propane at 37 mbar, 25 mbar minimum, 45 mbar maximum
    expect(GAS_INLET_PRESSURES.lpg).toMatchObject({ nominal: 37, min: 25, max: 45 });
  });

  it('is quiet at 21 mbar standing and 19 mbar working on natural gas', () => {
    const results = gasChecks({ gasStandingPressurePa: mbarToPa(21), gasWorkingPressurePa: mbarToPa(19) }, natural);
    expect(results.map((r) => r.key)).toEqual(['gas-standing-pressure', 'gas-working-pressure']);
    expect(results.every((r) => !r.flag)).toBe(true);
    expect(results[1].value).toBeCloseTo(19, 12);
    expect(results[1].source).toMatch(/EN 437/);
  });

  it('cautions a low working pressure and a high standing pressure, naming who may do gas work', () => {
    // from memory: EN 437, below 17 mbar is below the 2H minimum
    const low = byKey(gasChecks({ gasWorkingPressurePa: mbarToPa(15) }, natural), 'gas-working-pressure')!;
    expect(low.flag?.level).toBe('caution');
    expect(low.flag?.message).toContain(GAS_WORK_CAUTION);
    expect(GAS_WORK_CAUTION).toMatch(/competent person registered as local law requires/);
    // from memory: EN 437, above 25 mbar is above the 2H maximum
    expect(byKey(gasChecks({ gasStandingPressurePa: mbarToPa(27) }, natural), 'gas-standing-pressure')?.flag?.level).toBe('caution');
  });

  it('compares the burner pressure with its setting within 10 %', () => {
    // common practice, no published source: ±10 % of the data-plate burner pressure
    expect(byKey(gasChecks({ burnerPressurePa: mbarToPa(9.5) }, natural), 'burner-pressure')?.flag).toBeUndefined();
    expect(byKey(gasChecks({ burnerPressurePa: mbarToPa(7.5) }, natural), 'burner-pressure')?.flag?.level).toBe('caution');
    expect(gasChecks({ burnerPressurePa: mbarToPa(7.5) }, { family: 'natural-gas' })).toEqual([]);
  });

  it('runs nothing for an appliance that does not burn gas', () => {
    expect(gasChecks({ gasWorkingPressurePa: mbarToPa(5), flueCoPpm: 900, flueCo2Percent: 9 }, { family: null })).toEqual([]);
  });
});

describe('flue-gas analysis', () => {
  it('works out CO₂ from O₂', () => {
    // from memory: CO₂,max of natural gas 11.7 %; CO₂ = 11.7 · (20.9 − 3.5)/20.9 = 9.741 % (worked by hand)
    expect(MAX_CO2_PERCENT['natural-gas']).toBe(11.7);
    const co2 = byKey(gasChecks({ flueO2Percent: 3.5 }, natural), 'flue-co2')!;
    expect(co2.value).toBeCloseTo(9.741, 3);
  });

  it('computes the CO/CO₂ ratio and passes a sound burner', () => {
    // BS 7967: ratio = (CO ppm / 10 000) / CO₂ % → (40 / 10 000) / 9.5 = 0.000421 (worked by hand)
    const results = gasChecks({ flueCo2Percent: 9.5, flueCoPpm: 40 }, natural);
    const ratio = byKey(results, 'flue-co-co2-ratio')!;
    expect(ratio.value).toBeCloseTo(0.000421, 6);
    expect(ratio.flag).toBeUndefined();
    expect(byKey(results, 'flue-co')?.flag).toBeUndefined();
  });

  it('cautions above 0.004 and is danger above 0.008, deferring to the unsafe-situations procedure', () => {
    // from memory: industry guidance for condensing boilers, ratio ≤ 0.004 where the manufacturer gives no figure
    expect(FLUE_LIMITS.ratioSound).toBe(0.004);
    // from memory: BS 7967 action level for a boiler, ratio above 0.008
    expect(FLUE_LIMITS.ratioAction).toBe(0.008);
    // (500 / 10 000) / 9 = 0.00556 → caution (worked by hand)
    const caution = byKey(gasChecks({ flueCo2Percent: 9, flueCoPpm: 500 }, natural), 'flue-co-co2-ratio')!;
    expect(caution.flag?.level).toBe('caution');
    // (900 / 10 000) / 9 = 0.01 → danger (worked by hand)
    const danger = byKey(gasChecks({ flueCo2Percent: 9, flueCoPpm: 900 }, natural), 'flue-co-co2-ratio')!;
    expect(danger.flag?.level).toBe('danger');
    expect(danger.flag?.message).toMatch(/not to be left in use/);
    expect(danger.flag?.message).toMatch(/unsafe gas situations/);
    expect(danger.source).toMatch(/BS 7967/);
  });

  it('cautions CO above 350 ppm where the manufacturer gives no figure', () => {
    // from memory: industry guidance for condensing boilers, CO ≤ 350 ppm where the manufacturer gives no figure
    expect(byKey(gasChecks({ flueCoPpm: 400 }, natural), 'flue-co')?.flag?.level).toBe('caution');
    expect(byKey(gasChecks({ flueCoPpm: 350 }, natural), 'flue-co')?.flag).toBeUndefined();
  });
});
