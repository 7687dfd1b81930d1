// Properties of liquid water from IAPWS-IF97 (region 1 forward equation and the
// region 4 saturation-pressure equation), computed by @neutrium/thermo.eos.iapws97
// 2.0.2 by Trevor Walker / Native Dynamics (https://neutrium.net), licensed under
// Creative Commons Attribution 4.0 International (CC-BY-4.0).
// We call its region-1 and saturation functions directly: they take pressure in MPa
// and temperature in K and return cp in kJ/(kg·K), as read in dist/PT.js and src/base.ts.
import { r1, r4_T_Psat } from '@neutrium/thermo.eos.iapws97/dist/PT';

import { celsiusToKelvin, STANDARD_ATMOSPHERE_PA } from '@/shared/calc/units';

/** Temperatures accepted for liquid water in heating plant, °C. */
export const LIQUID_WATER_RANGE_C = { min: 0, max: 150 } as const;
// IAPWS-IF97 region 1 upper pressure bound: 100 MPa.
const REGION_1_MAX_PRESSURE_PA = 100e6;
const PA_PER_MPA = 1e6;

export interface WaterProperties {
  temperatureC: number;
  /** Absolute pressure the properties were evaluated at. */
  pressureAbsPa: number;
  densityKgPerM3: number;
  specificVolumeM3PerKg: number;
  /** Isobaric specific heat capacity c_p. */
  specificHeatJPerKgK: number;
}

function assertLiquidTemperature(temperatureC: number): void {
  const { min, max } = LIQUID_WATER_RANGE_C;
  if (!Number.isFinite(temperatureC) || temperatureC < min || temperatureC > max) {
    throw new RangeError(
      `Water temperature ${temperatureC} °C is outside the supported liquid range ${min}–${max} °C.`,
    );
  }
}

/** Saturation (boiling) pressure of water at a temperature, absolute Pa (IAPWS-IF97 eq. 30). */
export function saturationPressureAbsPa(temperatureC: number): number {
  assertLiquidTemperature(temperatureC);
  return r4_T_Psat(celsiusToKelvin(temperatureC)) * PA_PER_MPA;
}

/**
 * Pressure used when none is known: one standard atmosphere, or the saturation
 * pressure when the water would otherwise boil. Liquid density changes by roughly
 * 0.05 % per MPa, so the choice hardly moves heating-plant results.
 */
export function defaultLiquidPressureAbsPa(temperatureC: number): number {
  return Math.max(STANDARD_ATMOSPHERE_PA, saturationPressureAbsPa(temperatureC));
}

/**
 * Density and c_p of liquid water (IAPWS-IF97 region 1).
 * Throws a RangeError outside 0–150 °C or when the pressure is below the
 * saturation pressure (the water would be steam, not liquid).
 */
export function liquidWaterProperties(temperatureC: number, pressureAbsPa?: number): WaterProperties {
  assertLiquidTemperature(temperatureC);
  const pressure = pressureAbsPa ?? defaultLiquidPressureAbsPa(temperatureC);
  if (!Number.isFinite(pressure) || pressure > REGION_1_MAX_PRESSURE_PA) {
    throw new RangeError(`Pressure ${pressure} Pa (absolute) is outside the IAPWS-IF97 region 1 range.`);
  }
  const saturationPa = saturationPressureAbsPa(temperatureC);
  if (pressure < saturationPa) {
    throw new RangeError(
      `At ${temperatureC} °C water boils below ${Math.round(saturationPa)} Pa absolute; ` +
        `${Math.round(pressure)} Pa absolute is not liquid water.`,
    );
  }
  const state = r1(pressure / PA_PER_MPA, celsiusToKelvin(temperatureC));
  const specificVolume = Number(state.v);
  return {
    temperatureC,
    pressureAbsPa: pressure,
    densityKgPerM3: 1 / specificVolume,
    specificVolumeM3PerKg: specificVolume,
    specificHeatJPerKgK: Number(state.cp) * 1000,
  };
}

/** Density of liquid water, kg/m³. */
export function waterDensityKgPerM3(temperatureC: number, pressureAbsPa?: number): number {
  return liquidWaterProperties(temperatureC, pressureAbsPa).densityKgPerM3;
}

/** Isobaric specific heat of liquid water, J/(kg·K). */
export function waterSpecificHeatJPerKgK(temperatureC: number, pressureAbsPa?: number): number {
  return liquidWaterProperties(temperatureC, pressureAbsPa).specificHeatJPerKgK;
}
