import { Op } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { Visit } from '@/server/models/visit.model';
import { findPlantRoom, findSite } from '@/server/services/register.lookup';
import { readingActivity, tagActivity } from '@/server/services/visit-activity.service';
import type { SinceLastVisit } from '@/shared/types/visits';

const CLEARED = new Set(['cleared', 'cleared-in-absence']);
const NOTES = new Set(['note-added', 'handed-over']);

/**
 * What changed on a site, or in one of its plant rooms, since the person's last ended visit there: tags raised
 * and cleared, notes and hand-overs, flagged readings. Nothing when they have not been before.
 */
export async function sinceLastVisit(actor: AuthUser, place: { siteId: number } | { plantRoomId: number }): Promise<SinceLastVisit> {
  const room = 'plantRoomId' in place ? await findPlantRoom(actor, place.plantRoomId) : null;
  const site = await findSite(actor, room ? room.siteId : (place as { siteId: number }).siteId);
  const last = await Visit.findOne({ where: { userId: actor.id, siteId: site.id, endedAt: { [Op.ne]: null } }, order: [['endedAt', 'DESC']] });
  if (!last?.endedAt) return { since: null, timeZone: site.timeZone, raised: [], cleared: [], notes: [], flaggedReadings: [] };
  const window = { organisationId: actor.organisationId, siteId: site.id, plantRoomId: room?.id, from: last.endedAt };
  const [events, flaggedReadings] = await Promise.all([tagActivity(window), readingActivity(window, { flaggedOnly: true })]);
  return {
    since: last.endedAt.toISOString(),
    timeZone: site.timeZone,
    raised: events.filter((e) => e.type === 'raised'),
    cleared: events.filter((e) => CLEARED.has(e.type)),
    notes: events.filter((e) => NOTES.has(e.type)),
    flaggedReadings,
  };
}
