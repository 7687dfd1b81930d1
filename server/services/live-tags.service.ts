import { QueryTypes, type WhereOptions } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { Tag } from '@/server/models/tag.model';
import { tagInclude, toTagDto } from '@/server/services/tag-dto';
import { byAttention } from '@/shared/rules/visits';
import type { Tag as TagDto } from '@/shared/types/tags';

export interface LiveTagScope {
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
