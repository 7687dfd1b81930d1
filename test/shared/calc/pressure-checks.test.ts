import { describe, expect, it } from 'vitest';

import { pumpHeadCheck } from '@/shared/calc/pressure-checks';
import { barToPa } from '@/shared/calc/units';

describe('pump differential head', () => {
  it('gives roughly 10 m for about 1 bar at the inlet and 2 bar at the outlet', () => {
    const cold = pumpHeadCheck(barToPa(1), barToPa(2));
    const hot = pumpHeadCheck(barToPa(1), barToPa(2), 75);
    // common practice, no published source: 1 bar of pump differential is roughly 10 m of head
    expect(cold?.value).toBeGreaterThan(9.5);
    expect(cold?.value).toBeLessThan(10.7);
    expect(hot?.value).toBeGreaterThan(9.5);
    expect(hot?.value).toBeLessThan(10.7);
    // Hot water is lighter, so the same Δp is a taller column.
    expect(hot!.value).toBeGreaterThan(cold!.value);
    expect(cold?.unit).toBe('m');
    expect(cold?.flag).toBeUndefined();
  });

  it('needs both gauges', () => {
    expect(pumpHeadCheck(barToPa(1), undefined)).toBeUndefined();
    expect(pumpHeadCheck(null, barToPa(2))).toBeUndefined();
  });

  it('cautions when the outlet is not above the inlet, or the inlet is below atmospheric', () => {
    expect(pumpHeadCheck(barToPa(1.5), barToPa(1.5))?.flag?.level).toBe('caution');
    expect(pumpHeadCheck(barToPa(2), barToPa(1))?.value).toBeLessThan(0);
    // common practice, no published source: sub-atmospheric pump suction draws in air and risks cavitation
    expect(pumpHeadCheck(barToPa(-0.1), barToPa(0.8))?.flag?.message).toMatch(/below atmospheric/);
  });
});
