import { Op, UniqueConstraintError, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError, notFound, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { loadEvents, tagInclude, toTagDto } from '@/server/services/tag-dto';
import { photosOf, storePhoto } from '@/server/services/photos.service';
import { toPhotoDto } from '@/server/services/register-dto';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { expiryProblem, mayRaise, type TagEventType } from '@/shared/rules/tags';
import type { RaiseTagInput } from '@/shared/schemas/tags';
import type { ListResponse } from '@/shared/types/user';
import type { Tag as TagDto } from '@/shared/types/tags';
import { seesSite, siteWhere } from '@/server/services/site-access.service';

export async function appendEvent(tag: Tag, type: TagEventType, actor: AuthUser, data: Record<string, unknown>, transaction: Transaction) {
  await TagEvent.create({ tagId: tag.id, organisationId: tag.organisationId, type, at: clock.now(), byId: actor.id, data }, { transaction });
}

async function findAsset(actor: AuthUser, assetId: number, transaction?: Transaction) {
  const asset = Number.isSafeInteger(assetId) ? await Asset.findOne({ where: { id: assetId, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction }) : null;
  if (!asset) throw notFound('Plant item');
  return asset;
}

export async function getTag(actor: AuthUser, id: number): Promise<TagDto> {
  const tag = Number.isSafeInteger(id) ? await Tag.findOne({ where: { id, organisationId: actor.organisationId }, include: tagInclude }) : null;
  if (!tag || !seesSite(actor, (tag as Tag & { asset?: Asset }).asset?.siteId)) throw notFound('Tag');
  const photos = (await photosOf('tagId', [tag.id])).get(tag.id) ?? [];
  return { ...toTagDto(tag, await loadEvents(tag.id)), photoCount: photos.length, photos: photos.map(toPhotoDto) };
}

/** Adds a photo of the lock or tag in place to a live tag, and records it in the tag's history. */
export async function addTagPhoto(sequelize: Sequelize, storage: PhotoStorage, actor: AuthUser, id: number, file: Buffer, caption: string | null): Promise<TagDto> {
  if (actor.role === 'viewer') throw new HttpError(403, 'forbidden', 'Viewers cannot add photos.');
  const tag = Number.isSafeInteger(id) ? await Tag.findOne({ where: { id, organisationId: actor.organisationId } }) : null;
  if (!tag) throw notFound('Tag');
  if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has been cleared; it takes no new photos.');
  await sequelize.transaction(async (transaction) => {
    const photo = await storePhoto(storage, { organisationId: actor.organisationId, tagId: tag.id, createdBy: actor.id, caption }, file, transaction);
    await appendEvent(tag, 'photo-added', actor, { photoId: photo.id, caption }, transaction);
  });
  return getTag(actor, id);
}

/**
 * Raises a tag. The author is the signed-in user, never the input. With an Idempotency-Key, a retried request
 * returns the tag the first one created instead of creating a second.
 */
export async function raiseTag(sequelize: Sequelize, actor: AuthUser, assetId: number, input: RaiseTagInput, idempotencyKey: string | null): Promise<{ tag: TagDto; created: boolean }> {
  if (!mayRaise(actor)) throw new HttpError(403, 'forbidden', 'Viewers cannot raise tags.');
  if (idempotencyKey) {
    const existing = await Tag.findOne({ where: { raisedById: actor.id, idempotencyKey } });
    if (existing) return { tag: await getTag(actor, existing.id), created: false };
  }
  const asset = await findAsset(actor, assetId);
  if (asset.archivedAt) throw new HttpError(409, 'archived', 'This item is archived; tags cannot be raised on it.');
  const now = clock.now();
  const expiresAt = new Date(input.expiresAt);
  const expiry = expiryProblem(expiresAt, now, actor.role);
  if (expiry) throw unprocessable('Check the expiry.', { expiresAt: expiry });

  const fields: Record<string, string> = {};
  if (input.kind === 'isolation') {
    const foreign = input.energySources.filter((s) => !asset.energySources.includes(s));
    if (foreign.length) fields.energySources = `This item is not recorded with these energy sources: ${foreign.join(', ')}.`;
    const pointAssetIds = input.points.map((p) => p.assetId).filter((x): x is number => !!x);
    if (pointAssetIds.length) {
      const found = await Asset.count({ where: { id: { [Op.in]: pointAssetIds }, organisationId: actor.organisationId } });
      if (found !== new Set(pointAssetIds).size) fields.points = 'An isolation point refers to a plant item that does not exist.';
    }
  }
  if (Object.keys(fields).length) throw unprocessable('Some fields need attention.', fields);

  try {
    const id = await sequelize.transaction(async (transaction) => {
      const tag = await Tag.create(
        {
          organisationId: actor.organisationId,
          assetId: asset.id,
          kind: input.kind,
          reason: input.reason,
          raisedById: actor.id,
          holderId: actor.id,
          raisedAt: now,
          expiresAt,
          contactPhone: input.contactPhone,
          lockNumber: input.lockNumber,
          energySources: input.kind === 'isolation' ? input.energySources : [],
          normalState: input.kind === 'override' ? input.normalState : '',
          leftState: input.kind === 'override' ? input.leftState : '',
          idempotencyKey,
        },
        { transaction },
      );
      if (input.kind === 'isolation') {
        await TagPoint.bulkCreate(input.points.map((p) => ({ tagId: tag.id, assetId: p.assetId ?? null, description: p.description, method: p.method })), { transaction });
      }
      await appendEvent(tag, 'raised', actor, { reason: input.reason, expiresAt: expiresAt.toISOString(), kind: input.kind }, transaction);
      await enqueueTagMail('raised', tag, actor, transaction);
      return tag.id;
    });
    return { tag: await getTag(actor, id), created: true };
  } catch (err) {
    // Two retries racing with the same key: the unique index lets one through; answer the other with that tag.
    if (err instanceof UniqueConstraintError && idempotencyKey) {
      const existing = await Tag.findOne({ where: { raisedById: actor.id, idempotencyKey } });
      if (existing) return { tag: await getTag(actor, existing.id), created: false };
    }
    throw err;
  }
}

export interface TagFilters {
  status?: string;
  assetId?: number;
  siteId?: number;
  kind?: string;
}

export async function listTags(actor: AuthUser, filters: TagFilters, paging: { page: number; pageSize: number; offset: number }): Promise<ListResponse<TagDto>> {
  const where: WhereOptions<Tag> = { organisationId: actor.organisationId };
  if (filters.status === 'live' || filters.status === 'cleared') Object.assign(where, { status: filters.status });
  if (filters.kind === 'isolation' || filters.kind === 'override') Object.assign(where, { kind: filters.kind });
  if (filters.assetId) Object.assign(where, { assetId: filters.assetId });
  const assetWhere = { ...(filters.siteId ? { siteId: filters.siteId } : {}), ...siteWhere(actor) };
  const narrowed = Reflect.ownKeys(assetWhere).length > 0;
  const include = tagInclude.map((inc) => (inc.as === 'asset' && narrowed ? { ...inc, where: assetWhere, required: true } : inc));
  const { rows, count } = await Tag.findAndCountAll({ where, include, order: [['status', 'DESC'], ['raisedAt', 'DESC']], limit: paging.pageSize, offset: paging.offset, distinct: true });
  const photos = await photosOf('tagId', rows.map((t) => t.id));
  return { items: rows.map((t) => ({ ...toTagDto(t), photoCount: photos.get(t.id)?.length ?? 0 })), total: count, page: paging.page, pageSize: paging.pageSize };
}

/** Locks the tag row for the rest of the transaction; another organisation's tag is a 404. */
export async function lockTag(actor: AuthUser, id: number, transaction: Transaction): Promise<Tag> {
  const tag = Number.isSafeInteger(id) ? await Tag.findOne({ where: { id, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE }) : null;
  if (!tag) throw notFound('Tag');
  return tag;
}

export function requireLive(tag: Tag) {
  if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has already been cleared.');
}
