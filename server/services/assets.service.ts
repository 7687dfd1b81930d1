import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { pointUses, tagSummaries } from '@/server/services/live-tags.service';
import { provedOf, tagInclude, toTagDto } from '@/server/services/tags.dto';
import { clock } from '@/server/lib/clock';
import { HttpError, conflict, notFound } from '@/server/lib/http-error';
import { insertWithLabelCode, isUniqueClash } from '@/server/lib/unique-clash';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { assertMayChangeSite } from '@/server/services/connections.service';
import { buildAssetListSql, type AssetListFilters } from '@/server/services/assets.query';
import { assetAsInput, assetColumns, validateAsset, type ValidAsset } from '@/server/services/assets.validation';
import { firstAssetPhotoIds, photosOf } from '@/server/services/photos.service';
import { assertCanEdit, plantRoomForField, siteForField } from '@/server/services/register.lookup';
import { toAssetDto } from '@/server/services/register.dto';
import type { Asset as AssetDto } from '@/shared/types/register';
import { assetStateFromTags } from '@/shared/rules/tags';
import type { ListResponse } from '@/shared/types/api';
import { siteWhere, visibleSiteIds } from '@/server/services/site-access.service';
import type { Paging } from '@/shared/rules/paging';


export const SITE_PLANT_ID_INDEX = 'assets_site_plant_id_unique';

/** An item's record lists at most this many live tags (its state counts them all). */
const RECORD_LIVE_TAGS = 200;

/** The record's live tags without their item: it is the record's own, read once beside them. */
const recordTagInclude = tagInclude.filter((inc) => inc.as !== 'asset');

const include = [
  { model: Site, as: 'site', attributes: ['id', 'name', 'timeZone'] },
  { model: PlantRoom, as: 'plantRoom', attributes: ['id', 'name'] },
  { model: User, as: 'creator', attributes: ['id', 'name'] },
];

export const plantIdTaken = (plantId: string, archived: boolean) =>
  new HttpError(409, 'conflict', `Plant ID ${plantId} is already used at this site.`, {
    plantId: archived ? `An archived item at this site has plant ID ${plantId}; choose another.` : `Plant ID ${plantId} is already used at this site.`,
  });

/** Items by id, in the order given, as the API shows them. */
export async function loadAssetDtos(ids: number[], opts: { photos: boolean }): Promise<AssetDto[]> {
  if (!ids.length) return [];
  const rows = await Asset.findAll({ where: { id: { [Op.in]: ids } }, include });
  const byId = new Map(rows.map((a) => [a.id, a]));
  const [photos, thumbs] = await Promise.all([opts.photos ? photosOf('assetId', ids) : null, firstAssetPhotoIds(ids)]);
  const states = await tagSummaries(rows[0]?.organisationId ?? 0, ids);
  return ids
    .filter((id) => byId.has(id))
    .map((id) => ({
      ...toAssetDto(byId.get(id)!, { photos: photos?.get(id), thumbnailPhotoId: thumbs.get(id) ?? null }),
      ...(states.get(id) ?? { state: 'normal' as const, liveIsolations: 0, liveOverrides: 0, unprovedIsolations: 0, overdue: false }),
    }));
}

export async function listAssets(actor: AuthUser, filters: AssetListFilters, paging: Paging): Promise<ListResponse<AssetDto>> {
  const sql = buildAssetListSql(actor.organisationId, filters, paging, visibleSiteIds(actor));
  const sequelize = Asset.sequelize!;
  const [ids, count] = await Promise.all([
    sequelize.query<{ id: number }>(sql.idsSql, { replacements: sql.replacements, type: QueryTypes.SELECT }),
    sequelize.query<{ total: bigint | number }>(sql.countSql, { replacements: sql.replacements, type: QueryTypes.SELECT }),
  ]);
  const items = await loadAssetDtos(ids.map((r) => Number(r.id)), { photos: false });
  return { items, total: Number(count[0]?.total ?? 0), page: paging.page, pageSize: paging.pageSize };
}

async function findAsset(actor: AuthUser, id: number, transaction?: Transaction): Promise<Asset> {
  const asset = await Asset.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction });
  if (!asset) throw notFound('Plant item');
  return asset;
}

/** How many photos each live tag of an item has, counted in the database (the record shows counts, not photos). */
async function liveTagPhotoCounts(organisationId: number, assetId: number): Promise<Map<number, number>> {
  const rows = await Asset.sequelize!.query<{ tagId: number; photos: number | bigint }>(
    `SELECT p.tag_id AS tagId, COUNT(*) AS photos FROM tags t JOIN photos p ON p.tag_id = t.id
     WHERE t.organisation_id = ? AND t.asset_id = ? AND t.status = 'live' GROUP BY p.tag_id`,
    { replacements: [organisationId, assetId], type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [Number(r.tagId), Number(r.photos)]));
}

/**
 * The item's record in one round of reads side by side, each read once: the item (scoped like every read), its
 * photos, its live tags (which also give the item's state), their photo counts and where the item is itself an
 * isolation point.
 */
export async function getAsset(actor: AuthUser, id: number): Promise<AssetDto> {
  const [asset, photos, live, tagPhotos, uses] = await Promise.all([
    Asset.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor) }, include }),
    photosOf('assetId', [id]),
    Tag.findAll({ where: { organisationId: actor.organisationId, assetId: id, status: 'live' }, include: recordTagInclude, order: [['raisedAt', 'DESC'], ['id', 'DESC']] }),
    liveTagPhotoCounts(actor.organisationId, id),
    pointUses(actor.organisationId, id),
  ]);
  if (!asset) throw notFound('Plant item');
  const states = live.map((t) => ({ kind: t.kind, status: t.status, expiresAt: t.expiresAt, proved: provedOf(t) ?? true }));
  const assetPhotos = photos.get(id) ?? [];
  return {
    ...toAssetDto(asset, { photos: assetPhotos, thumbnailPhotoId: assetPhotos[0]?.id ?? null }),
    ...assetStateFromTags(states, clock.now()),
    liveTags: live.slice(0, RECORD_LIVE_TAGS).map((t) => ({ ...toTagDto(Object.assign(t, { asset })), photoCount: tagPhotos.get(t.id) ?? 0 })),
    pointUses: uses,
  };
}

/** Checks the site, the plant room (on that site) and that the plant ID is free there. */
async function checkPlacement(actor: AuthUser, v: ValidAsset, selfId: number | null, transaction?: Transaction) {
  await siteForField(actor, v.siteId, transaction);
  if (v.plantRoomId) await plantRoomForField(actor, v.plantRoomId, v.siteId, transaction);
  const other = await Asset.findOne({
    where: { siteId: v.siteId, plantId: v.plantId, ...(selfId ? { id: { [Op.ne]: selfId } } : {}) },
    transaction,
  });
  if (other) throw plantIdTaken(v.plantId, !!other.archivedAt);
}

/** Inserts a validated item with a fresh label code; the caller has checked its placement. */
export async function insertAsset(actor: AuthUser, v: ValidAsset, transaction?: Transaction): Promise<Asset> {
  try {
    return await insertWithLabelCode((labelCode) =>
      Asset.create({ ...assetColumns(v), organisationId: actor.organisationId, labelCode, createdBy: actor.id }, { transaction }),
    );
  } catch (err) {
    if (isUniqueClash(err, SITE_PLANT_ID_INDEX)) throw plantIdTaken(v.plantId, false);
    throw err;
  }
}

export async function createAsset(actor: AuthUser, input: Record<string, unknown>): Promise<AssetDto> {
  const v = await validateAsset(input);
  await checkPlacement(actor, v, null);
  const asset = await insertAsset(actor, v);
  return (await loadAssetDtos([asset.id], { photos: true }))[0];
}

export async function updateAsset(actor: AuthUser, id: number, patch: Record<string, unknown>): Promise<AssetDto> {
  const asset = await findAsset(actor, id);
  assertCanEdit(actor, asset.createdBy, 'item');
  if (asset.archivedAt) throw conflict('This item is archived; archived items are kept as they were.');
  const given = Object.fromEntries(Object.entries(patch).filter(([, value]) => value !== undefined));
  const merged: Record<string, unknown> = { ...assetAsInput(asset), ...given };
  // Moved to another site without naming a room: it leaves its old site's room.
  if (given.siteId !== undefined && given.siteId !== asset.siteId) {
    await assertMayChangeSite(asset.id);
    if (given.plantRoomId === undefined) merged.plantRoomId = null;
  }
  const v = await validateAsset(merged);
  await checkPlacement(actor, v, asset.id);
  asset.set(assetColumns(v));
  try {
    await asset.save();
  } catch (err) {
    if (err instanceof UniqueConstraintError && isUniqueClash(err, SITE_PLANT_ID_INDEX)) throw plantIdTaken(v.plantId, false);
    throw err;
  }
  return (await loadAssetDtos([asset.id], { photos: true }))[0];
}

/** Takes an item out of service. Nothing is deleted; archiving twice changes nothing. */
export async function archiveAsset(actor: AuthUser, id: number): Promise<AssetDto> {
  const asset = await findAsset(actor, id);
  if (!asset.archivedAt) {
    asset.archivedAt = new Date();
    asset.archivedBy = actor.id;
    await asset.save();
  }
  return (await loadAssetDtos([asset.id], { photos: true }))[0];
}
