import { describe, expect, it } from 'vitest';

import { glycolDensityKgPerM3, glycolSpecificHeatJPerKgK } from '@/shared/calc/glycol';
import { checkExpansionVessel } from '@/shared/calc/expansion-vessel';
import { waterDensityKgPerM3 } from '@/shared/calc/water';

const pg = (percent: number) => ({ kind: 'propylene' as const, percent });
const within = (actual: number, expected: number, fraction: number) => expect(Math.abs(actual / expected - 1)).toBeLessThan(fraction);

describe('water–glycol mixtures', () => {
  it('matches the handbook’s propylene glycol densities within 0.5 %', () => {
    // Melinder, Properties of Secondary Working Fluids for Indirect Systems (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 30 % PG at 20 °C, ρ = 1023.8 kg/m³
    within(glycolDensityKgPerM3(pg(30), 20), 1023.8, 0.005);
    // Melinder (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 30 % PG at 80 °C, ρ = 987.6 kg/m³
    within(glycolDensityKgPerM3(pg(30), 80), 987.6, 0.005);
    // Melinder (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 40 % PG at 10 °C, ρ = 1037.6 kg/m³
    within(glycolDensityKgPerM3(pg(40), 10), 1037.6, 0.005);
  });

  it('matches the handbook’s propylene glycol specific heat within 2.5 %', () => {
    // Melinder (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 30 % PG at 20 °C, c_p = 3.857 kJ/(kg·K)
    within(glycolSpecificHeatJPerKgK(pg(30), 20), 3857, 0.025);
    // Melinder (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 40 % PG at 40 °C, c_p = 3.771 kJ/(kg·K)
    within(glycolSpecificHeatJPerKgK(pg(40), 40), 3771, 0.025);
  });

  it('comes back to water at 0 %', () => {
    // IAPWS-IF97 via @neutrium/thermo.eos.iapws97: ρ(20 °C) = 998.2 kg/m³
    within(glycolDensityKgPerM3(pg(0), 20), waterDensityKgPerM3(20), 0.001);
  });

  it('expands more than water, so the vessel check needs a bigger vessel', () => {
    const inputs = { systemVolumeL: 500, fillTemperatureC: 10, maxFlowTemperatureC: 80, staticHeightM: 5, safetyValveSettingBarGauge: 3, installedVesselVolumesL: [50] };
    const water = checkExpansionVessel(inputs);
    const glycol = checkExpansionVessel({ ...inputs, glycol: pg(30) });
    // Melinder (IIR, 2010), the handbook's fitted polynomial evaluated by hand: 30 % PG, 1028.0 kg/m³ at 10 °C and 987.6 at 80 °C → e = 0.0409, against water's 0.0287
    within(glycol.expansionCoefficient, 0.0409, 0.12);
    expect(glycol.expansionCoefficient).toBeGreaterThan(water.expansionCoefficient);
    expect(glycol.requiredNominalVolumeL!).toBeGreaterThan(water.requiredNominalVolumeL!);
    expect(glycol.working[0].source).toMatch(/M\. Conde/);
    expect(glycol.working[0].label).toMatch(/30 % propylene glycol/);
    expect(() => checkExpansionVessel({ ...inputs, glycol: pg(70) })).toThrow(/0–60 %/);
  });
});
