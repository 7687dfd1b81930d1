import { describe, expect, it } from 'vitest';

import {
  BAR_PER_METRE_WATER,
  pressureAtReferenceBar,
  SAFETY_VALVE_DANGER_TEXT,
  systemPressureCheck,
  unitPressureChecks,
} from '@/shared/calc/sealed-system';
import { barToPa } from '@/shared/calc/units';

const at = (bar: number, gaugeHeightM?: number) => ({ systemPressureGaugePa: barToPa(bar), gaugeHeightM });
const system = { fillPressureGaugePa: barToPa(1), safetyValveSettingGaugePa: barToPa(3) };

describe('gauge height correction', () => {
  it('uses 1 m of water = 0.0981 bar', () => {
    // 1000 kg/m³ · 9.80665 m/s² (BIPM SI Brochure, g_n) · 1 m = 9806.65 Pa = 0.0980665 bar, "about 0.1 bar" in the trade
    expect(BAR_PER_METRE_WATER).toBeCloseTo(0.0980665, 9);
    // a gauge 5 m above the vessel reads 5 · 0.0981 = 0.49 bar less than the vessel sees (worked by hand)
    expect(pressureAtReferenceBar(1.2, 5)).toBeCloseTo(1.6903, 4);
    expect(pressureAtReferenceBar(1.2, -2)).toBeCloseTo(1.0039, 4);
    expect(pressureAtReferenceBar(1.2, null)).toBe(1.2);
  });

  it('compares a high gauge at the vessel’s level, so it is not flagged as low', () => {
    // 0.6 bar on a gauge 5 m up is 1.09 bar at the vessel: above the 1 bar fill (less 0.1 bar tolerance)
    expect(systemPressureCheck(at(0.6), system)?.flag?.level).toBe('caution');
    const corrected = systemPressureCheck(at(0.6, 5), system)!;
    expect(corrected.flag).toBeUndefined();
    expect(corrected.value).toBeCloseTo(1.0903, 4);
    expect(corrected.formula).toMatch(/0\.0981 bar\/m/);
    expect(corrected.source).toMatch(/1 m of water = 0\.0981 bar/);
  });
});

describe('system pressure against fill, p_e and the safety valve', () => {
  it('is quiet between the fill pressure and the final design pressure', () => {
    // common practice, no published source: a sealed system is filled to about 1 bar cold at the pressurisation unit
    const result = systemPressureCheck(at(1), system);
    expect(result?.value).toBeCloseTo(1, 12);
    expect(result?.flag).toBeUndefined();
    // EN 12828 Annex D: p_e = p_SV − 0.5 bar for a valve up to 5 bar → 2.5 bar; 2.49 is below it
    expect(systemPressureCheck(at(2.49), system)?.flag).toBeUndefined();
    expect(result?.limit).toBe('at least 0.9 bar and below 2.5 bar');
  });

  it('cautions between p_e and the safety valve setting: waterlogged vessel or overfilled system', () => {
    // EN 12828 Annex D: p_e = 3 − 0.5 = 2.5 bar; a reading from 2.5 bar up to 3 bar is in the band
    for (const bar of [2.5, 2.7, 2.99]) {
      const result = systemPressureCheck(at(bar), system);
      expect(result?.flag?.level).toBe('caution');
      expect(result?.flag?.message).toMatch(/waterlogged/);
      expect(result?.flag?.message).toMatch(/overfilled/);
    }
    // EN 12828 Annex D: above 5 bar Δp_SVc = 0.1 · p_SV → p_e = 6 − 0.6 = 5.4 bar
    expect(systemPressureCheck(at(5.3), { safetyValveSettingGaugePa: barToPa(6) })?.flag).toBeUndefined();
    expect(systemPressureCheck(at(5.45), { safetyValveSettingGaugePa: barToPa(6) })?.flag?.level).toBe('caution');
  });

  it('is danger at or above the safety valve setting, with the make-safe text', () => {
    for (const bar of [3, 3.4]) {
      const result = systemPressureCheck(at(bar), system);
      expect(result?.flag?.level).toBe('danger');
      expect(result?.flag?.message).toContain(SAFETY_VALVE_DANGER_TEXT);
      expect(result?.flag?.message).toMatch(/at or above/);
    }
    expect(SAFETY_VALVE_DANGER_TEXT).toMatch(/site procedures/);
    expect(SAFETY_VALVE_DANGER_TEXT).toMatch(/Local codes/);
  });

  it('cautions when pressure has fallen below the cold fill pressure', () => {
    expect(systemPressureCheck(at(0.95), system)?.flag).toBeUndefined();
    const low = systemPressureCheck(at(0.6), { fillPressureGaugePa: barToPa(1) });
    expect(low?.flag?.level).toBe('caution');
    expect(low?.flag?.message).toMatch(/below the cold fill pressure/);
  });

  it('needs the reading and at least one setting', () => {
    expect(systemPressureCheck({}, system)).toBeUndefined();
    expect(systemPressureCheck(at(1.2), {})).toBeUndefined();
  });
});

describe('pressurisation unit cut-in and cut-out', () => {
  const settings = { ...system, vesselPreChargeGaugePa: barToPa(0.8) };
  const unit = (cutIn: number | null, cutOut: number | null) =>
    unitPressureChecks({ unitCutInPressureGaugePa: cutIn === null ? null : barToPa(cutIn), unitCutOutPressureGaugePa: cutOut === null ? null : barToPa(cutOut) }, settings);

  it('is quiet for a cut-in above the pre-charge and a cut-out below p_e', () => {
    const results = unit(1, 1.5);
    expect(results.map((r) => r.key)).toEqual(['unit-cut-in', 'unit-cut-out']);
    expect(results.every((r) => !r.flag)).toBe(true);
    // EN 12828 Annex D: p_e = 3 − 0.5 = 2.5 bar
    expect(results[1].limit).toBe('below 2.5 bar');
  });

  it('cautions when the cut-in is not above the vessel pre-charge', () => {
    // EN 12828 Annex D: the initial pressure must stay above p_0 so the vessel keeps its water reserve
    expect(unit(0.8, 1.5)[0].flag?.message).toMatch(/not above the vessel pre-charge/);
  });

  it('cautions when the cut-out reaches p_e, and when cut-out is not above cut-in', () => {
    expect(unit(1, 2.5)[1].flag?.level).toBe('caution');
    expect(unit(1.4, 1.2)[0].flag?.message).toMatch(/not above cut-in/);
  });
});
