import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';

import {
  expansionVesselInputsSchema,
  heatingReadingsSchema,
  heatingSystemSettingsSchema,
} from '@/shared/calc/schemas';
import { barToPa, litresPerSecondToM3PerS } from '@/shared/calc/units';

const errorsOf = async (promise: Promise<unknown>): Promise<string[]> => {
  try {
    await promise;
    return [];
  } catch (error) {
    if (error instanceof ValidationError) return error.inner.map((e) => `${e.path}: ${e.message}`);
    throw error;
  }
};

describe('heatingReadingsSchema', () => {
  it('accepts a full set of SI readings and an empty one', async () => {
    const readings = {
      flowTemperatureC: 80,
      returnTemperatureC: 69,
      flowRateM3PerS: litresPerSecondToM3PerS(1.2),
      systemPressureGaugePa: barToPa(1.5),
      pumpInletPressureGaugePa: barToPa(1),
      pumpOutletPressureGaugePa: barToPa(2),
    };
    await expect(heatingReadingsSchema.validate(readings)).resolves.toEqual(readings);
    await expect(heatingReadingsSchema.validate({})).resolves.toEqual({});
    await expect(heatingReadingsSchema.validate({ flowTemperatureC: null })).resolves.toEqual({ flowTemperatureC: null });
  });

  it('refuses temperatures outside 0–150 °C, negative flow and impossible pressures, naming each field', async () => {
    const errors = await errorsOf(
      heatingReadingsSchema.validate(
        { flowTemperatureC: 151, returnTemperatureC: -1, flowRateM3PerS: -0.1, systemPressureGaugePa: -2e5 },
        { abortEarly: false },
      ),
    );
    expect(errors).toEqual(
      expect.arrayContaining([
        'flowTemperatureC: Flow temperature must be at most 150 °C',
        'returnTemperatureC: Return temperature must be at least 0 °C',
        'flowRateM3PerS: Flow rate cannot be negative',
        'systemPressureGaugePa: System pressure cannot be below a full vacuum',
      ]),
    );
  });

  it('catches a pressure typed in the wrong unit', async () => {
    // 1.5 bar entered as kPa·1000 by mistake is 150 bar
    await expect(heatingReadingsSchema.validate({ systemPressureGaugePa: 150e5 })).rejects.toThrow(/at most 100 bar/);
  });
});

describe('heatingSystemSettingsSchema', () => {
  it('accepts design values and refuses a fill pressure at or above the safety valve', async () => {
    const settings = {
      designDeltaTK: 11,
      flowSetpointC: 82,
      fillPressureGaugePa: barToPa(1),
      safetyValveSettingGaugePa: barToPa(3),
    };
    await expect(heatingSystemSettingsSchema.validate(settings)).resolves.toEqual(settings);
    await expect(
      heatingSystemSettingsSchema.validate({ ...settings, fillPressureGaugePa: barToPa(3) }),
    ).rejects.toThrow('Fill pressure must be below the safety valve setting');
    await expect(heatingSystemSettingsSchema.validate({ designDeltaTK: 0 })).rejects.toThrow(/Design ΔT must be above 0 K/);
  });
});

describe('expansionVesselInputsSchema', () => {
  const inputs = {
    systemVolumeL: 500,
    fillTemperatureC: 10,
    maxFlowTemperatureC: 80,
    staticHeightM: 5,
    safetyValveSettingBarGauge: 3,
    installedVesselVolumesL: [25, 25],
  };

  it('accepts a complete set and defaults the vessel list to empty', async () => {
    await expect(expansionVesselInputsSchema.validate(inputs)).resolves.toEqual({ ...inputs, mode: 'check', glycol: null });
    await expect(expansionVesselInputsSchema.validate({ ...inputs, glycol: { kind: 'propylene', percent: 30 } })).resolves.toMatchObject({ glycol: { kind: 'propylene', percent: 30 } });
    await expect(expansionVesselInputsSchema.validate({ ...inputs, glycol: { kind: 'brine', percent: 30 } })).rejects.toThrow(/propylene or ethylene/);
    await expect(expansionVesselInputsSchema.validate({ ...inputs, mode: 'guess' })).rejects.toThrow(/check or size/);
    const { installedVesselVolumesL: _omitted, ...withoutVessels } = inputs;
    await expect(expansionVesselInputsSchema.validate(withoutVessels)).resolves.toMatchObject({
      installedVesselVolumesL: [],
    });
  });

  it('refuses missing, out-of-range and inconsistent inputs', async () => {
    const errors = await errorsOf(
      expansionVesselInputsSchema.validate(
        { ...inputs, systemVolumeL: undefined, maxFlowTemperatureC: 5, staticHeightM: -1, installedVesselVolumesL: [25, 0] },
        { abortEarly: false },
      ),
    );
    expect(errors).toEqual(
      expect.arrayContaining([
        'systemVolumeL: System volume is a required field',
        'maxFlowTemperatureC: Maximum flow temperature must be above the fill temperature',
        'staticHeightM: Static height cannot be negative',
        'installedVesselVolumesL[1]: Each vessel volume must be above 0 L',
      ]),
    );
    await expect(expansionVesselInputsSchema.validate({ ...inputs, fillTemperatureC: 151, maxFlowTemperatureC: 152 })).rejects.toThrow(
      /(Fill|Maximum flow) temperature must be at most 150 °C/,
    );
  });
});
