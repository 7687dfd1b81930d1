import { QueryTypes, UniqueConstraintError, type Sequelize } from 'sequelize';
import { HttpError, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Site } from '@/server/models/site.model';
import { toSiteDto } from '@/server/services/register.dto';
import { findSite } from '@/server/services/register.lookup';
import { liveTagsIn } from '@/server/services/live-tags.service';
import { recordOpened } from '@/server/services/recent-places.service';
import type { SiteInput } from '@/shared/schemas/register';
import { isValidTimeZone } from '@/shared/rules/time-zone';
import type { Site as SiteDto } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/api';
import { siteWhere } from '@/server/services/site-access.service';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';


/** The zone as the IANA database spells it (`europe/london` → `Europe/London`), or a 422 naming the field. */
function canonicalZone(timeZone: string): string {
  if (!isValidTimeZone(timeZone)) throw unprocessable('Some fields need attention.', { timeZone: 'Unknown time zone; give a region and city such as Europe/London.' });
  return new Intl.DateTimeFormat('en-GB', { timeZone }).resolvedOptions().timeZone;
}

const duplicateName = (name: string) =>
  new HttpError(409, 'conflict', `There is already a site called "${name}".`, { name: 'Another site already has this name.' });

async function countsFor(sequelize: Sequelize, ids: number[]) {
  const counts = new Map<number, { plantRoomCount: number; assetCount: number }>(ids.map((id) => [id, { plantRoomCount: 0, assetCount: 0 }]));
  if (!ids.length) return counts;
  const rooms = await sequelize.query<{ siteId: number; n: bigint | number }>(
    'SELECT site_id AS siteId, COUNT(*) AS n FROM plant_rooms WHERE site_id IN (:ids) GROUP BY site_id',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  const assets = await sequelize.query<{ siteId: number; n: bigint | number }>(
    'SELECT site_id AS siteId, COUNT(*) AS n FROM assets WHERE site_id IN (:ids) AND archived_at IS NULL GROUP BY site_id',
    { replacements: { ids }, type: QueryTypes.SELECT },
  );
  for (const r of rooms) counts.get(Number(r.siteId))!.plantRoomCount = Number(r.n);
  for (const r of assets) counts.get(Number(r.siteId))!.assetCount = Number(r.n);
  return counts;
}

async function dto(site: Site) {
  const counts = await countsFor(Site.sequelize!, [site.id]);
  return toSiteDto(site, counts.get(site.id)!);
}

export async function listSites(actor: AuthUser, paging: Paging): Promise<ListResponse<SiteDto>> {
  const { rows, count } = await Site.findAndCountAll({
    where: { organisationId: actor.organisationId, ...siteWhere(actor, 'id') },
    order: [['name', 'ASC'], ['id', 'ASC']],
    ...pageRows(paging),
  });
  const counts = await countsFor(Site.sequelize!, rows.map((s) => s.id));
  return listPage(rows.map((s) => toSiteDto(s, counts.get(s.id)!)), count, paging);
}

/** A site as its screen opens it: with its live tags, and remembered among the person's recent places. */
export async function getSite(actor: AuthUser, id: number): Promise<SiteDto> {
  const site = await dto(await findSite(actor, id));
  await recordOpened(actor, 'site', id);
  return { ...site, liveTags: await liveTagsIn(actor, { siteId: id }) };
}

export async function createSite(actor: AuthUser, input: SiteInput): Promise<SiteDto> {
  const timeZone = canonicalZone(input.timeZone);
  if (await Site.findOne({ where: { organisationId: actor.organisationId, name: input.name } })) throw duplicateName(input.name);
  try {
    const site = await Site.create({
      organisationId: actor.organisationId,
      name: input.name,
      address: input.address,
      timeZone,
      clientContactName: input.clientContactName || null,
      clientContactPhone: input.clientContactPhone || null,
      clientContactEmail: input.clientContactEmail || null,
      createdBy: actor.id,
    });
    return dto(site);
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(input.name);
    throw err;
  }
}

export async function updateSite(actor: AuthUser, id: number, patch: Partial<SiteInput>): Promise<SiteDto> {
  const site = await findSite(actor, id);
  if (patch.name !== undefined && patch.name !== site.name) {
    const other = await Site.findOne({ where: { organisationId: actor.organisationId, name: patch.name } });
    if (other && other.id !== site.id) throw duplicateName(patch.name);
    site.name = patch.name;
  }
  if (patch.timeZone !== undefined) site.timeZone = canonicalZone(patch.timeZone);
  if (patch.address !== undefined) site.address = patch.address;
  if (patch.clientContactName !== undefined) site.clientContactName = patch.clientContactName || null;
  if (patch.clientContactPhone !== undefined) site.clientContactPhone = patch.clientContactPhone || null;
  if (patch.clientContactEmail !== undefined) site.clientContactEmail = patch.clientContactEmail || null;
  try {
    await site.save();
  } catch (err) {
    if (err instanceof UniqueConstraintError) throw duplicateName(site.name);
    throw err;
  }
  return dto(site);
}
