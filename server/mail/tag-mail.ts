import type { Transaction } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { PlantRoom } from '@/server/models/plant-room.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { enqueueMail, recipientsWanting, type OutboxMail } from '@/server/mail/outbox';
import { rolesWith } from '@/shared/rules/permissions';

export type TagMailEvent = 'raised' | 'cleared' | 'cleared-in-absence' | 'handed-over' | 'reassigned-in-absence';

/** What a tag e-mail shows, frozen when the event happens. */
export interface TagSnapshot {
  id: number;
  kind: string;
  reason: string;
  assetId: number;
  plantId: string;
  assetName: string;
  siteName: string;
  plantRoomName: string | null;
  timeZone: string;
  raisedAt: string;
  expiresAt: string;
  holderName: string;
  contactPhone: string;
  lockNumber: string;
}


/**
 * Queues the e-mails a tag event causes, in the event's own transaction:
 * raised / cleared / cleared in absence → supervisors and admins who want them (not the person who did it);
 * handed over → the person who held the tag, if they want mail about their tags;
 * cleared or reassigned in absence → the person who held the tag, whatever their settings (they must know before
 * they go back to work), and supervisors and admins who want clearance mail;
 * reassigned in absence → also the new holder, whatever their settings: they now answer for a lock they did not fit.
 */
export async function enqueueTagMail(
  event: TagMailEvent,
  tag: Tag,
  actor: AuthUser,
  transaction: Transaction,
  extra: { previousHolderId?: number; reason?: string; note?: string } = {},
): Promise<void> {
  const sequelize = Tag.sequelize!;
  const asset = await Asset.findByPk(tag.assetId, {
    include: [{ model: Site, as: 'site' }, { model: PlantRoom, as: 'plantRoom' }],
    transaction,
  });
  const holder = await User.findByPk(tag.holderId, { transaction });
  const snapshot: TagSnapshot = {
    id: tag.id,
    kind: tag.kind,
    reason: tag.reason,
    assetId: tag.assetId,
    plantId: asset?.plantId ?? '',
    assetName: asset?.name ?? '',
    siteName: asset?.site?.name ?? '',
    plantRoomName: asset?.plantRoom?.name ?? null,
    timeZone: asset?.site?.timeZone ?? 'UTC',
    raisedAt: tag.raisedAt.toISOString(),
    expiresAt: tag.expiresAt.toISOString(),
    holderName: holder?.name ?? 'Unknown',
    contactPhone: tag.contactPhone,
    lockNumber: tag.lockNumber,
  };
  const base = { tag: snapshot, actor: { id: actor.id, name: actor.name }, reason: extra.reason ?? null, note: extra.note ?? null };
  const mails: OutboxMail[] = [];
  const personal = new Set<number>();

  // The person whose tag it was hears about it directly (OSHA 29 CFR 1910.147(e)(3)(iii): the authorized
  // employee is informed that the device was removed before resuming work).
  const inAbsence = event === 'cleared-in-absence' || event === 'reassigned-in-absence';
  const ownerId = event === 'cleared-in-absence' ? tag.holderId : event === 'handed-over' || event === 'reassigned-in-absence' ? extra.previousHolderId : undefined;
  if (ownerId && ownerId !== actor.id) {
    const owner = inAbsence
      ? await User.findOne({ where: { id: ownerId, organisationId: tag.organisationId }, transaction })
      : (await recipientsWanting(sequelize, tag.organisationId, 'my_tags', { userIds: [ownerId], roles: rolesWith('receiveOwnTagMail'), transaction }))[0];
    if (owner) {
      personal.add(owner.id);
      const kind = event === 'handed-over' ? 'my-tag-handed-over' : event === 'reassigned-in-absence' ? 'my-tag-reassigned-in-absence' : 'my-tag-cleared-in-absence';
      mails.push({ organisationId: tag.organisationId, kind, toEmail: owner.email, toUserId: owner.id, payload: { ...base, recipientName: owner.name } });
    }
  }

  if (event === 'reassigned-in-absence' && tag.holderId !== actor.id) {
    const taker = await User.findOne({ where: { id: tag.holderId, organisationId: tag.organisationId }, transaction });
    if (taker) {
      personal.add(taker.id);
      mails.push({ organisationId: tag.organisationId, kind: 'tag-reassigned-to-you', toEmail: taker.email, toUserId: taker.id, payload: { ...base, recipientName: taker.name } });
    }
  }

  if (event !== 'handed-over' && event !== 'reassigned-in-absence') {
    const setting = event === 'raised' ? 'raised' : 'cleared';
    const kind = event === 'raised' ? 'tag-raised' : event === 'cleared' ? 'tag-cleared' : 'tag-cleared-in-absence';
    const people = await recipientsWanting(sequelize, tag.organisationId, setting, { roles: rolesWith('receiveOrganisationMail'), transaction });
    for (const p of people) {
      if (p.id === actor.id || personal.has(p.id)) continue;
      mails.push({ organisationId: tag.organisationId, kind, toEmail: p.email, toUserId: p.id, payload: { ...base, recipientName: p.name } });
    }
  }
  await enqueueMail(sequelize, mails, transaction);
}

