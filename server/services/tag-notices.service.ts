/** Notices to a holder whose tag was cleared or reassigned in their absence, and their acknowledgement. */
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError, notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { TagNotice } from '@/server/models/tag-notice.model';
import { User } from '@/server/models/user.model';
import { appendEvent, once, type Idempotency } from '@/server/services/tag-history.service';
import type { TagNotice as TagNoticeDto } from '@/shared/types/tags';

/** Records that the holder must be told what happened to their tag while they were away. */
export async function createNotice(tag: Tag, holderId: number, kind: TagNotice['kind'], actor: AuthUser, reason: string, transaction: Transaction) {
  await TagNotice.create({ tagId: tag.id, organisationId: tag.organisationId, userId: holderId, kind, byId: actor.id, reason, at: clock.now() }, { transaction });
}

/** The caller's notices not yet acknowledged, oldest first. */
export async function pendingNotices(actor: AuthUser): Promise<TagNoticeDto[]> {
  const rows = await TagNotice.findAll({
    where: { userId: actor.id, organisationId: actor.organisationId, acknowledgedAt: { [Op.is]: null } },
    include: [{ model: User, as: 'by' }, { model: Tag, as: 'tag', include: [{ model: Asset, as: 'asset' }] }],
    order: [['id', 'ASC']],
  });
  return rows.map((n) => {
    const asset = (n as TagNotice & { tag: Tag & { asset: Asset } }).tag.asset;
    return {
      id: n.id, tagId: n.tagId, kind: n.kind, at: n.at.toISOString(), reason: n.reason,
      by: n.by ? { id: n.by.id, name: n.by.name } : { id: 0, name: 'Unknown' },
      asset: { id: asset.id, plantId: asset.plantId, name: asset.name },
    };
  });
}

/**
 * OSHA 29 CFR 1910.147(e)(3)(iii): a holder whose tag was removed or moved in their absence is told before they
 * resume work. Until they acknowledge it in the app, they may not raise, clear, extend or accept any tag (409).
 */
export async function requireNoPendingNotices(actor: AuthUser, transaction?: Transaction) {
  const n = await TagNotice.count({ where: { userId: actor.id, acknowledgedAt: { [Op.is]: null } }, transaction });
  if (n > 0) {
    throw new HttpError(409, 'acknowledge-first', `One of your tags was cleared or reassigned while you were away. Read and acknowledge ${n === 1 ? 'it' : `all ${n}`} before you raise, clear, extend or take over a tag.`);
  }
}

/** The holder acknowledges every pending notice on one tag; the acknowledgement is an event in that tag's history. */
export async function acknowledgeNotices(sequelize: Sequelize, actor: AuthUser, tagId: number, idem: Idempotency | null): Promise<number> {
  const { tagId: id } = await once(actor, idem, () => sequelize.transaction(async (transaction) => {
    const tag = await Tag.findOne({ where: { id: tagId, organisationId: actor.organisationId }, transaction });
    if (!tag) throw notFound('Tag');
    const notices = await TagNotice.findAll({ where: { tagId, userId: actor.id, acknowledgedAt: { [Op.is]: null } }, transaction, lock: transaction.LOCK.UPDATE });
    if (!notices.length) throw new HttpError(409, 'nothing-to-acknowledge', 'You have nothing to acknowledge on this tag.');
    const now = clock.now();
    for (const n of notices) await n.update({ acknowledgedAt: now }, { transaction });
    await appendEvent(tag, 'acknowledged', actor, { notices: notices.map((n) => ({ id: n.id, kind: n.kind, by: n.byId })) }, transaction, idem);
    return tag.id;
  }));
  return id;
}
