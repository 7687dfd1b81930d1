import { describe, expect, it } from 'vitest';
import { attributeFields, emptyAssetValues, toAssetInput, validateAssetForm, type AssetFormValues } from '@/components/register/asset-form-values';

const pump = (over: Partial<AssetFormValues> = {}): AssetFormValues => ({
  ...emptyAssetValues(3, 7),
  type: 'pump',
  plantId: 'p-hw-01',
  name: 'Heating pump 1',
  ...over,
});

describe('asset form values', () => {
  it('reads each type’s fields from the shared schema: numbers, choices without the empty option, and text', () => {
    expect(attributeFields('vessel').map((f) => [f.key, f.kind])).toEqual([['capacityL', 'number'], ['preChargeBar', 'number'], ['designPressureBar', 'number']]);
    const pumpFields = attributeFields('pump');
    expect(pumpFields.find((f) => f.key === 'duty')).toEqual({ key: 'duty', kind: 'choice', options: ['duty', 'standby', 'duty-assist', 'single'] });
    expect(pumpFields.find((f) => f.key === 'circuit')?.kind).toBe('text');
    expect(attributeFields('')).toEqual([]);
  });

  it('turns blank optional fields into nulls, keeps the place, and sends only the chosen type’s attributes', async () => {
    const input = await toAssetInput(pump({ serviceIntervalMonths: '', lastServiceDate: '', attributes: { duty: 'standby', capacityL: '50' } }));
    expect(input).toMatchObject({ siteId: 3, plantRoomId: 7, plantId: 'P-HW-01', type: 'pump', serviceIntervalMonths: null, lastServiceDate: null });
    expect(input.attributes).toEqual({ duty: 'standby', circuit: '' });
  });

  it('casts typed numbers and reports a bad attribute under its form path', async () => {
    const vessel = pump({ type: 'vessel', attributes: { capacityL: '35', preChargeBar: '1.5', designPressureBar: '' } });
    expect((await toAssetInput(vessel)).attributes).toEqual({ capacityL: 35, preChargeBar: 1.5, designPressureBar: null });
    const errors = await validateAssetForm({ ...vessel, attributes: { preChargeBar: 'high' } });
    expect(errors).toEqual({ attributes: { preChargeBar: 'Enter a number.' } });
  });

  it('needs a type, a plant ID and a name before anything is sent', async () => {
    const errors = await validateAssetForm(emptyAssetValues(3, null));
    expect(Object.keys(errors).sort()).toEqual(['name', 'plantId', 'type']);
  });
});
