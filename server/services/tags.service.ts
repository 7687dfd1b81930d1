/** Reading tags: one tag with its history, the list, colleagues to hand over to. Raising: tag-raise.service.ts; actions on a live tag: tag-actions.service.ts, tag-handover.service.ts. */
import { Op, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import type { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { photosOf } from '@/server/services/photos.service';
import { toPhotoDto } from '@/server/services/register.dto';
import { seesSite, siteWhere } from '@/server/services/site-access.service';
import { loadEvents } from '@/server/services/tag-history.service';
import { tagInclude, toTagDto } from '@/server/services/tags.dto';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';
import { rolesWith } from '@/shared/rules/permissions';
import type { TagListQuery } from '@/shared/schemas/queries';
import type { ListResponse } from '@/shared/types/api';
import type { Tag as TagDto } from '@/shared/types/tags';

export async function getTag(actor: AuthUser, id: number): Promise<TagDto> {
  const tag = await Tag.findOne({ where: { id, organisationId: actor.organisationId }, include: tagInclude });
  if (!tag || !seesSite(actor, (tag as Tag & { asset?: Asset }).asset?.siteId)) throw notFound('Tag');
  const photos = (await photosOf('tagId', [tag.id])).get(tag.id) ?? [];
  return { ...toTagDto(tag, await loadEvents(tag.id)), photoCount: photos.length, photos: photos.map(toPhotoDto) };
}

/** Tags by the list's filters (`tagListQuery`), live first, newest raised first. */
export async function listTags(actor: AuthUser, filters: Omit<TagListQuery, 'page' | 'pageSize'>, paging: Paging): Promise<ListResponse<TagDto>> {
  const where: WhereOptions<Tag> = { organisationId: actor.organisationId };
  if (filters.status) Object.assign(where, { status: filters.status });
  if (filters.kind) Object.assign(where, { kind: filters.kind });
  if (filters.assetId) Object.assign(where, { assetId: filters.assetId });
  if (filters.offeredTo === 'me') Object.assign(where, { status: 'live', offerToId: actor.id, offerLapsesAt: { [Op.gt]: clock.now() } });
  const assetWhere = { ...(filters.siteId ? { siteId: filters.siteId } : {}), ...siteWhere(actor) };
  const narrowed = Reflect.ownKeys(assetWhere).length > 0;
  const include = tagInclude.map((inc) => (inc.as === 'asset' && narrowed ? { ...inc, where: assetWhere, required: true } : inc));
  const { rows, count } = await Tag.findAndCountAll({ where, include, order: [['status', 'DESC'], ['raisedAt', 'DESC']], ...pageRows(paging), distinct: true });
  const photos = await photosOf('tagId', rows.map((t) => t.id));
  return listPage(rows.map((t) => ({ ...toTagDto(t), photoCount: photos.get(t.id)?.length ?? 0 })), count, paging);
}

/** People a tag can be offered or reassigned to: active, signed-up members who may hold tags, of the caller's organisation. */
export async function listTagColleagues(actor: AuthUser): Promise<{ id: number; name: string; role: string }[]> {
  const users = await User.findAll({
    where: { organisationId: actor.organisationId, active: true, role: rolesWith('holdTags'), passwordHash: { [Op.ne]: null } },
    attributes: ['id', 'name', 'role'],
    order: [['name', 'ASC']],
  });
  return users.map((u) => ({ id: u.id, name: u.name, role: u.role }));
}
