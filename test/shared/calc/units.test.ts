import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import {
  barToPa,
  fromSi,
  headMToPa,
  kPaToPa,
  mbarToPa,
  paToKPa,
  paToMbar,
  litresPerMinuteToM3PerS,
  litresPerSecondToM3PerS,
  litresToM3,
  m3PerHourToM3PerS,
  paToBar,
  paToHeadM,
  SI_UNIT_LABEL,
  STANDARD_GRAVITY_M_PER_S2,
  toSi,
  UNIT_OPTIONS,
  type PhysicalQuantity,
} from '@/shared/calc/units';

const finite = fc.double({ min: -1e7, max: 1e7, noNaN: true, noDefaultInfinity: true });

describe('unit conversions', () => {
  it('converts pressures, flows and volumes to SI', () => {
    // ISO 80000-4: 1 bar = 100 kPa = 10^5 Pa exactly
    expect(barToPa(1)).toBe(100_000);
    // ISO 80000-4: 1 kPa = 1000 Pa
    expect(kPaToPa(250)).toBe(250_000);
    // SI Brochure (9th ed.): 1 L = 1 dm³ = 10^-3 m³
    expect(litresToM3(1000)).toBeCloseTo(1, 12);
    expect(litresPerSecondToM3PerS(1)).toBeCloseTo(0.001, 12);
    expect(litresPerMinuteToM3PerS(60)).toBeCloseTo(0.001, 12);
    expect(m3PerHourToM3PerS(3.6)).toBeCloseTo(0.001, 12);
  });

  it('gives 10.197 m of water per bar at 1000 kg/m³ and standard gravity', () => {
    // BIPM SI Brochure (9th ed.) and ISO 80000-3: standard gravity g_n = 9.80665 m/s²
    expect(STANDARD_GRAVITY_M_PER_S2).toBe(9.80665);
    // 1 bar = 10.197 m water column at 1000 kg/m³ and g_n (10^5 / (1000 · 9.80665) = 10.1972)
    expect(paToHeadM(barToPa(1), 1000)).toBeCloseTo(10.197, 3);
    // the same column back to pressure
    expect(headMToPa(10.197, 1000)).toBeCloseTo(99_997, -1);
  });

  it('uses the given density for head', () => {
    // A lighter (hotter) liquid needs a taller column for the same pressure.
    expect(paToHeadM(100_000, 970)).toBeGreaterThan(paToHeadM(100_000, 1000));
    expect(() => paToHeadM(100_000, 0)).toThrow(RangeError);
  });

  it('round-trips every pair of conversion helpers', () => {
    fc.assert(
      fc.property(finite, (value) => {
        expect(paToBar(barToPa(value))).toBeCloseTo(value, 6);
        expect(paToHeadM(headMToPa(value, 975), 975)).toBeCloseTo(value, 6);
      }),
    );
  });

  it('round-trips mbar, kPa and bar through Pa and through each other', () => {
    // ISO 80000-4: 1 bar = 1000 mbar = 100 kPa = 10^5 Pa, so 1 mbar = 100 Pa = 0.1 kPa
    expect(mbarToPa(1)).toBe(100);
    expect(paToMbar(barToPa(1))).toBe(1000);
    expect(paToKPa(mbarToPa(20))).toBe(2);
    fc.assert(
      fc.property(finite, (mbar) => {
        expect(paToMbar(mbarToPa(mbar))).toBeCloseTo(mbar, 6);
        expect(paToKPa(kPaToPa(mbar))).toBeCloseTo(mbar, 6);
        // mbar → bar → kPa → mbar: 1000 mbar = 1 bar = 100 kPa
        const viaAll = paToMbar(kPaToPa(paToKPa(barToPa(paToBar(mbarToPa(mbar))))));
        expect(Math.abs(viaAll - mbar)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(mbar)));
        // the same pressure read as gas pressure (mbar default) and as system pressure (bar default) agrees
        expect(toSi('gasPressure', 'mbar', mbar)).toBeCloseTo(toSi('pressure', 'bar', mbar / 1000), 6);
      }),
    );
  });

  it('round-trips toSi/fromSi for every unit offered on forms', () => {
    const pairs = (Object.keys(UNIT_OPTIONS) as PhysicalQuantity[]).flatMap((quantity) =>
      UNIT_OPTIONS[quantity].map((option) => [quantity, option.key] as const),
    );
    fc.assert(
      fc.property(fc.constantFrom(...pairs), finite, ([quantity, unit], value) => {
        const si = toSi(quantity, unit as never, value);
        const back = fromSi(quantity, unit as never, si);
        expect(Math.abs(back - value)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(value)));
      }),
    );
  });

  it('offers the units the trade uses per quantity', () => {
    expect(UNIT_OPTIONS.pressure.map((u) => u.key)).toEqual(['bar', 'kPa', 'mbar']);
    expect(UNIT_OPTIONS.gasPressure.map((u) => u.key)).toEqual(['mbar', 'kPa', 'bar']);
    expect(UNIT_OPTIONS.flow.map((u) => u.key)).toEqual(['L/s', 'L/min', 'm3/h']);
    expect(UNIT_OPTIONS.temperature.map((u) => u.label)).toEqual(['°C']);
    expect(UNIT_OPTIONS.length.map((u) => u.key)).toEqual(['m']);
    expect(SI_UNIT_LABEL.flow).toBe('m³/s');
    expect(toSi('flow', 'm3/h', 36)).toBeCloseTo(0.01, 12);
    expect(fromSi('pressure', 'bar', 150_000)).toBeCloseTo(1.5, 12);
  });

  it('refuses a unit that is not offered for the quantity', () => {
    expect(() => toSi('pressure', 'psi' as never, 1)).toThrow(/Unknown pressure unit "psi"/);
    expect(() => fromSi('flow', 'bar' as never, 1)).toThrow(RangeError);
  });
});
