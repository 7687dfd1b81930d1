/** What live tags say about places and items: live tags in a place or held by someone, counts, each item's tag state. */
import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { User } from '@/server/models/user.model';
import { person, provedOf, tagInclude, toTagDto } from '@/server/services/tags.dto';
import { assetStateFromTags, type AssetTagSummary } from '@/shared/rules/tags';
import { byAttention } from '@/shared/rules/visits';
import type { PointUse, Tag as TagDto } from '@/shared/types/tags';

interface LiveTagScope {
  siteId?: number;
  plantRoomId?: number;
  holderId?: number;
}

/** Live tags of the actor's organisation in one place (or held by one person), most urgent first. */
export async function liveTagsIn(actor: Pick<AuthUser, 'organisationId'>, scope: LiveTagScope): Promise<TagDto[]> {
  const where: WhereOptions<Tag> = { organisationId: actor.organisationId, status: 'live' };
  if (scope.holderId) Object.assign(where, { holderId: scope.holderId });
  const assetWhere: Record<string, number> = {};
  if (scope.siteId) assetWhere.siteId = scope.siteId;
  if (scope.plantRoomId) assetWhere.plantRoomId = scope.plantRoomId;
  const include = tagInclude.map((inc) => (inc.as === 'asset' && Object.keys(assetWhere).length ? { ...inc, where: assetWhere, required: true } : inc));
  const tags = await Tag.findAll({ where, include, order: [['expiresAt', 'ASC'], ['id', 'ASC']] });
  return byAttention(tags.map((t) => toTagDto(t)));
}

/** Live tags per plant room or per site, for lists, in one grouped query. */
export async function liveTagCounts(organisationId: number, by: 'plantRoom' | 'site', ids: number[]): Promise<Map<number, number>> {
  const counts = new Map<number, number>(ids.map((id) => [id, 0]));
  if (!ids.length) return counts;
  const column = by === 'site' ? 'a.site_id' : 'a.plant_room_id';
  const rows = await Tag.sequelize!.query<{ placeId: number; n: bigint | number }>(
    `SELECT ${column} AS placeId, COUNT(*) AS n FROM tags t JOIN assets a ON a.id = t.asset_id
     WHERE t.organisation_id = :organisationId AND t.status = 'live' AND ${column} IN (:ids) GROUP BY ${column}`,
    { replacements: { organisationId, ids }, type: QueryTypes.SELECT },
  );
  for (const r of rows) counts.set(Number(r.placeId), Number(r.n));
  return counts;
}

/** State per item for lists and records: one grouped query over live tags. */
export async function tagSummaries(organisationId: number, assetIds: number[]): Promise<Map<number, AssetTagSummary>> {
  const result = new Map<number, AssetTagSummary>();
  if (!assetIds.length) return result;
  const live = await Tag.findAll({
    attributes: ['id', 'assetId', 'kind', 'status', 'expiresAt'],
    where: { organisationId, status: 'live', assetId: { [Op.in]: assetIds } },
    include: [{ model: TagProof, as: 'proofs', attributes: ['id'] }],
  });
  const now = clock.now();
  const states = live.map((t) => ({ assetId: t.assetId, kind: t.kind, status: t.status, expiresAt: t.expiresAt, proved: provedOf(t) ?? true }));
  for (const id of assetIds) result.set(id, assetStateFromTags(states.filter((t) => t.assetId === id), now));
  return result;
}

/** Where an item is itself an isolation point of a live tag on another item ("locked shut for work on …"). */
export async function pointUses(organisationId: number, assetId: number): Promise<PointUse[]> {
  const points = await TagPoint.findAll({
    where: { assetId },
    include: [{ model: Tag, as: 'tag', where: { organisationId, status: 'live' }, include: [{ model: Asset, as: 'asset' }, { model: User, as: 'holder' }] }],
    order: [['id', 'ASC']],
  });
  return points.map((p) => {
    const tag = (p as TagPoint & { tag: Tag & { asset: Asset } }).tag;
    return { tagId: tag.id, method: p.method, lockNumber: p.lockNumber || tag.lockNumber, forAsset: { id: tag.asset.id, plantId: tag.asset.plantId, name: tag.asset.name }, holder: person(tag.holder) };
  });
}
