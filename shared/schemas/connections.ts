import * as yup from 'yup';
import { MEDIA } from '@/shared/rules/connections';
import { idField } from '@/shared/schemas/request';

const itemId = (what: string) => yup.number().typeError(`Choose the item ${what}.`).integer().positive().required(`Choose the item ${what}.`);

/** A new link: `from` supplies `to` with `medium`. */
export const connectionSchema = yup.object({
  fromAssetId: itemId('that supplies'),
  toAssetId: itemId('that is supplied'),
  medium: yup.string().oneOf([...MEDIA], `Unknown medium: use one of ${MEDIA.join(', ')}.`).required('Choose the medium.'),
});
export type ConnectionInput = yup.InferType<typeof connectionSchema>;

/** `GET /api/connections/export.csv?siteId=` — one site, or every site when left out. */
export const connectionsExportQuery = yup.object({ siteId: idField('siteId').optional() });
