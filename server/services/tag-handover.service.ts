/** Moving a live tag to another holder: offer, withdraw and accept between two people present, or reassignment in the holder's absence. */
import type { Sequelize, Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { requireTagRules } from '@/server/lib/tag-rules';
import { HttpError, forbidden, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import type { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { appendEvent, type Idempotency } from '@/server/services/tag-history.service';
import { createNotice, requireNoPendingNotices } from '@/server/services/tag-notices.service';
import { actOnTag } from '@/server/services/tag-actions.service';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { handoverRole, offerIsOpen, offerLapsesAt } from '@/shared/rules/tag-handover';
import { may, mayReassignInAbsence } from '@/shared/rules/permissions';
import { handoverAcceptSchema, reassignInAbsenceSchema, type HandoverAcceptInput, type HandoverOfferInput, type ReassignInAbsenceInput } from '@/shared/schemas/tags';
import type { Tag as TagDto } from '@/shared/types/tags';

const offerOf = (tag: Tag) => ({ toUserId: tag.offerToId ?? null, lapsesAt: tag.offerLapsesAt ?? null });
const person = (u: { id: number; name: string }) => ({ id: u.id, name: u.name });

async function holderOf(tag: Tag, transaction: Transaction) {
  const holder = await User.findByPk(tag.holderId, { transaction });
  return { id: tag.holderId, name: holder?.name ?? 'Unknown' };
}

/** 403 for anyone but the holder and the named colleague, naming the holder (OSHA 29 CFR 1910.147(f)(4)). */
async function refuseOthers(tag: Tag, transaction: Transaction): Promise<never> {
  const holder = await holderOf(tag, transaction);
  throw forbidden(`This tag is held by ${holder.name}. Only ${holder.name} can offer it to a colleague, and only the colleague they name can accept it.`);
}

/** A colleague who can hold a tag: same organisation, active, signed up, not a viewer. */
async function colleague(actor: AuthUser, id: number, field: string, transaction: Transaction) {
  const user = await User.findOne({ where: { id, organisationId: actor.organisationId, active: true }, transaction });
  if (!user || !may(user, 'holdTags') || !user.passwordHash) throw unprocessable('Choose a colleague who can hold tags.', { [field]: 'Choose an engineer, supervisor or admin in your organisation.' });
  return user;
}

/** The holder offers the tag to a named colleague; the offer lapses after HANDOVER_OFFER_MINUTES unanswered. */
export function offerHandover(sequelize: Sequelize, actor: AuthUser, id: number, input: HandoverOfferInput, idem: Idempotency | null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    const now = clock.now();
    if (handoverRole(actor, { ...tag.get(), ...offerOf(tag) }, now) !== 'holder') await refuseOthers(tag, transaction);
    if (input.toUserId === actor.id) throw unprocessable('You already hold this tag.', { toUserId: 'Choose a colleague, not yourself.' });
    if (offerIsOpen(offerOf(tag), now)) throw new HttpError(409, 'offer-open', 'This tag is already offered to a colleague. Withdraw that offer first.');
    const to = await colleague(actor, input.toUserId, 'toUserId', transaction);
    const lapsesAt = offerLapsesAt(now);
    await tag.update({ offerToId: to.id, offerNote: input.note, offeredAt: now, offerLapsesAt: lapsesAt }, { transaction });
    await appendEvent(tag, 'handover-offered', actor, { to: person(to), note: input.note, lapsesAt: lapsesAt.toISOString() }, transaction, idem);
  });
}

/** The holder withdraws an open offer. */
export function withdrawHandover(sequelize: Sequelize, actor: AuthUser, id: number, idem: Idempotency | null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    const now = clock.now();
    if (handoverRole(actor, { ...tag.get(), ...offerOf(tag) }, now) !== 'holder') await refuseOthers(tag, transaction);
    if (!offerIsOpen(offerOf(tag), now)) throw new HttpError(409, 'no-open-offer', 'There is no open hand-over offer on this tag.');
    const to = await User.findByPk(tag.offerToId!, { transaction });
    await tag.update({ offerToId: null, offerNote: null, offeredAt: null, offerLapsesAt: null }, { transaction });
    await appendEvent(tag, 'handover-withdrawn', actor, { to: to ? person(to) : null }, transaction, idem);
  });
}

/**
 * The named colleague accepts: in one transaction the holder changes and the new lock number replaces the old,
 * both people recorded, so there is no moment without a holder; their lock goes on before the old one comes off
 * (OSHA 29 CFR 1910.147(f)(4)).
 */
export function acceptHandover(sequelize: Sequelize, actor: AuthUser, id: number, input: HandoverAcceptInput, idem: Idempotency | null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    const now = clock.now();
    const role = handoverRole(actor, { ...tag.get(), ...offerOf(tag) }, now);
    if (role === 'holder') throw new HttpError(409, 'already-holder', 'You already hold this tag.');
    if (role !== 'offered') {
      if (tag.offerToId === actor.id) throw new HttpError(409, 'offer-lapsed', 'This hand-over offer has lapsed. Ask the holder to offer it again while you are both there.');
      await refuseOthers(tag, transaction);
    }
    await requireTagRules(handoverAcceptSchema, input, { kind: tag.kind }, 'Give the number of the lock you have just put on.');
    await requireNoPendingNotices(actor, transaction);
    const from = await holderOf(tag, transaction);
    const fromLockNumber = tag.lockNumber;
    const note = tag.offerNote ?? '';
    const offeredAt = tag.offeredAt?.toISOString() ?? null;
    await tag.update({
      holderId: actor.id, lockNumber: tag.kind === 'isolation' ? input.lockNumber : tag.lockNumber, contactPhone: input.contactPhone || tag.contactPhone,
      offerToId: null, offerNote: null, offeredAt: null, offerLapsesAt: null,
    }, { transaction });
    await appendEvent(tag, 'handed-over', actor, {
      from, to: person(actor), note, offeredAt, fromLockNumber, lockNumber: tag.lockNumber,
    }, transaction, idem);
    await enqueueTagMail('handed-over', tag, actor, transaction, { previousHolderId: from.id, note });
  });
}

/**
 * A supervisor or admin moves a tag whose holder cannot be reached to a named colleague, only with the evidence of
 * a clearance in absence (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)); the holder is told and must acknowledge.
 */
export function reassignInAbsence(sequelize: Sequelize, actor: AuthUser, id: number, input: ReassignInAbsenceInput, idem: Idempotency | null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    if (!mayReassignInAbsence(actor, tag)) {
      if (actor.id === tag.holderId) throw new HttpError(409, 'own-tag', 'This is your own tag: offer it to a colleague instead.');
      throw forbidden(`This tag is held by ${(await holderOf(tag, transaction)).name}. Only a supervisor or admin can reassign it in the holder’s absence.`);
    }
    await requireNoPendingNotices(actor, transaction);
    if (input.toUserId === tag.holderId) throw unprocessable('Choose someone other than the absent holder.', { toUserId: 'Choose someone other than the absent holder.' });
    await requireTagRules(reassignInAbsenceSchema, input, { kind: tag.kind }, 'Give the number of the new holder’s lock, put on before the absent holder’s lock is removed.');
    const to = await colleague(actor, input.toUserId, 'toUserId', transaction);
    const from = await holderOf(tag, transaction);
    const fromLockNumber = tag.lockNumber;
    await tag.update({
      holderId: to.id, lockNumber: tag.kind === 'isolation' ? input.lockNumber : tag.lockNumber,
      offerToId: null, offerNote: null, offeredAt: null, offerLapsesAt: null,
    }, { transaction });
    await appendEvent(tag, 'reassigned-in-absence', actor, {
      reason: input.reason, holderNotOnSite: input.holderNotOnSite, contactAttempts: input.contactAttempts,
      from, to: person(to), fromLockNumber, lockNumber: tag.lockNumber, holderId: from.id, holderToBeInformed: true,
    }, transaction, idem);
    await createNotice(tag, from.id, 'reassigned-in-absence', actor, input.reason, transaction);
    await enqueueTagMail('reassigned-in-absence', tag, actor, transaction, { reason: input.reason, previousHolderId: from.id });
  });
}
