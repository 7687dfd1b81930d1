import type { Transaction } from 'sequelize';
import { HttpError, forbidden, notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { RECORD_PERMISSIONS } from '@/shared/rules/permissions';
import { siteWhere } from '@/server/services/site-access.service';

/** Supervisors and admins edit anything; engineers edit what they added; viewers nothing (RECORD_PERMISSIONS.editRecord). */
export function assertCanEdit(actor: AuthUser, createdBy: number, what: string) {
  if (RECORD_PERMISSIONS.editRecord(actor, { createdBy })) return;
  throw forbidden(`Engineers can change only the ${what}s they added. Ask a supervisor to change this one.`);
}

/** Another organisation's site is answered exactly like a missing one. */
export async function findSite(actor: AuthUser, id: number, transaction?: Transaction): Promise<Site> {
  const site = await Site.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor, 'id') }, transaction });
  if (!site) throw notFound('Site');
  return site;
}

export async function findPlantRoom(actor: AuthUser, id: number, transaction?: Transaction): Promise<PlantRoom> {
  const room = await PlantRoom.findOne({ where: { id, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction });
  if (!room) throw notFound('Plant room');
  return room;
}

const fieldError = (field: string, message: string) => new HttpError(422, 'invalid', 'Some fields need attention.', { [field]: message });

/**
 * A site named by a form field: a missing or foreign one is a 422 on that field (same answer for both,
 * so nothing is revealed about other organisations), not a 404 for the whole request.
 */
export async function siteForField(actor: AuthUser, siteId: number, transaction?: Transaction): Promise<Site> {
  const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId, ...siteWhere(actor, 'id') }, transaction });
  if (!site) throw fieldError('siteId', 'Choose one of your sites.');
  return site;
}

/** A plant room named by a form field; it must be on the item's site. */
export async function plantRoomForField(actor: AuthUser, plantRoomId: number, siteId: number, transaction?: Transaction): Promise<PlantRoom> {
  const room = await PlantRoom.findOne({ where: { id: plantRoomId, organisationId: actor.organisationId, ...siteWhere(actor) }, transaction });
  if (!room) throw fieldError('plantRoomId', 'Choose one of the plant rooms of this site.');
  if (room.siteId !== siteId) throw fieldError('plantRoomId', 'That plant room is on another site.');
  return room;
}
