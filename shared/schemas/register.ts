import * as yup from 'yup';
import { ISOLATOR_FORMS, VALVE_ISOLATION } from '@/shared/rules/connections';
import { ASSET_TYPES, ENERGY_SOURCES, type AssetType } from '@/shared/rules/register';

const text = (max: number) => yup.string().trim().max(max, `At most ${max} characters.`).default('');
const optionalNumber = (min: number, max: number, unit: string) =>
  yup.number().typeError('Enter a number.').min(min, `At least ${min} ${unit}.`).max(max, `At most ${max} ${unit}.`).nullable().default(null);
/** A real calendar date: 2024-02-30 matches the pattern but is not a day. */
const isCalendarDate = (v: string) => {
  const [y, m, d] = v.split('-').map(Number);
  const date = new Date(Date.UTC(y, m - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d;
};
const isoDate = () =>
  yup.string().nullable().default(null).matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'Use the date format YYYY-MM-DD.', excludeEmptyString: true })
    .test('calendar-date', 'That date does not exist.', (v) => !v || !/^\d{4}-\d{2}-\d{2}$/.test(v) || isCalendarDate(v))
    .transform((v) => (v === '' ? null : v));

/** PATCH bodies: any subset of the fields; a field left out keeps its stored value. */
const partial = (fields: object) =>
  Object.fromEntries(Object.entries(fields).map(([k, s]) => [k, (s as yup.AnySchema).optional().default(undefined)]));

const IANA_ZONE_PATTERN = /^[A-Za-z_]+(\/[A-Za-z0-9_+-]+)+$|^UTC$/;

export const siteSchema = yup.object({
  name: yup.string().trim().min(2, 'At least 2 characters.').max(160).required('Name the site.'),
  address: text(400),
  timeZone: yup.string().trim().matches(IANA_ZONE_PATTERN, 'Use an IANA time zone such as Europe/London.').default('Europe/London'),
  clientContactName: text(120).nullable(),
  clientContactPhone: text(40).nullable(),
  clientContactEmail: yup.string().trim().email('Enter a valid e-mail address.').max(254).nullable().default(null).transform((v) => (v === '' ? null : v)),
});
export type SiteInput = yup.InferType<typeof siteSchema>;

export const sitePatchSchema = yup.object(partial(siteSchema.fields));

const safetyLocationsSchema = yup.object({
  emergencyStop: text(400),
  gasIsolation: text(400),
  electricalIsolator: text(400),
  firstAid: text(400),
  exits: text(400),
});

export const plantRoomSchema = yup.object({
  siteId: yup.number().integer().positive().required('Choose a site.'),
  name: yup.string().trim().min(2, 'At least 2 characters.').max(120).required('Name the plant room.'),
  floorArea: text(120),
  accessNotes: text(2000),
  safety: safetyLocationsSchema.default(() => ({ emergencyStop: '', gasIsolation: '', electricalIsolator: '', firstAid: '', exits: '' })),
});
export type PlantRoomInput = yup.InferType<typeof plantRoomSchema>;

/** PATCH of a plant room; `safety` may carry only the locations that change. A room stays on its site. */
export const plantRoomPatchSchema = yup.object({
  ...partial({ name: plantRoomSchema.fields.name, floorArea: plantRoomSchema.fields.floorArea, accessNotes: plantRoomSchema.fields.accessNotes }),
  safety: yup.object(partial(safetyLocationsSchema.fields)).optional().default(undefined),
});

/** Per-type fields kept in the asset's JSON `attributes` column. Units in the key names. */
export const attributeSchemas: Record<AssetType, yup.AnyObjectSchema> = {
  boiler: yup.object({
    fuel: yup.string().oneOf(['natural-gas', 'lpg', 'oil', 'electric', 'biomass', 'other', '']).default(''),
    ratedOutputKw: optionalNumber(0, 100000, 'kW'),
    flowSetpointC: optionalNumber(0, 120, '°C'),
    burnerPressureMbar: optionalNumber(0, 500, 'mbar'),
  }),
  pump: yup.object({
    duty: yup.string().oneOf(['duty', 'standby', 'duty-assist', 'single', '']).default(''),
    circuit: text(120),
  }),
  actuator: yup.object({
    normalPosition: yup.string().oneOf(['normally-open', 'normally-closed', '']).default(''),
    controlSignal: yup.string().oneOf(['0-10v', '2-10v', '4-20ma', '24v-on-off', '230v-on-off', '3-point', 'other', '']).default(''),
  }),
  valve: yup.object({
    normalPosition: yup.string().oneOf(['normally-open', 'normally-closed', '']).default(''),
    controlSignal: yup.string().oneOf(['manual', '0-10v', '2-10v', '4-20ma', '24v-on-off', '230v-on-off', '3-point', 'other', '']).default(''),
    // Only a valve recorded as isolating is offered as an isolation point; a control valve is not one.
    isolation: yup.string().oneOf([...VALVE_ISOLATION, '']).default(''),
  }),
  vessel: yup.object({
    capacityL: optionalNumber(0, 100000, 'L'),
    preChargeBar: optionalNumber(0, 25, 'bar'),
    designPressureBar: optionalNumber(0, 40, 'bar'),
  }),
  'pressurisation-unit': yup.object({
    fillPressureBar: optionalNumber(0, 25, 'bar'),
  }),
  'water-heater': yup.object({
    fuel: yup.string().oneOf(['natural-gas', 'lpg', 'oil', 'electric', 'other', '']).default(''),
    capacityL: optionalNumber(0, 100000, 'L'),
    setpointC: optionalNumber(0, 100, '°C'),
  }),
  'control-panel': yup.object({}),
  'terminal-unit': yup.object({}),
  'gas-supply': yup.object({ meterPoint: text(60) }),
  'electrical-supply': yup.object({ supplyNumber: text(60) }),
  'water-supply': yup.object({ meterPoint: text(60) }),
  'distribution-board': yup.object({ ways: optionalNumber(1, 200, 'ways') }),
  isolator: yup.object({ isolatorForm: yup.string().oneOf([...ISOLATOR_FORMS, '']).default('') }),
  pipework: yup.object({ capacityL: optionalNumber(0, 100000, 'L') }),
  other: yup.object({}),
};

const assetFields = {
  siteId: yup.number().integer().positive().required('Choose a site.'),
  plantRoomId: yup.number().integer().positive().nullable().default(null),
  plantId: yup.string().trim().uppercase().matches(/^[A-Z0-9][A-Z0-9./_-]*$/, 'Letters, digits and . / _ - only.').max(32).required('Give the plant ID used on site.'),
  name: yup.string().trim().min(2, 'At least 2 characters.').max(160).required('Name the item.'),
  type: yup.string().oneOf([...ASSET_TYPES], 'Choose a type.').required('Choose a type.'),
  system: text(120),
  energySources: yup.array(yup.string().oneOf([...ENERGY_SOURCES], `Use ${ENERGY_SOURCES.join(', ')}.`).required()).default([]),
  manufacturer: text(120),
  model: text(120),
  serialNumber: text(120),
  installDate: isoDate(),
  serviceIntervalMonths: yup.number().typeError('Enter a whole number of months.').integer('Whole months.').min(1).max(120).nullable().default(null),
  lastServiceDate: isoDate(),
  notes: text(4000),
  // Kept as a plain object here and checked per type by validateAssetAttributes. Not yup.object(): with
  // stripUnknown (as the API validates) an object schema without fields would drop every attribute.
  attributes: yup
    .mixed<Record<string, unknown>>((v): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v))
    .typeError('Attributes must be an object.')
    .default(() => ({})),
};

/** An asset; `attributes` are then validated by `attributeSchemas[type]` (see validateAssetAttributes). */
export const assetSchema = yup.object(assetFields);
export type AssetInput = yup.InferType<typeof assetSchema>;

/** PATCH: any subset of the asset fields. */
export const assetPatchSchema = yup.object(
  Object.fromEntries(Object.entries(assetFields).map(([k, s]) => [k, (s as yup.AnySchema).optional().default(undefined)])),
);

export async function validateAssetAttributes(type: AssetType, attributes: unknown) {
  try {
    return await attributeSchemas[type].validate(attributes ?? {}, { abortEarly: false, stripUnknown: true });
  } catch (err) {
    if (err instanceof yup.ValidationError) {
      // Name the field as the form does: attributes.<key>
      err.inner.forEach((e) => { e.path = `attributes.${e.path}`; });
    }
    throw err;
  }
}
