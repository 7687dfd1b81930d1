import { describe, expect, it } from 'vitest';

import { PH_RANGE, waterTreatmentChecks } from '@/shared/calc/water-treatment';

describe('water treatment', () => {
  it('cautions a low or absent inhibitor as the kit states it', () => {
    const [low] = waterTreatmentChecks({ inhibitorResult: 'low' });
    expect(low.key).toBe('inhibitor');
    expect(low.flag?.level).toBe('caution');
    expect(low.source).toMatch(/manufacturer’s test/);
    expect(waterTreatmentChecks({ inhibitorResult: 'none' })[0].flag?.level).toBe('caution');
    expect(waterTreatmentChecks({ inhibitorResult: 'in-range' })[0].flag).toBeUndefined();
  });

  it('checks pH against 7.5–9.5', () => {
    // from memory: BSRIA BG 50/2021, pH 7.5–9.5 for closed systems of mixed metals
    expect(PH_RANGE).toEqual({ min: 7.5, max: 9.5 });
    expect(waterTreatmentChecks({ waterPh: 8.2 })[0].flag).toBeUndefined();
    expect(waterTreatmentChecks({ waterPh: 6.8 })[0].flag?.message).toMatch(/acidic/);
    expect(waterTreatmentChecks({ waterPh: 10.1 })[0].flag?.message).toMatch(/aluminium/);
  });

  it('records conductivity for the trend without a fixed limit, and cautions a dirty sample', () => {
    const [conductivity] = waterTreatmentChecks({ conductivityUSPerCm: 650 });
    expect(conductivity.flag).toBeUndefined();
    expect(conductivity.unit).toBe('µS/cm');
    // common practice, no published source: black or sludgy water means corrosion
    expect(waterTreatmentChecks({ waterAppearance: 'dirty' })[0].flag?.level).toBe('caution');
    expect(waterTreatmentChecks({ waterAppearance: 'clear' })[0].flag).toBeUndefined();
  });
});
