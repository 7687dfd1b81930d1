import { describe, expect, it } from 'vitest';
import { ValidationError } from 'yup';
import { assetPatchSchema, assetSchema, plantRoomPatchSchema, sitePatchSchema } from '@/shared/schemas/register';

const opts = { abortEarly: false, stripUnknown: true } as const;

describe('register schemas', () => {
  it('keeps the attributes object when unknown keys are stripped (the server validates that way)', async () => {
    const v = await assetSchema.validate({ siteId: 1, plantId: 'b-01', name: 'Boiler', type: 'boiler', attributes: { ratedOutputKw: 120 } }, opts);
    expect(v.attributes).toEqual({ ratedOutputKw: 120 });
    expect(v.plantId).toBe('B-01');
    await expect(assetSchema.validate({ siteId: 1, plantId: 'X', name: 'Xx', type: 'other', attributes: [1] }, opts)).rejects.toThrow(/Attributes must be an object/);
  });

  it('refuses a date that matches YYYY-MM-DD but is not on the calendar', async () => {
    const base = { siteId: 1, plantId: 'P-1', name: 'Pump', type: 'pump' };
    // Gregorian calendar: February 2023 has 28 days, 2024 has 29.
    await expect(assetSchema.validate({ ...base, installDate: '2023-02-29' }, opts)).rejects.toThrow('That date does not exist.');
    expect((await assetSchema.validate({ ...base, installDate: '2024-02-29' }, opts)).installDate).toBe('2024-02-29');
    expect((await assetSchema.validate({ ...base, lastServiceDate: '' }, opts)).lastServiceDate).toBeNull();
    const err = await assetSchema.validate({ ...base, installDate: '2024-13-01' }, opts).catch((e: ValidationError) => e);
    expect((err as ValidationError).errors).toEqual(['That date does not exist.']);
  });

  it('lets a PATCH carry only the fields that change, with no defaults filled in', async () => {
    expect(await sitePatchSchema.validate({ address: 'x' }, opts)).toEqual({ address: 'x' });
    expect(await plantRoomPatchSchema.validate({ safety: { exits: 'Stair' }, siteId: 9 }, opts)).toEqual({ safety: { exits: 'Stair' } });
    expect(await assetPatchSchema.validate({ name: 'New name' }, opts)).toEqual({ name: 'New name' });
    await expect(sitePatchSchema.validate({ name: 'x' }, opts)).rejects.toThrow('At least 2 characters.');
  });
});
