import { prepareDataForValidation, yupToFormErrors, type FormikErrors } from 'formik';
import * as yup from 'yup';
import { assetSchema, attributeSchemas, type AssetInput } from '@/shared/schemas/register';
import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { Asset } from '@/shared/types/register';

export interface AssetFormValues {
  siteId: number | null;
  plantRoomId: number | null;
  plantId: string;
  name: string;
  type: AssetType | '';
  system: string;
  energySources: EnergySource[];
  manufacturer: string;
  model: string;
  serialNumber: string;
  installDate: string;
  serviceIntervalMonths: string;
  lastServiceDate: string;
  notes: string;
  /** Kept as typed text for every type seen, so switching type and back loses nothing; only the chosen type's keys are sent. */
  attributes: Record<string, string>;
}

// Read-only screens (an item's record) take this from attribute-fields.ts, which does not load the form library.
export { attributeFields } from '@/components/register/attribute-fields';

/** assetSchema with `attributes` checked by the chosen type's schema. */
function schemaFor(type: AssetType | '') {
  return type ? assetSchema.shape({ attributes: attributeSchemas[type] }) : assetSchema;
}

export const emptyAssetValues = (siteId: number | null, plantRoomId: number | null): AssetFormValues => ({
  siteId,
  plantRoomId,
  plantId: '',
  name: '',
  type: '',
  system: '',
  energySources: [],
  manufacturer: '',
  model: '',
  serialNumber: '',
  installDate: '',
  serviceIntervalMonths: '',
  lastServiceDate: '',
  notes: '',
  attributes: {},
});

export const valuesFromAsset = (a: Asset): AssetFormValues => ({
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
  installDate: a.installDate ?? '',
  serviceIntervalMonths: a.serviceIntervalMonths == null ? '' : String(a.serviceIntervalMonths),
  lastServiceDate: a.lastServiceDate ?? '',
  notes: a.notes,
  attributes: Object.fromEntries(Object.entries(a.attributes).map(([k, v]) => [k, v == null ? '' : String(v)])),
});

/** Formik `validate`: the shared schemas on the values as Formik prepares them (empty text → schema default). */
export async function validateAssetForm(values: AssetFormValues): Promise<FormikErrors<AssetFormValues>> {
  try {
    await schemaFor(values.type).validate(prepareDataForValidation(values), { abortEarly: false });
    return {};
  } catch (err) {
    if (err instanceof yup.ValidationError) return yupToFormErrors(err);
    throw err;
  }
}

/** The request body: cast by the same schemas, other types' attributes stripped. */
export async function toAssetInput(values: AssetFormValues): Promise<AssetInput> {
  return schemaFor(values.type).validate(prepareDataForValidation(values), { stripUnknown: true }) as Promise<AssetInput>;
}
