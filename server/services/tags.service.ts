import { Op, type Sequelize, type Transaction, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError, notFound, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { appendEvent } from '@/server/services/tag-events';
import { once, type Idempotency } from '@/server/services/tag-idempotency';
import { requireNoPendingNotices } from '@/server/services/tag-notices.service';
import { loadEvents, tagInclude, toTagDto } from '@/server/services/tag-dto';
import { photosOf, storePhoto } from '@/server/services/photos.service';
import { toPhotoDto } from '@/server/services/register-dto';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { expiryProblem, mayRaise } from '@/shared/rules/tags';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { sourcesNotAccounted } from '@/shared/rules/tag-isolation';
import type { ProofInput, RaiseTagInput } from '@/shared/schemas/tags';
import type { ListResponse } from '@/shared/types/user';
import type { Tag as TagDto } from '@/shared/types/tags';
import { seesSite, siteWhere } from '@/server/services/site-access.service';

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
export async function addTagPhoto(sequelize: Sequelize, storage: PhotoStorage, actor: AuthUser, id: number, file: Buffer, caption: string | null, idem: Idempotency | null = null): Promise<TagDto> {
  if (actor.role === 'viewer') throw new HttpError(403, 'forbidden', 'Viewers cannot add photos.');
  await once(actor, idem, async () => {
    const tag = Number.isSafeInteger(id) ? await Tag.findOne({ where: { id, organisationId: actor.organisationId } }) : null;
    if (!tag) throw notFound('Tag');
    if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has been cleared; it takes no new photos.');
    await sequelize.transaction(async (transaction) => {
      const photo = await storePhoto(storage, { organisationId: actor.organisationId, tagId: tag.id, createdBy: actor.id, caption }, file, transaction);
      await appendEvent(tag, 'photo-added', actor, { photoId: photo.id, caption }, transaction, idem);
    });
    return tag.id;
  });
  return getTag(actor, id);
}

/** Records a proof of an isolation (OSHA 29 CFR 1910.147(d)(6)) with its event, inside the caller's transaction. */
export async function recordProof(tag: Tag, actor: AuthUser, proof: ProofInput, transaction: Transaction, idem: Idempotency | null = null) {
  const row = await TagProof.create(
    { tagId: tag.id, organisationId: tag.organisationId, method: proof.method, instrument: proof.instrument, reading: proof.reading, note: proof.note, byId: actor.id, at: clock.now() },
    { transaction },
  );
  await appendEvent(tag, 'proved', actor, { proofId: row.id, method: proof.method, instrument: proof.instrument, reading: proof.reading, note: proof.note }, transaction, idem);
}

/**
 * Raises a tag. The holder is the signed-in user, never the input. With an Idempotency-Key, a retried request
 * returns the tag the first one created instead of creating a second; the same key with a different body or item
 * is refused (422).
 */
export async function raiseTag(sequelize: Sequelize, actor: AuthUser, assetId: number, input: RaiseTagInput, idem: Idempotency | null): Promise<{ tag: TagDto; created: boolean }> {
  if (!mayRaise(actor)) throw new HttpError(403, 'forbidden', 'Viewers cannot raise tags.');
  const { tagId, replayed } = await once(actor, idem, async () => {
    await requireNoPendingNotices(actor);
    const asset = await findAsset(actor, assetId);
    if (asset.archivedAt) throw new HttpError(409, 'archived', 'This item is archived; tags cannot be raised on it.');
    const now = clock.now();
    const expiresAt = new Date(input.expiresAt);
    const expiry = expiryProblem(expiresAt, now, actor.role);
    if (expiry) throw unprocessable('Check the expiry.', { expiresAt: expiry });
    if (input.kind === 'isolation') await checkIsolation(actor, asset, input);
    return sequelize.transaction(async (transaction) => {
      const isolation = input.kind === 'isolation';
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
          lockNumber: isolation ? input.lockNumber : '',
          energySources: isolation ? input.energySources : [],
          omittedSources: isolation ? input.omittedSources : [],
          normalState: isolation ? '' : input.normalState,
          leftState: isolation ? '' : input.leftState,
          idempotencyKey: idem?.key ?? null,
          requestHash: idem?.hash ?? null,
        },
        { transaction },
      );
      if (isolation) {
        await TagPoint.bulkCreate(input.points.map((p) => ({ tagId: tag.id, assetId: p.assetId ?? null, description: p.description, method: p.method, lockNumber: p.lockNumber })), { transaction });
      }
      await appendEvent(tag, 'raised', actor, { reason: input.reason, expiresAt: expiresAt.toISOString(), kind: input.kind }, transaction, idem);
      if (isolation && input.proof) await recordProof(tag, actor, input.proof, transaction);
      await enqueueTagMail('raised', tag, actor, transaction);
      return tag.id;
    });
  });
  return { tag: await getTag(actor, tagId), created: !replayed };
}

/**
 * Every energy source recorded on the item is isolated or named as left out with a reason (OSHA 29 CFR
 * 1910.147(d)(3)–(d)(4)); sources the item does not have, and points on items that do not exist, are refused.
 */
async function checkIsolation(actor: AuthUser, asset: Asset, input: RaiseTagInput) {
  const fields: Record<string, string> = {};
  const label = (s: string) => ENERGY_SOURCE_LABELS[s as keyof typeof ENERGY_SOURCE_LABELS] ?? s;
  const named = [...input.energySources, ...input.omittedSources.map((o) => o.source)];
  const foreign = named.filter((s) => !asset.energySources.includes(s));
  if (foreign.length) fields.energySources = `This item is not recorded with these energy sources: ${foreign.join(', ')}.`;
  const both = input.omittedSources.filter((o) => input.energySources.includes(o.source)).map((o) => o.source);
  if (both.length) fields.omittedSources = `A source is either isolated or left out, not both: ${both.map(label).join(', ')}.`;
  const missing = sourcesNotAccounted(asset.energySources, input.energySources, input.omittedSources);
  if (missing.length && !fields.energySources) {
    fields.energySources = `Not accounted for: ${missing.map(label).join(', ')}. Isolate each one, or leave it out with the reason it is safe (${missing.join(', ')}).`;
  }
  const pointAssetIds = input.points.map((p) => p.assetId).filter((x): x is number => !!x);
  if (pointAssetIds.length) {
    const found = await Asset.count({ where: { id: { [Op.in]: pointAssetIds }, organisationId: actor.organisationId } });
    if (found !== new Set(pointAssetIds).size) fields.points = 'An isolation point refers to a plant item that does not exist.';
  }
  if (Object.keys(fields).length) throw unprocessable(missing.length ? `Every energy source of the item must be accounted for: ${missing.join(', ')}.` : 'Some fields need attention.', fields);
}

export interface TagFilters {
  status?: string;
  /** Only live tags with an open hand-over offer to the caller. */
  offeredToMe?: boolean;
  assetId?: number;
  siteId?: number;
  kind?: string;
}

export async function listTags(actor: AuthUser, filters: TagFilters, paging: { page: number; pageSize: number; offset: number }): Promise<ListResponse<TagDto>> {
  const where: WhereOptions<Tag> = { organisationId: actor.organisationId };
  if (filters.status === 'live' || filters.status === 'cleared') Object.assign(where, { status: filters.status });
  if (filters.kind === 'isolation' || filters.kind === 'override') Object.assign(where, { kind: filters.kind });
  if (filters.assetId) Object.assign(where, { assetId: filters.assetId });
  if (filters.offeredToMe) Object.assign(where, { status: 'live', offerToId: actor.id, offerLapsesAt: { [Op.gt]: clock.now() } });
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

/** One action on one locked, live tag, once per Idempotency-Key; answers with the tag as it now is. */
export async function actOnTag(sequelize: Sequelize, actor: AuthUser, id: number, idem: Idempotency | null, run: (tag: Tag, transaction: Transaction) => Promise<void>): Promise<TagDto> {
  await once(actor, idem, () => sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    await run(tag, transaction);
    return tag.id;
  }));
  return getTag(actor, id);
}

export function requireLive(tag: Tag) {
  if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has already been cleared.');
}

/** People a tag can be offered or reassigned to: active, signed-up, non-viewer members of the caller's organisation. */
export async function listTagColleagues(actor: AuthUser): Promise<{ id: number; name: string; role: string }[]> {
  const users = await User.findAll({
    where: { organisationId: actor.organisationId, active: true, role: { [Op.ne]: 'viewer' }, passwordHash: { [Op.ne]: null } },
    attributes: ['id', 'name', 'role'],
    order: [['name', 'ASC']],
  });
  return users.map((u) => ({ id: u.id, name: u.name, role: u.role }));
}
