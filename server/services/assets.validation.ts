import { ValidationError } from 'yup';
import type { Asset } from '@/server/models/asset.model';
import { ASSET_TYPES, ENERGY_SOURCES, nextServiceDue, type AssetType, type EnergySource } from '@/shared/rules/register';
import { assetSchema, validateAssetAttributes, type AssetInput } from '@/shared/schemas/register';
import type { AssetAttributes } from '@/shared/types/register';

export type ValidAsset = Omit<AssetInput, 'type' | 'energySources' | 'attributes'> & {
  type: AssetType;
  energySources: EnergySource[];
  attributes: AssetAttributes;
};

const collect = (err: unknown, into: ValidationError[]) => {
  if (!(err instanceof ValidationError)) throw err;
  into.push(...(err.inner.length ? err.inner : [err]));
};

/**
 * A whole plant item checked with the shared schema and its type's attribute schema, every problem
 * reported at once (a yup ValidationError the error handler turns into 422 `fields`).
 */
export async function validateAsset(input: Record<string, unknown>): Promise<ValidAsset> {
  const errors: ValidationError[] = [];
  let base: AssetInput | undefined;
  try {
    base = await assetSchema.validate(input, { abortEarly: false, stripUnknown: true });
  } catch (err) {
    collect(err, errors);
  }
  const type = (base?.type ?? input.type) as AssetType;
  let attributes: AssetAttributes = {};
  if ((ASSET_TYPES as readonly string[]).includes(type)) {
    try {
      attributes = (await validateAssetAttributes(type, input.attributes)) as AssetAttributes;
    } catch (err) {
      collect(err, errors);
    }
  }
  if (errors.length || !base) throw new ValidationError(errors);
  const chosen = new Set(base.energySources);
  return { ...base, type, energySources: ENERGY_SOURCES.filter((s) => chosen.has(s)), attributes };
}

/** A stored item in the shape of the input schema, so a PATCH or an import row can be laid over it. */
export function assetAsInput(a: Asset): ValidAsset {
  return {
    siteId: a.siteId,
    plantRoomId: a.plantRoomId,
    plantId: a.plantId,
    name: a.name,
    type: a.type,
    system: a.system,
    energySources: a.energySources,
    manufacturer: a.manufacturer,
    model: a.model,
    serialNumber: a.serialNumber,
    installDate: a.installDate,
    serviceIntervalMonths: a.serviceIntervalMonths,
    lastServiceDate: a.lastServiceDate,
    notes: a.notes,
    attributes: a.attributes,
  };
}

/** Column values for a validated item, with the derived next service date. */
export function assetColumns(v: ValidAsset) {
  return {
    siteId: v.siteId,
    plantRoomId: v.plantRoomId ?? null,
    plantId: v.plantId,
    name: v.name,
    type: v.type,
    system: v.system,
    energySources: v.energySources,
    manufacturer: v.manufacturer,
    model: v.model,
    serialNumber: v.serialNumber,
    installDate: v.installDate ?? null,
    serviceIntervalMonths: v.serviceIntervalMonths ?? null,
    lastServiceDate: v.lastServiceDate ?? null,
    nextServiceDue: nextServiceDue(v.lastServiceDate ?? null, v.serviceIntervalMonths ?? null),
    notes: v.notes,
    attributes: v.attributes,
  };
}

/** True when applying `next` to the stored item would change nothing. */
export function sameAsStored(a: Asset, next: ReturnType<typeof assetColumns>): boolean {
  const stored = assetColumns(assetAsInput(a));
  return JSON.stringify(canonical(stored)) === JSON.stringify(canonical(next));
}

function canonical(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(canonical);
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.keys(value).sort().map((k) => [k, canonical((value as Record<string, unknown>)[k])]));
  }
  return value;
}
