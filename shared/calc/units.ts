// Unit conversions for readings and plant checks. Everything is stored in SI
// (Pa, m³/s, m³, m), except temperatures, which the trade records in °C;
// temperature differences are always kelvin.

// Standard acceleration of gravity, g_n: BIPM SI Brochure (9th ed.) and ISO 80000-3.
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
// Standard atmosphere: ISO 2533 / BIPM, 101 325 Pa exactly.
export const STANDARD_ATMOSPHERE_PA = 101_325;
// 1 bar = 100 kPa exactly (ISO 80000-4).
export const PA_PER_BAR = 100_000;
// Density the trade uses for "metres of water column" conversions.
export const NOMINAL_WATER_DENSITY_KG_PER_M3 = 1000;
export const CELSIUS_TO_KELVIN_OFFSET = 273.15;

export const barToPa = (bar: number): number => bar * PA_PER_BAR;
export const paToBar = (pa: number): number => pa / PA_PER_BAR;
export const kPaToPa = (kPa: number): number => kPa * 1000;
export const paToKPa = (pa: number): number => pa / 1000;
// 1 mbar = 100 Pa exactly (ISO 80000-4 via 1 bar = 10^5 Pa); gas pressures are read in mbar.
export const PA_PER_MBAR = 100;
export const mbarToPa = (mbar: number): number => mbar * PA_PER_MBAR;
export const paToMbar = (pa: number): number => pa / PA_PER_MBAR;

export const gaugeToAbsolutePa = (gaugePa: number): number => gaugePa + STANDARD_ATMOSPHERE_PA;

export const celsiusToKelvin = (c: number): number => c + CELSIUS_TO_KELVIN_OFFSET;

export const litresToM3 = (litres: number): number => litres / 1000;
export const m3ToLitres = (m3: number): number => m3 * 1000;

export const litresPerSecondToM3PerS = (lPerS: number): number => lPerS / 1000;
export const m3PerSToLitresPerSecond = (m3PerS: number): number => m3PerS * 1000;
export const litresPerMinuteToM3PerS = (lPerMin: number): number => lPerMin / 60_000;
export const m3PerSToLitresPerMinute = (m3PerS: number): number => m3PerS * 60_000;
export const m3PerHourToM3PerS = (m3PerH: number): number => m3PerH / 3600;
export const m3PerSToM3PerHour = (m3PerS: number): number => m3PerS * 3600;

/** Pressure of a liquid column: p = ρ·g·h. */
export function headMToPa(
  headM: number,
  densityKgPerM3: number = NOMINAL_WATER_DENSITY_KG_PER_M3,
  gravityMPerS2: number = STANDARD_GRAVITY_M_PER_S2,
): number {
  return densityKgPerM3 * gravityMPerS2 * headM;
}

/** Liquid column for a pressure: h = p / (ρ·g). 1 bar ≈ 10.197 m at 1000 kg/m³ and g_n. */
export function paToHeadM(
  pressurePa: number,
  densityKgPerM3: number = NOMINAL_WATER_DENSITY_KG_PER_M3,
  gravityMPerS2: number = STANDARD_GRAVITY_M_PER_S2,
): number {
  if (!(densityKgPerM3 > 0) || !(gravityMPerS2 > 0)) {
    throw new RangeError('Density and gravity must be positive to convert pressure to head.');
  }
  return pressurePa / (densityKgPerM3 * gravityMPerS2);
}

interface UnitDefinition {
  key: string;
  label: string;
  toSi: (value: number) => number;
  fromSi: (value: number) => number;
}

const identity = (value: number): number => value;

/** Unit choices offered on forms, per quantity. The first entry is the form default. */
export const UNIT_OPTIONS = {
  pressure: [
    { key: 'bar', label: 'bar', toSi: barToPa, fromSi: paToBar },
    { key: 'kPa', label: 'kPa', toSi: kPaToPa, fromSi: paToKPa },
    { key: 'mbar', label: 'mbar', toSi: mbarToPa, fromSi: paToMbar },
  ],
  gasPressure: [
    { key: 'mbar', label: 'mbar', toSi: mbarToPa, fromSi: paToMbar },
    { key: 'kPa', label: 'kPa', toSi: kPaToPa, fromSi: paToKPa },
    { key: 'bar', label: 'bar', toSi: barToPa, fromSi: paToBar },
  ],
  flow: [
    { key: 'L/s', label: 'L/s', toSi: litresPerSecondToM3PerS, fromSi: m3PerSToLitresPerSecond },
    { key: 'L/min', label: 'L/min', toSi: litresPerMinuteToM3PerS, fromSi: m3PerSToLitresPerMinute },
    { key: 'm3/h', label: 'm³/h', toSi: m3PerHourToM3PerS, fromSi: m3PerSToM3PerHour },
  ],
  temperature: [{ key: 'C', label: '°C', toSi: identity, fromSi: identity }],
  length: [{ key: 'm', label: 'm', toSi: identity, fromSi: identity }],
  percent: [{ key: '%', label: '%', toSi: identity, fromSi: identity }],
  ppm: [{ key: 'ppm', label: 'ppm', toSi: identity, fromSi: identity }],
  ph: [{ key: 'pH', label: 'pH', toSi: identity, fromSi: identity }],
  conductivity: [{ key: 'uS/cm', label: 'µS/cm', toSi: identity, fromSi: identity }],
  time: [{ key: 's', label: 's', toSi: identity, fromSi: identity }],
  volume: [
    { key: 'L', label: 'L', toSi: litresToM3, fromSi: m3ToLitres },
    { key: 'm3', label: 'm³', toSi: identity, fromSi: identity },
  ],
} as const satisfies Record<string, readonly UnitDefinition[]>;

/** The unit each quantity is stored in. */
export const SI_UNIT_LABEL = {
  pressure: 'Pa',
  flow: 'm³/s',
  temperature: '°C',
  length: 'm',
  volume: 'm³',
  gasPressure: 'Pa',
  // Percentages, ppm, pH and conductivity are kept as the trade reads them (µS/cm, not S/m).
  percent: '%',
  ppm: 'ppm',
  ph: 'pH',
  conductivity: 'µS/cm',
  time: 's',
} as const satisfies Record<keyof typeof UNIT_OPTIONS, string>;

export type PhysicalQuantity = keyof typeof UNIT_OPTIONS;
export type UnitKey<Q extends PhysicalQuantity> = (typeof UNIT_OPTIONS)[Q][number]['key'];

function findUnit(quantity: PhysicalQuantity, unit: string): UnitDefinition {
  const options: readonly UnitDefinition[] | undefined = UNIT_OPTIONS[quantity];
  if (!options) throw new RangeError(`Unknown quantity "${String(quantity)}".`);
  const found = options.find((option) => option.key === unit);
  if (!found) {
    const allowed = options.map((option) => option.key).join(', ');
    throw new RangeError(`Unknown ${quantity} unit "${unit}"; expected one of ${allowed}.`);
  }
  return found;
}

/** Converts a value entered in `unit` to the stored (SI) value. */
export function toSi<Q extends PhysicalQuantity>(quantity: Q, unit: UnitKey<Q>, value: number): number {
  return findUnit(quantity, unit).toSi(value);
}

/** Converts a stored (SI) value to `unit` for display. */
export function fromSi<Q extends PhysicalQuantity>(quantity: Q, unit: UnitKey<Q>, value: number): number {
  return findUnit(quantity, unit).fromSi(value);
}
