import { describe, expect, it } from 'vitest';

import { DEFAULT_HEATING_CHECK_BANDS } from '@/shared/calc/check-bands';
import { pumpHeadCheck, SAFETY_VALVE_DANGER_TEXT, systemPressureCheck } from '@/shared/calc/pressure-checks';
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

describe('system pressure', () => {
  it('is quiet between the fill pressure and the safety valve approach band', () => {
    // common practice, no published source: a sealed system is filled to about 1 bar cold at the pressurisation unit
    const result = systemPressureCheck(barToPa(1), barToPa(1), barToPa(3));
    expect(result?.value).toBeCloseTo(1, 12);
    expect(result?.unit).toBe('bar');
    expect(result?.flag).toBeUndefined();
    expect(systemPressureCheck(barToPa(2.6), barToPa(1), barToPa(3))?.flag).toBeUndefined();
  });

  it('cautions when pressure has fallen below the cold fill pressure', () => {
    expect(systemPressureCheck(barToPa(0.95), barToPa(1), barToPa(3))?.flag).toBeUndefined();
    const low = systemPressureCheck(barToPa(0.6), barToPa(1), undefined);
    expect(low?.flag?.level).toBe('caution');
    expect(low?.flag?.message).toMatch(/below the cold fill pressure/);
  });

  it('is danger at, above or within 0.3 bar of the safety valve setting, with the make-safe text', () => {
    for (const bar of [2.7, 2.85, 3, 3.4]) {
      const result = systemPressureCheck(barToPa(bar), barToPa(1), barToPa(3));
      expect(result?.flag?.level).toBe('danger');
      expect(result?.flag?.message).toContain(SAFETY_VALVE_DANGER_TEXT);
    }
    expect(SAFETY_VALVE_DANGER_TEXT).toMatch(/site procedures/);
    expect(SAFETY_VALVE_DANGER_TEXT).toMatch(/manufacturer’s instructions/);
    expect(SAFETY_VALVE_DANGER_TEXT).toMatch(/Local codes/);
    expect(systemPressureCheck(barToPa(3.2), undefined, barToPa(3))?.flag?.message).toMatch(/at or above/);
    expect(systemPressureCheck(barToPa(2.8), undefined, barToPa(3))?.flag?.message).toMatch(/within 0.3 bar of/);
  });

  it('puts danger ahead of a low-pressure caution and honours a site approach band', () => {
    // a nonsensical setup (fill above the valve) still reports the danger
    expect(systemPressureCheck(barToPa(2.9), barToPa(3.5), barToPa(3))?.flag?.level).toBe('danger');
    const wider = { ...DEFAULT_HEATING_CHECK_BANDS, safetyValveApproachBar: 0.5 };
    expect(systemPressureCheck(barToPa(2.6), barToPa(1), barToPa(3), wider)?.flag?.level).toBe('danger');
  });

  it('needs the reading and at least one setting', () => {
    expect(systemPressureCheck(undefined, barToPa(1), barToPa(3))).toBeUndefined();
    expect(systemPressureCheck(barToPa(1.2), null, undefined)).toBeUndefined();
  });
});
