import { describe, expect, it } from 'vitest';

import { DEFAULT_HEATING_CHECK_BANDS } from '@/shared/calc/check-bands';
import type { CheckResult } from '@/shared/calc/check-result';
import {
  computeHeatingChecks,
  deltaTCheck,
  flowSetpointCheck,
  heatDeliveredCheck,
  type HeatingReadings,
  type HeatingSystemSettings,
} from '@/shared/calc/heating-checks';
import { barToPa, litresPerSecondToM3PerS } from '@/shared/calc/units';

const keys = (results: CheckResult[]) => results.map((r) => r.key);

const fullReadings: HeatingReadings = {
  flowTemperatureC: 80,
  returnTemperatureC: 69,
  flowRateM3PerS: litresPerSecondToM3PerS(1),
  systemPressureGaugePa: barToPa(1.5),
  pumpInletPressureGaugePa: barToPa(1),
  pumpOutletPressureGaugePa: barToPa(2),
};
const system: HeatingSystemSettings = {
  designDeltaTK: 11,
  flowSetpointC: 80,
  fillPressureGaugePa: barToPa(1),
  safetyValveSettingGaugePa: barToPa(3),
};

describe('ΔT against design', () => {
  it('leaves a ΔT on design unflagged and shows its working', () => {
    const result = deltaTCheck(82, 71, 11);
    expect(result.value).toBe(11);
    expect(result.unit).toBe('K');
    expect(result.flag).toBeUndefined();
    expect(result.inputs.map((i) => i.value)).toEqual([82, 71, 11]);
  });

  it('flags a ΔT more than 30 % above or below design', () => {
    // common practice, no published source: within ±30 % of design ΔT is unremarkable
    expect(deltaTCheck(80, 70, 11).flag).toBeUndefined();
    const wide = deltaTCheck(80, 65, 11); // 15 K is 36 % above 11 K
    expect(wide.flag?.level).toBe('caution');
    expect(wide.flag?.message).toMatch(/36 % above design/);
    const narrow = deltaTCheck(80, 73, 11); // 7 K is 36 % below 11 K
    expect(narrow.flag?.level).toBe('caution');
    expect(narrow.flag?.message).toMatch(/36 % below design/);
    // common practice, no published source: a 20 K system reading 16 K (20 % low) is inside the band
    expect(deltaTCheck(70, 54, 20).flag).toBeUndefined();
  });

  it('flags a return at or above flow whether or not a design ΔT is set', () => {
    expect(deltaTCheck(60, 62, undefined).flag?.level).toBe('caution');
    expect(deltaTCheck(60, 60, 11).flag?.message).toMatch(/Return is at or above flow/);
    expect(deltaTCheck(70, 60, null).flag).toBeUndefined();
  });

  it('honours a tighter band set for the site', () => {
    const strict = { ...DEFAULT_HEATING_CHECK_BANDS, deltaTToleranceFraction: 0.1 };
    // 13 K against 11 K is 18 % high: fine at ±30 %, flagged at ±10 %
    expect(deltaTCheck(80, 67, 11).flag).toBeUndefined();
    expect(deltaTCheck(80, 67, 11, strict).flag?.level).toBe('caution');
  });
});

describe('heat delivered', () => {
  it('gives about 45 kW for 1 L/s at 80/69 °C', () => {
    const result = heatDeliveredCheck(80, 69, litresPerSecondToM3PerS(1));
    // from memory: steam tables give ρ ≈ 974.9 kg/m³ and c_p ≈ 4.191 kJ/(kg·K) at 74.5 °C,
    // so Q = 0.001 m³/s · 974.9 · 4.191 · 11 K ≈ 44.94 kW
    expect(Math.abs(result.value - 44.94)).toBeLessThan(0.2);
    expect(result.unit).toBe('kW');
    const labels = result.inputs.map((i) => i.label);
    expect(labels).toContain('Density ρ (IAPWS-IF97)');
    expect(result.inputs.find((i) => i.label === 'Mean water temperature')?.value).toBe(74.5);
    expect(result.flag).toBeUndefined();
  });

  it('scales with flow and reports no heat when the return is not cooler', () => {
    const one = heatDeliveredCheck(70, 50, 0.002).value;
    const two = heatDeliveredCheck(70, 50, 0.004).value;
    expect(two / one).toBeCloseTo(2, 12);
    const none = heatDeliveredCheck(50, 50, 0.002);
    expect(none.value).toBe(0);
    expect(none.flag?.level).toBe('info');
  });

  it('accepts a system pressure below boiling at the mean temperature without failing', () => {
    // 130/120 °C water at 1 bar gauge would flash; the heat sum still uses liquid properties.
    expect(heatDeliveredCheck(130, 120, 0.001, barToPa(1)).value).toBeGreaterThan(0);
  });
});

describe('flow temperature against setpoint', () => {
  it('treats an 85 °C boiler reading 81 °C as still climbing, not faulty', () => {
    const result = flowSetpointCheck(81, 85);
    expect(result.value).toBe(-4);
    // common practice, no published source: a few kelvin short of setpoint is a plant still heating up
    expect(result.flag?.level).toBe('info');
    expect(result.flag?.message).toMatch(/heating up/);
  });

  it('leaves a reading at setpoint unflagged and cautions well above it', () => {
    expect(flowSetpointCheck(86, 85).flag).toBeUndefined();
    // common practice, no published source: a few kelvin of overshoot is normal for on/off control
    expect(flowSetpointCheck(88, 85).flag?.level).toBe('info');
    // common practice, no published source: well above setpoint means the controls are not holding
    expect(flowSetpointCheck(92, 85).flag?.level).toBe('caution');
    expect(flowSetpointCheck(60, 85).flag?.level).toBe('caution');
  });
});

describe('computeHeatingChecks', () => {
  it('computes every check a full set of readings allows, in a fixed order', () => {
    const results = computeHeatingChecks(fullReadings, system);
    expect(keys(results)).toEqual(['delta-t', 'heat-delivered', 'pump-head', 'flow-setpoint-deviation', 'system-pressure']);
    expect(results.every((r) => r.flag === undefined)).toBe(true);
  });

  it('omits the checks whose inputs are missing', () => {
    expect(computeHeatingChecks({}, system)).toEqual([]);
    expect(keys(computeHeatingChecks({ flowTemperatureC: 81 }, { flowSetpointC: 85 }))).toEqual([
      'flow-setpoint-deviation',
    ]);
    expect(keys(computeHeatingChecks({ flowTemperatureC: 80, returnTemperatureC: 70 }, {}))).toEqual(['delta-t']);
    expect(keys(computeHeatingChecks({ ...fullReadings, flowRateM3PerS: null, pumpOutletPressureGaugePa: null }, {})))
      .toEqual(['delta-t']);
    expect(keys(computeHeatingChecks({ systemPressureGaugePa: barToPa(1.2) }, { designDeltaTK: 11 }))).toEqual([]);
    expect(keys(computeHeatingChecks({ systemPressureGaugePa: barToPa(1.2) }, { fillPressureGaugePa: barToPa(1) })))
      .toEqual(['system-pressure']);
  });

  it('uses the nominal density for pump head when no temperatures are read', () => {
    const [head] = computeHeatingChecks({ pumpInletPressureGaugePa: barToPa(1), pumpOutletPressureGaugePa: barToPa(2) });
    expect(head.key).toBe('pump-head');
    expect(head.inputs.find((i) => i.unit === 'kg/m³')?.value).toBe(1000);
  });

  it('refuses temperatures outside 0–150 °C and impossible settings', () => {
    expect(() => computeHeatingChecks({ flowTemperatureC: 160, returnTemperatureC: 70 })).toThrow(
      /Flow temperature 160 °C is outside the supported range 0–150 °C/,
    );
    expect(() => computeHeatingChecks({ returnTemperatureC: -5 })).toThrow(RangeError);
    expect(() => computeHeatingChecks({}, { flowSetpointC: 200 })).toThrow(/Flow setpoint/);
    expect(() => computeHeatingChecks({ flowTemperatureC: Number.NaN })).toThrow(RangeError);
    expect(() => computeHeatingChecks({ flowRateM3PerS: -0.001 })).toThrow(/Flow rate must be a non-negative/);
    expect(() => computeHeatingChecks({}, { designDeltaTK: 0 })).toThrow(/Design ΔT must be a positive/);
  });
});
