// Water–glycol mixtures for sealed systems: density and specific heat from the correlations of
// M. Conde Engineering, "Thermophysical properties of brines — models" (Zurich, 2011), for
// propylene glycol and ethylene glycol in water. Each property is
//   P = A1 + A2·Z + A3·(273.15/T) + A4·Z·(273.15/T) + A5·(273.15/T)²
// with Z the glycol mass fraction (0–1) and T in kelvin; ρ in kg/m³, c_p in kJ/(kg·K).
import { celsiusToKelvin } from '@/shared/calc/units';

export const GLYCOL_KINDS = ['propylene', 'ethylene'] as const;
export type GlycolKind = (typeof GLYCOL_KINDS)[number];
export const GLYCOL_LABELS: Record<GlycolKind, string> = { propylene: 'Propylene glycol', ethylene: 'Ethylene glycol' };

export interface GlycolMix {
  kind: GlycolKind;
  /** Glycol by mass, %. */
  percent: number;
}

type Coefficients = readonly [number, number, number, number, number];
const COEFFICIENTS: Record<GlycolKind, { density: Coefficients; cp: Coefficients }> = {
  propylene: {
    density: [508.41109, -182.4082, 965.76507, 280.29104, -472.2251],
    cp: [4.47642, 0.60863, -0.71497, -1.93855, 0.47873],
  },
  ethylene: {
    density: [658.49825, -54.81501, 664.71643, 232.71643, -322.61661],
    cp: [5.36449, 0.78863, -2.59001, -2.73187, 1.43759],
  },
};

/** Concentrations and temperatures the correlations are used for here (their stated range, from memory). */
export const GLYCOL_RANGE = { maxPercent: 60, minC: 0, maxC: 100 } as const;
export const GLYCOL_SOURCE =
  'M. Conde Engineering, Thermophysical properties of brines — models (2011): propylene and ethylene glycol–water correlations for ρ and c_p.';

function assertRange(mix: GlycolMix, temperatureC: number): void {
  if (!Number.isFinite(mix.percent) || mix.percent < 0 || mix.percent > GLYCOL_RANGE.maxPercent) {
    throw new RangeError(`Glycol concentration must be 0–${GLYCOL_RANGE.maxPercent} % by mass, got ${mix.percent}.`);
  }
  if (!Number.isFinite(temperatureC) || temperatureC < GLYCOL_RANGE.minC || temperatureC > GLYCOL_RANGE.maxC) {
    throw new RangeError(`A glycol mixture is handled here at ${GLYCOL_RANGE.minC}–${GLYCOL_RANGE.maxC} °C, got ${temperatureC} °C.`);
  }
}

function evaluate(a: Coefficients, mix: GlycolMix, temperatureC: number): number {
  assertRange(mix, temperatureC);
  const z = mix.percent / 100;
  const r = 273.15 / celsiusToKelvin(temperatureC);
  return a[0] + a[1] * z + a[2] * r + a[3] * z * r + a[4] * r * r;
}

export const glycolDensityKgPerM3 = (mix: GlycolMix, temperatureC: number): number =>
  evaluate(COEFFICIENTS[mix.kind].density, mix, temperatureC);

export const glycolSpecificHeatJPerKgK = (mix: GlycolMix, temperatureC: number): number =>
  evaluate(COEFFICIENTS[mix.kind].cp, mix, temperatureC) * 1000;
