import crypto from 'node:crypto';
import { Op, QueryTypes, UniqueConstraintError, type Transaction } from 'sequelize';
import { HttpError, conflict, notFound, unprocessable } from '@/server/lib/http-error';
import { PhotoNotStoredError, type PhotoStorage } from '@/server/lib/photo-storage';
import { processPhoto } from '@/server/lib/photo-processing';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Photo } from '@/server/models/photo.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { toPhotoDto } from '@/server/services/register.dto';
import { findPlantRoom } from '@/server/services/register.lookup';
import type { Photo as PhotoDto } from '@/shared/types/register';
import { seesSite, siteWhere, visibleSiteIds } from '@/server/services/site-access.service';

const withCreator = { model: User, as: 'creator', attributes: ['id', 'name'] };

export async function photosOf(owner: 'assetId' | 'plantRoomId' | 'tagId', ids: number[], transaction?: Transaction): Promise<Map<number, Photo[]>> {
  const byOwner = new Map<number, Photo[]>(ids.map((id) => [id, []]));
  if (!ids.length) return byOwner;
  const photos = await Photo.findAll({ where: { [owner]: { [Op.in]: ids } }, include: [withCreator], order: [['id', 'ASC']], transaction });
  for (const p of photos) byOwner.get(p[owner]!)?.push(p);
  return byOwner;
}

/** The first photo of each item, for list thumbnails, in one grouped query. */
export async function firstAssetPhotoIds(assetIds: number[]): Promise<Map<number, number>> {
  const first = new Map<number, number>();
  if (!assetIds.length) return first;
  const rows = await Photo.sequelize!.query<{ assetId: number; photoId: number }>(
    'SELECT asset_id AS assetId, MIN(id) AS photoId FROM photos WHERE asset_id IN (:ids) GROUP BY asset_id',
    { replacements: { ids: assetIds }, type: QueryTypes.SELECT },
  );
  for (const r of rows) first.set(Number(r.assetId), Number(r.photoId));
  return first;
}

function readCaption(raw: unknown): string | null {
  if (raw === undefined || raw === null) return null;
  const caption = String(raw).trim();
  if (caption.length > 200) throw unprocessable('Some fields need attention.', { caption: 'At most 200 characters.' });
  return caption || null;
}

/**
 * Stores a photo of a plant item or plant room. Any engineer may add photos to any room or item of the
 * organisation (a photo adds to the record, it changes nothing in it); archived items take no new photos.
 */
export async function addPhoto(
  actor: AuthUser,
  storage: PhotoStorage,
  owner: { assetId: number } | { plantRoomId: number },
  file: { buffer: Buffer },
  rawCaption?: unknown,
  idempotencyKey: string | null = null,
): Promise<PhotoDto> {
  const caption = readCaption(rawCaption);
  const earlier = () => sentBefore(actor, owner, idempotencyKey);
  const repeat = await earlier();
  if (repeat) return repeat;
  if ('assetId' in owner) {
    const asset = await Asset.findOne({ where: { id: owner.assetId, organisationId: actor.organisationId, ...siteWhere(actor) } });
    if (!asset) throw notFound('Plant item');
    if (asset.archivedAt) throw conflict('This item is archived; it takes no new photos.');
  } else {
    await findPlantRoom(actor, owner.plantRoomId);
  }
  let photo: Photo;
  try {
    photo = await storePhoto(storage, { organisationId: actor.organisationId, ...owner, createdBy: actor.id, caption, idempotencyKey }, file.buffer);
  } catch (err) {
    // Two copies of the same request at once: the unique index lets one in; the other answers with it.
    const first = err instanceof UniqueConstraintError ? await earlier() : null;
    if (first) return first;
    throw err;
  }
  await photo.reload({ include: [withCreator] });
  return toPhotoDto(photo);
}

/**
 * The photo this person already added with this Idempotency-Key (an outbox sending again after a lost answer),
 * or null; the same key for another item or room is refused (422) rather than answered with the wrong photo.
 */
async function sentBefore(actor: AuthUser, owner: { assetId: number } | { plantRoomId: number }, key: string | null): Promise<PhotoDto | null> {
  if (!key) return null;
  const photo = await Photo.findOne({ where: { createdBy: actor.id, idempotencyKey: key }, include: [withCreator] });
  if (!photo) return null;
  const same = 'assetId' in owner ? photo.assetId === owner.assetId : photo.plantRoomId === owner.plantRoomId;
  if (!same) throw new HttpError(422, 'idempotency-key-reused', 'This Idempotency-Key was already used for a different request. Send a new key for a new action.');
  return toPhotoDto(photo);
}

/** Re-encodes an image (processPhoto), writes it and its thumbnail to storage, and records it. */
export async function storePhoto(
  storage: PhotoStorage,
  row: { organisationId: number; assetId?: number; plantRoomId?: number; tagId?: number; createdBy: number; caption: string | null; idempotencyKey?: string | null },
  input: Buffer,
  transaction?: Transaction,
): Promise<Photo> {
  const processed = await processPhoto(input);
  const base = `${row.organisationId}/${crypto.randomUUID()}`;
  await storage.put(`${base}.jpg`, processed.image, 'image/jpeg');
  await storage.put(`${base}-thumb.jpg`, processed.thumbnail, 'image/jpeg');
  return Photo.create(
    {
      organisationId: row.organisationId,
      assetId: row.assetId ?? null,
      plantRoomId: row.plantRoomId ?? null,
      tagId: row.tagId ?? null,
      storageKey: `${base}.jpg`,
      thumbnailKey: `${base}-thumb.jpg`,
      width: processed.width,
      height: processed.height,
      bytes: processed.image.length,
      caption: row.caption,
      createdBy: row.createdBy,
      idempotencyKey: row.idempotencyKey ?? null,
    },
    { transaction },
  );
}

/** The site a photo belongs to, through its item, plant room or tag. */
async function photoSiteId(photo: Photo): Promise<number | null> {
  const assetId = photo.assetId ?? (photo.tagId ? (await Tag.findByPk(photo.tagId, { attributes: ['assetId'] }))?.assetId : null);
  if (assetId) return (await Asset.findByPk(assetId, { attributes: ['siteId'] }))?.siteId ?? null;
  if (photo.plantRoomId) return (await PlantRoom.findByPk(photo.plantRoomId, { attributes: ['siteId'] }))?.siteId ?? null;
  return null;
}

/** The JPEG bytes of a photo or its thumbnail; another organisation's photo is a 404 like a missing one. */
export async function readPhotoFile(actor: AuthUser, storage: PhotoStorage, id: number, variant: 'full' | 'thumbnail'): Promise<Buffer> {
  const photo = await Photo.findOne({ where: { id, organisationId: actor.organisationId } });
  if (!photo || (visibleSiteIds(actor) !== null && !seesSite(actor, await photoSiteId(photo)))) throw notFound('Photo');
  try {
    return await storage.get(variant === 'full' ? photo.storageKey : photo.thumbnailKey);
  } catch (err) {
    if (err instanceof PhotoNotStoredError) throw new HttpError(404, 'photo-file-missing', 'The photo file is missing from storage.');
    throw err;
  }
}
