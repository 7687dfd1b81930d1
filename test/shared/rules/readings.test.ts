import { describe, expect, it } from 'vitest';
import { barToPa, m3ToLitres } from '@/shared/calc';
import { emptyReadingValues, expansionInputsFor, resolveCheckSettings, runReadingChecks, type RegisterContext } from '@/shared/rules/readings';
import type { HeatingSystem, RegisterVessel } from '@/shared/types/readings';

const system = (over: Partial<HeatingSystem> = {}): HeatingSystem => ({
  siteId: 1, name: 'LTHW 1', configured: true, designDeltaTK: 20, flowSetpointC: 70, fillPressureGaugePa: null,
  safetyValveSettingGaugePa: barToPa(3), systemVolumeM3: 0.5, staticHeightM: 5, maxFlowTemperatureC: 80, fillTemperatureC: 10,
  preChargeMarginBar: null, glycolKind: null, glycolPercent: null, compensationOutsideLowC: null, compensationFlowAtLowC: null,
  compensationOutsideHighC: null, compensationFlowAtHighC: null, assetCount: 3, updatedAt: null, updatedBy: null, ...over,
});
const ctx = (over: Partial<RegisterContext> = {}): RegisterContext => ({
  siteId: 1, systemName: 'LTHW 1', system: system(), pressurisationUnits: [{ plantId: 'PU-01', fillPressureBar: 1.2 }], assetFlowSetpointC: null, ...over,
});

describe('resolveCheckSettings', () => {
  it('takes the fill pressure from the pressurisation unit unless the system overrides it', () => {
    const fromUnit = resolveCheckSettings(ctx());
    expect(fromUnit.settings.fillPressureGaugePa).toBe(barToPa(1.2));
    expect(fromUnit.sources.fillPressureGaugePa).toBe('Pressurisation unit PU-01 in the register');
    const overridden = resolveCheckSettings(ctx({ system: system({ fillPressureGaugePa: barToPa(1.5) }) }));
    expect(overridden.settings.fillPressureGaugePa).toBe(barToPa(1.5));
    expect(overridden.sources.fillPressureGaugePa).toMatch(/set by hand/);
  });

  it('prefers the item’s own setpoint to the system’s, and has nothing to offer without a system', () => {
    expect(resolveCheckSettings(ctx({ assetFlowSetpointC: 82 })).settings.flowSetpointC).toBe(82);
    expect(resolveCheckSettings(ctx()).settings.flowSetpointC).toBe(70);
    const none = resolveCheckSettings({ siteId: 1, systemName: null, system: null, pressurisationUnits: [], assetFlowSetpointC: null });
    expect(none.settings).toEqual({});
  });
});

describe('runReadingChecks', () => {
  it('flags a ΔT far from a 20 K design and lets the set’s own setpoint win', () => {
    const values = { ...emptyReadingValues(), flowTemperatureC: 70, returnTemperatureC: 62, flowSetpointC: 72 };
    const { results, flags, settingsUsed } = runReadingChecks(values, resolveCheckSettings(ctx()));
    // common practice, no published source: ΔT more than 30 % from design is flagged (8 K is 60 % below 20 K)
    expect(flags).toContainEqual({ key: 'delta-t', level: 'caution', message: expect.stringMatching(/60 % below design/) });
    expect(results.find((r) => r.key === 'flow-setpoint-deviation')?.value).toBe(-2);
    expect(settingsUsed.sources.flowSetpointC).toBe('This reading');
  });

  it('gives a danger flag for a system pressure above the safety valve setting', () => {
    const values = { ...emptyReadingValues(), systemPressureGaugePa: barToPa(3.2) };
    const { flags } = runReadingChecks(values, resolveCheckSettings(ctx()));
    expect(flags.map((f) => [f.key, f.level])).toEqual([['system-pressure', 'danger']]);
  });
});

describe('runReadingChecks on a weather-compensated system', () => {
  // An invented curve: 80 °C flow at −3 °C outside, 40 °C at 18 °C outside.
  const compensated = ctx({
    assetFlowSetpointC: 80,
    system: system({ compensationOutsideLowC: -3, compensationFlowAtLowC: 80, compensationOutsideHighC: 18, compensationFlowAtHighC: 40 }),
  });

  it('does not flag a compensated system running cooler on a mild day', () => {
    const values = { ...emptyReadingValues(), flowTemperatureC: 52, returnTemperatureC: 40, outsideTemperatureC: 12 };
    const { results, flags, settingsUsed } = runReadingChecks(values, resolveCheckSettings(compensated));
    // 80 − 40/21 · 15 = 51.43 °C at 12 °C outside (worked by hand); 52 °C is within the ±2 K deadband
    expect(settingsUsed.settings.flowSetpointC).toBeCloseTo(51.43, 2);
    expect(settingsUsed.sources.flowSetpointC).toMatch(/Weather compensation/);
    expect(results.find((r) => r.key === 'flow-setpoint-deviation')?.flag).toBeUndefined();
    expect(flags.filter((f) => f.key === 'flow-setpoint-deviation')).toEqual([]);
    // the same flow against the fixed 80 °C setpoint would be well below it
    const fixed = runReadingChecks(values, resolveCheckSettings(ctx({ assetFlowSetpointC: 80 })));
    expect(fixed.flags.find((f) => f.key === 'flow-setpoint-deviation')?.level).toBe('caution');
  });

  it('skips the setpoint check when the outside temperature was not read', () => {
    const values = { ...emptyReadingValues(), flowTemperatureC: 52, returnTemperatureC: 40 };
    const { results, settingsUsed } = runReadingChecks(values, resolveCheckSettings(compensated));
    expect(results.find((r) => r.key === 'flow-setpoint-deviation')).toBeUndefined();
    expect(settingsUsed.sources.flowSetpointC).toMatch(/enter the outside temperature/);
  });
});

describe('runReadingChecks for a visit', () => {
  it('checks a calorifier, a boiler’s gas and flue gas, and a pressurisation unit from one set of rules', () => {
    const values = {
      ...emptyReadingValues(), storeTemperatureC: 30, gasWorkingPressurePa: 1900, flueCo2Percent: 9, flueCoPpm: 900,
      unitCutInPressureGaugePa: barToPa(1.1), unitCutOutPressureGaugePa: barToPa(1.5),
    };
    const settings = resolveCheckSettings(ctx({ gasFamily: 'natural-gas', vesselPreChargeBar: 0.9 }));
    expect(settings.settings.vesselPreChargeGaugePa).toBe(barToPa(0.9));
    const { flags, results } = runReadingChecks(values, settings);
    // HSE ACOP L8: 30 °C is in the 20–45 °C growth range → danger; from memory, BS 7967: ratio 0.01 > 0.008 → danger
    expect(flags.map((f) => [f.key, f.level])).toEqual([['flue-co', 'caution'], ['flue-co-co2-ratio', 'danger'], ['store-temperature', 'danger']]);
    expect(results.map((r) => r.key)).toEqual(['unit-cut-in', 'unit-cut-out', 'gas-working-pressure', 'flue-co', 'flue-co-co2-ratio', 'store-temperature']);
    expect(results.every((r) => r.source)).toBe(true);
  });
});

describe('expansionInputsFor', () => {
  const vessels: RegisterVessel[] = [
    { assetId: 1, plantId: 'EV-01', name: 'Vessel 1', capacityL: 50, preChargeBar: 1 },
    { assetId: 2, plantId: 'EV-02', name: 'Vessel 2', capacityL: 35, preChargeBar: 0.9 },
  ];

  it('builds complete inputs from the system and the vessels, with the lowest recorded pre-charge', () => {
    const { complete, missing } = expansionInputsFor(system(), vessels);
    expect(missing).toEqual([]);
    expect(complete).toEqual({
      systemVolumeL: m3ToLitres(0.5), fillTemperatureC: 10, maxFlowTemperatureC: 80, staticHeightM: 5,
      safetyValveSettingBarGauge: 3, preChargeBarGauge: 0.9, installedVesselVolumesL: [50, 35], glycol: null,
    });
    const glycol = expansionInputsFor(system({ glycolKind: 'propylene', glycolPercent: 25 }), vessels).complete;
    expect(glycol?.glycol).toEqual({ kind: 'propylene', percent: 25 });
  });

  it('lists what is missing instead of guessing', () => {
    const { complete, missing, inputs } = expansionInputsFor(system({ systemVolumeM3: null, staticHeightM: null }), [
      { ...vessels[0], capacityL: null },
    ]);
    expect(complete).toBeNull();
    expect(missing).toEqual(['System water volume (system settings)', 'Static height (system settings)', 'Capacity of vessel EV-01 (register)']);
    expect(inputs.installedVesselVolumesL).toEqual([]);
  });
});
