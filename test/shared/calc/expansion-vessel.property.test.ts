import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { checkExpansionVessel, type ExpansionVesselInputs } from '@/shared/calc/expansion-vessel';

const required = (inputs: ExpansionVesselInputs): number =>
  checkExpansionVessel(inputs).requiredNominalVolumeL ?? Number.POSITIVE_INFINITY;

// Fill at 5 °C or above keeps clear of the 4 °C density maximum, where heating shrinks water.
const system = fc.record({
  systemVolumeL: fc.double({ min: 10, max: 100_000, noNaN: true }),
  fillTemperatureC: fc.double({ min: 5, max: 20, noNaN: true }),
  maxFlowTemperatureC: fc.double({ min: 30, max: 120, noNaN: true }),
  staticHeightM: fc.double({ min: 0, max: 40, noNaN: true }),
  safetyValveSettingBarGauge: fc.double({ min: 1.5, max: 10, noNaN: true }),
  installedVesselVolumesL: fc.array(fc.double({ min: 1, max: 1000, noNaN: true }), { maxLength: 3 }),
});

describe('expansion vessel sizing properties', () => {
  it('never needs a smaller vessel for more system volume', () => {
    fc.assert(
      fc.property(system, fc.double({ min: 0, max: 50_000, noNaN: true }), (inputs, extraL) => {
        const bigger = { ...inputs, systemVolumeL: inputs.systemVolumeL + extraL };
        expect(required(bigger)).toBeGreaterThanOrEqual(required(inputs));
      }),
    );
  });

  it('never needs a smaller vessel for a higher maximum temperature', () => {
    fc.assert(
      fc.property(system, fc.double({ min: 0, max: 30, noNaN: true }), (inputs, riseK) => {
        const hotter = { ...inputs, maxFlowTemperatureC: Math.min(150, inputs.maxFlowTemperatureC + riseK) };
        expect(required(hotter)).toBeGreaterThanOrEqual(required(inputs));
      }),
    );
  });

  it('passes exactly when the installed volume covers the requirement', () => {
    fc.assert(
      fc.property(system, (inputs) => {
        const result = checkExpansionVessel(inputs);
        const covered =
          result.requiredNominalVolumeL !== null && result.installedNominalVolumeL >= result.requiredNominalVolumeL - 1e-9;
        expect(result.verdict === 'pass').toBe(covered);
        expect(result.reasons.length === 0).toBe(covered);
      }),
    );
  });
});
