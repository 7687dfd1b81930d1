import { r1 } from '@neutrium/thermo.eos.iapws97/dist/PT';
import { describe, expect, it } from 'vitest';

import {
  defaultLiquidPressureAbsPa,
  liquidWaterProperties,
  saturationPressureAbsPa,
  waterDensityKgPerM3,
  waterSpecificHeatJPerKgK,
} from '@/shared/calc/water';

const kelvinToC = (k: number) => k - 273.15;

describe('liquid water properties (IAPWS-IF97 region 1)', () => {
  it('reproduces the verification values at T = 300 K, p = 3 MPa', () => {
    const water = liquidWaterProperties(kelvinToC(300), 3e6);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: v = 0.100215168e-2 m³/kg, via @neutrium/thermo.eos.iapws97
    expect(water.specificVolumeM3PerKg).toBeCloseTo(0.100215168e-2, 11);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: c_p = 0.417301218e1 kJ/(kg·K)
    expect(water.specificHeatJPerKgK / 1000).toBeCloseTo(4.17301218, 7);
  });

  it('reproduces the verification values at T = 300 K, p = 80 MPa', () => {
    const water = liquidWaterProperties(kelvinToC(300), 80e6);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: v = 0.971180894e-3 m³/kg
    expect(water.specificVolumeM3PerKg).toBeCloseTo(0.971180894e-3, 11);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: c_p = 0.401008987e1 kJ/(kg·K)
    expect(water.specificHeatJPerKgK / 1000).toBeCloseTo(4.01008987, 7);
  });

  it('relies on a library that reproduces T = 500 K, p = 3 MPa, which our liquid range refuses', () => {
    const state = r1(3, 500);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: v = 0.120241800e-2 m³/kg
    expect(Number(state.v)).toBeCloseTo(0.1202418e-2, 11);
    // IAPWS R7-97(2012) IAPWS-IF97, Table 5: c_p = 0.465580682e1 kJ/(kg·K)
    expect(Number(state.cp)).toBeCloseTo(4.65580682, 7);
    // 500 K is 226.85 °C, outside the 0–150 °C heating range.
    expect(() => liquidWaterProperties(kelvinToC(500), 3e6)).toThrow(/outside the supported liquid range 0–150 °C/);
  });

  it('matches a steam table at one standard atmosphere', () => {
    // from memory: NIST Chemistry WebBook (IAPWS-95), water at 0.101325 MPa, 20 °C: ρ = 998.21 kg/m³
    expect(waterDensityKgPerM3(20, 101_325)).toBeCloseTo(998.21, 1);
    // from memory: same table, 60 °C: ρ = 983.20 kg/m³
    expect(waterDensityKgPerM3(60, 101_325)).toBeCloseTo(983.2, 1);
    // from memory: same table, 80 °C: ρ = 971.80 kg/m³
    expect(waterDensityKgPerM3(80, 101_325)).toBeCloseTo(971.8, 1);
    // from memory: same table, c_p ≈ 4.184 kJ/(kg·K) at 20 °C and ≈ 4.197 at 80 °C (±0.005 covers IF97 vs IAPWS-95)
    expect(Math.abs(waterSpecificHeatJPerKgK(20, 101_325) - 4184)).toBeLessThan(5);
    expect(Math.abs(waterSpecificHeatJPerKgK(80, 101_325) - 4197)).toBeLessThan(5);
  });

  it('puts the density maximum near 4 °C', () => {
    // from memory: pure water is densest at about 3.98 °C, ρ ≈ 999.97 kg/m³
    expect(waterDensityKgPerM3(4)).toBeCloseTo(999.97, 1);
    expect(waterDensityKgPerM3(4)).toBeGreaterThan(waterDensityKgPerM3(0));
    expect(waterDensityKgPerM3(4)).toBeGreaterThan(waterDensityKgPerM3(8));
  });

  it('gives the saturation pressure from the region 4 equation', () => {
    // IAPWS R7-97(2012) IAPWS-IF97, Table 35: T = 300 K → p_s = 0.353658941e-2 MPa
    expect(saturationPressureAbsPa(kelvinToC(300))).toBeCloseTo(3536.58941, 3);
    // from memory: water boils at 100 °C at 101.42 kPa (the ITS-90 boiling point is 99.97 °C at 101.325 kPa)
    expect(saturationPressureAbsPa(100)).toBeCloseTo(101_418, -1);
  });

  it('defaults to atmospheric pressure, or saturation where water would boil at atmospheric', () => {
    expect(defaultLiquidPressureAbsPa(60)).toBe(101_325);
    expect(defaultLiquidPressureAbsPa(120)).toBe(saturationPressureAbsPa(120));
    expect(liquidWaterProperties(120).pressureAbsPa).toBeGreaterThan(101_325);
  });
});

describe('liquid water input range', () => {
  it('refuses temperatures outside 0–150 °C with a clear message', () => {
    expect(() => waterDensityKgPerM3(-1)).toThrow(/-1 °C is outside the supported liquid range 0–150 °C/);
    expect(() => waterDensityKgPerM3(150.5)).toThrow(RangeError);
    expect(() => waterDensityKgPerM3(Number.NaN)).toThrow(RangeError);
    expect(() => waterDensityKgPerM3(0)).not.toThrow();
    expect(() => waterDensityKgPerM3(150)).not.toThrow();
  });

  it('refuses a pressure at which the water would be steam', () => {
    // 140 °C at one atmosphere is above the boiling point, so region 1 does not apply.
    expect(() => liquidWaterProperties(140, 101_325)).toThrow(/boils below/);
  });

  it('refuses pressures beyond the region 1 limit of 100 MPa', () => {
    // IAPWS R7-97(2012): region 1 is defined up to 100 MPa
    expect(() => liquidWaterProperties(20, 101e6)).toThrow(/outside the IAPWS-IF97 region 1 range/);
  });
});
