import { clock } from '@/server/lib/clock';
import type { AuthUser } from '@/server/middleware/auth';
import { PlantRoom } from '@/server/models/plant-room.model';
import { RecentPlace, type PlaceType } from '@/server/models/recent-place.model';
import { Site } from '@/server/models/site.model';
import { liveTagCounts } from '@/server/services/live-tags.service';
import { siteWhere } from '@/server/services/site-access.service';
import type { RecentPlace as RecentPlaceDto } from '@/shared/types/visits';

const RECENT_LIMIT = 6;

/** Remembers that the person opened a place; one row per place, holding the latest time. */
export async function recordOpened(actor: Pick<AuthUser, 'id'>, placeType: PlaceType, placeId: number): Promise<void> {
  await RecentPlace.upsert({ userId: actor.id, placeType, placeId, openedAt: clock.now() });
}

/** The sites and plant rooms the person opened last and may still see, newest first, with their live-tag counts. */
export async function recentPlaces(actor: AuthUser): Promise<RecentPlaceDto[]> {
  const rows = await RecentPlace.findAll({ where: { userId: actor.id }, order: [['openedAt', 'DESC']], limit: RECENT_LIMIT * 2 });
  const siteIds = rows.filter((r) => r.placeType === 'site').map((r) => r.placeId);
  const roomIds = rows.filter((r) => r.placeType === 'plant-room').map((r) => r.placeId);
  const [sites, rooms] = await Promise.all([
    Site.findAll({ where: { id: siteIds, organisationId: actor.organisationId, ...siteWhere(actor, 'id') } }),
    PlantRoom.findAll({ where: { id: roomIds, organisationId: actor.organisationId, ...siteWhere(actor, 'siteId') }, include: [{ model: Site, as: 'site', attributes: ['id', 'name'] }] }),
  ]);
  const [siteCounts, roomCounts] = await Promise.all([
    liveTagCounts(actor.organisationId, 'site', sites.map((s) => s.id)),
    liveTagCounts(actor.organisationId, 'plantRoom', rooms.map((r) => r.id)),
  ]);
  const out: RecentPlaceDto[] = [];
  for (const r of rows) {
    const openedAt = r.openedAt.toISOString();
    if (r.placeType === 'site') {
      const s = sites.find((x) => x.id === r.placeId);
      if (s) out.push({ type: 'site', id: s.id, name: s.name, siteName: null, openedAt, liveTagCount: siteCounts.get(s.id) ?? 0 });
    } else {
      const room = rooms.find((x) => x.id === r.placeId);
      if (room) out.push({ type: 'plant-room', id: room.id, name: room.name, siteName: room.site?.name ?? null, openedAt, liveTagCount: roomCounts.get(room.id) ?? 0 });
    }
  }
  return out.slice(0, RECENT_LIMIT);
}
