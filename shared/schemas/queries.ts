import * as yup from 'yup';
import { BOARD_STATES, readBoardSort } from '@/shared/rules/board';
import { parseIdList } from '@/shared/rules/ids';
import { ASSET_TYPES } from '@/shared/rules/register';
import { TAG_KINDS, TAG_STATUSES } from '@/shared/rules/tags';
import { idField, oneOfField, pagingQuery, searchField } from '@/shared/schemas/request';

/** The query strings of the lists and files, one schema each; `validate({ query })` runs them on the server. */

/** The orders the item list offers; `-` in front for descending. */
const ASSET_SORTS = ['plantId', '-plantId', 'name', '-name', 'type', '-type', 'nextServiceDue', '-nextServiceDue'] as const;
export type AssetSort = (typeof ASSET_SORTS)[number];

const flag = () => yup.boolean().transform((_v, raw) => raw === true || raw === 'true' || raw === '1').default(false);

/** `GET /api/assets` and `GET /api/assets/export.csv` */
export const assetListQuery = pagingQuery.shape({
  q: searchField(),
  siteId: idField('siteId'),
  plantRoomId: idField('plantRoomId'),
  type: oneOfField('type', ASSET_TYPES),
  sort: oneOfField('sort', ASSET_SORTS).default('plantId'),
  includeArchived: flag(),
});
export type AssetListQuery = yup.InferType<typeof assetListQuery>;

/** `POST /api/assets/import`: a preview unless `dryRun=false` is said outright, so a preview never writes. */
export const importQuery = yup.object({ dryRun: yup.boolean().transform((_v, raw) => raw !== 'false').default(true) });

/** `GET /api/board` and `GET /api/board.csv`; an unknown sort falls back to the default rather than failing. */
export const boardQuery = pagingQuery.shape({
  siteId: idField('siteId'),
  kind: oneOfField('kind', TAG_KINDS),
  holderId: idField('holderId'),
  state: oneOfField('state', BOARD_STATES),
  q: searchField(),
  sort: yup.mixed<ReturnType<typeof readBoardSort>>().transform((_v, raw) => readBoardSort(raw)).default(() => readBoardSort(undefined)),
});
export type BoardQueryInput = yup.InferType<typeof boardQuery>;

/** `GET /api/tags`: an item's or a site's tags, live or cleared; `offeredTo=me` for live tags offered to the caller. */
export const tagListQuery = pagingQuery.shape({
  status: oneOfField('status', TAG_STATUSES),
  kind: oneOfField('kind', TAG_KINDS),
  assetId: idField('assetId'),
  siteId: idField('siteId'),
  offeredTo: oneOfField('offeredTo', ['me'] as const),
});
export type TagListQuery = yup.InferType<typeof tagListQuery>;

const LABEL_LAYOUTS = ['sheet', 'roll'] as const;
export type LabelLayout = (typeof LABEL_LAYOUTS)[number];

/** `GET /api/labels.pdf`: the items by id, or every item of a plant room or of a site. */
export const labelsPdfQuery = yup.object({
  layout: yup.mixed<LabelLayout>().oneOf([...LABEL_LAYOUTS], 'layout must be sheet or roll.').default('sheet'),
  assetIds: yup.array(yup.number().required())
    .transform((_v, raw) => (raw === undefined || raw === '' ? undefined : parseIdList(raw) ?? [Number.NaN]))
    .typeError('assetIds must be a comma-separated list of numbers.'),
  plantRoomId: idField('plantRoomId'),
  siteId: idField('siteId'),
});
export type LabelsPdfQuery = yup.InferType<typeof labelsPdfQuery>;
