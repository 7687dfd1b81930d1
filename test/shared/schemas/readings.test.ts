import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';
import { barToPa } from '@/shared/calc';
import { expansionVesselRequestSchema, heatingSystemSchema, readingCorrectionSchema, readingSetSchema } from '@/shared/schemas/readings';

const paths = async (p: Promise<unknown>) => {
  try {
    await p;
    return [];
  } catch (err) {
    if (!(err instanceof ValidationError)) throw err;
    return err.inner.map((e) => e.path ?? '');
  }
};

describe('readingSetSchema', () => {
  it('accepts a set with only a note, or only a surface temperature', async () => {
    await expect(readingSetSchema.validate({ note: 'Plant off for the holidays' })).resolves.toMatchObject({ surfaceTemperatures: [] });
    await expect(readingSetSchema.validate({ surfaceTemperatures: [{ location: 'Pump casing', temperatureC: 48 }] })).resolves.toBeTruthy();
  });

  it('refuses an empty set, a future time, unlabelled surfaces and out-of-range water temperatures', async () => {
    await expect(readingSetSchema.validate({ note: '   ' })).rejects.toThrow('Enter at least one reading or a note.');
    const errors = await paths(
      readingSetSchema.validate(
        {
          flowTemperatureC: 151,
          flowSetpointC: -1,
          surfaceTemperatures: [{ location: '', temperatureC: 20 }],
          takenAt: new Date(Date.now() + 3_600_000),
        },
        { abortEarly: false },
      ),
    );
    expect(errors.sort()).toEqual(['flowSetpointC', 'flowTemperatureC', 'surfaceTemperatures[0].location', 'takenAt']);
  });

  it('needs a reason for a correction', async () => {
    await expect(readingCorrectionSchema.validate({ flowTemperatureC: 70 })).rejects.toThrow(/what was wrong/);
    await expect(readingCorrectionSchema.validate({ flowTemperatureC: 70, reason: 'Typo' })).resolves.toMatchObject({ reason: 'Typo' });
  });
});

describe('heatingSystemSchema', () => {
  it('keeps the shared rule that the fill is below the valve and adds maximum above fill temperature', async () => {
    await expect(heatingSystemSchema.validate({ fillPressureGaugePa: barToPa(3), safetyValveSettingGaugePa: barToPa(3) })).rejects.toThrow(
      'Fill pressure must be below the safety valve setting',
    );
    expect(await paths(heatingSystemSchema.validate({ fillTemperatureC: 20, maxFlowTemperatureC: 15 }, { abortEarly: false }))).toEqual(['maxFlowTemperatureC']);
    await expect(heatingSystemSchema.validate({ designDeltaTK: 11, preChargeMarginBar: 0.2 })).resolves.toMatchObject({ designDeltaTK: 11 });
  });
});

describe('expansionVesselRequestSchema', () => {
  it('offers only the published pre-charge margins', async () => {
    const inputs = { systemVolumeL: 500, fillTemperatureC: 10, maxFlowTemperatureC: 80, staticHeightM: 5, safetyValveSettingBarGauge: 3 };
    // EN 12828 Annex D and common practice differ: 0.2 bar and 0.3 bar are the two margins offered
    await expect(expansionVesselRequestSchema.validate({ ...inputs, preChargeMarginBar: 0.2 })).resolves.toMatchObject({ preChargeMarginBar: 0.2 });
    await expect(expansionVesselRequestSchema.validate({ ...inputs, preChargeMarginBar: 0.5 })).rejects.toThrow(/offered pre-charge margins/);
  });
});
