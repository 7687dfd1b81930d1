import type { Sequelize } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError, forbidden, unprocessable } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { User } from '@/server/models/user.model';
import { appendEvent, getTag, lockTag, requireLive } from '@/server/services/tags.service';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { clearancePermission, expiryProblem, mayExtend, mayTakeOver } from '@/shared/rules/tags';
import type { ClearInAbsenceInput, ClearTagInput, ExtendTagInput, HandoverInput } from '@/shared/schemas/tags';
import type { Tag as TagDto } from '@/shared/types/tags';

const releaseChecksMissing = (checks: ClearTagInput['checks']) => Object.entries(checks).filter(([, v]) => !v).map(([k]) => k);

/**
 * Clears a tag by its holder. An isolation also needs every release check ticked (OSHA 29 CFR 1910.147(e)(1)–(e)(2)).
 * The row is locked, so of two simultaneous clearances one succeeds and the other finds it cleared (409).
 */
export async function clearTag(sequelize: Sequelize, actor: AuthUser, id: number, input: ClearTagInput): Promise<TagDto> {
  await sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    const permission = clearancePermission(actor, tag);
    if (permission === 'in-absence') throw forbidden('Only the holder can clear this tag. As a supervisor you can use clearance in absence.');
    if (permission !== 'own') throw forbidden('Only the person who holds this tag can clear it.');
    if (tag.kind === 'isolation') {
      const missing = releaseChecksMissing(input.checks);
      if (missing.length) throw unprocessable('Confirm every release check before clearing an isolation.', Object.fromEntries(missing.map((k) => [`checks.${k}`, 'Confirm this before clearing.'])));
    }
    const now = clock.now();
    await tag.update({ status: 'cleared', clearedAt: now, clearedById: actor.id, clearance: 'normal', checks: input.checks }, { transaction });
    await appendEvent(tag, 'cleared', actor, { reason: input.reason, checks: input.checks }, transaction);
    await enqueueTagMail('cleared', tag, actor, transaction, { reason: input.reason });
  });
  return getTag(actor, id);
}

/**
 * Removal in the holder's absence (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)): a supervisor records that the holder is
 * not on site and the attempts made to reach them; the holder is to be told before they resume work.
 */
export async function clearInAbsence(sequelize: Sequelize, actor: AuthUser, id: number, input: ClearInAbsenceInput): Promise<TagDto> {
  await sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    const permission = clearancePermission(actor, tag);
    if (permission === 'own') throw new HttpError(409, 'own-tag', 'This is your own tag: clear it normally.');
    if (permission !== 'in-absence') throw forbidden('Only a supervisor can clear a tag in the holder’s absence.');
    if (tag.kind === 'isolation') {
      const missing = releaseChecksMissing(input.checks);
      if (missing.length) throw unprocessable('Confirm every release check before clearing an isolation.', Object.fromEntries(missing.map((k) => [`checks.${k}`, 'Confirm this before clearing.'])));
    }
    const now = clock.now();
    await tag.update({ status: 'cleared', clearedAt: now, clearedById: actor.id, clearance: 'in-absence', checks: input.checks }, { transaction });
    await appendEvent(tag, 'cleared-in-absence', actor, {
      reason: input.reason,
      authorNotOnSite: input.authorNotOnSite,
      contactAttempts: input.contactAttempts,
      checks: input.checks,
      holderId: tag.holderId,
      holderToBeInformed: true,
    }, transaction);
    await enqueueTagMail('cleared-in-absence', tag, actor, transaction, { reason: input.reason });
  });
  return getTag(actor, id);
}

export async function extendTag(sequelize: Sequelize, actor: AuthUser, id: number, input: ExtendTagInput): Promise<TagDto> {
  await sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    if (!mayExtend(actor, tag)) throw forbidden('Only the holder or a supervisor can extend this tag.');
    const expiresAt = new Date(input.expiresAt);
    const problem = expiryProblem(expiresAt, clock.now(), actor.role);
    if (problem) throw unprocessable('Check the new expiry.', { expiresAt: problem });
    const previous = tag.expiresAt.toISOString();
    await tag.update({ expiresAt }, { transaction });
    await appendEvent(tag, 'extended', actor, { reason: input.reason, from: previous, to: expiresAt.toISOString() }, transaction);
  });
  return getTag(actor, id);
}

/**
 * The on-coming person takes the tag over in one transaction: the holder changes and both names are recorded,
 * so there is no moment without a holder (OSHA 29 CFR 1910.147(f)(4)).
 */
export async function handOverTag(sequelize: Sequelize, actor: AuthUser, id: number, input: HandoverInput): Promise<TagDto> {
  await sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    if (!mayTakeOver(actor, tag)) {
      throw actor.id === tag.holderId ? new HttpError(409, 'already-holder', 'You already hold this tag.') : forbidden('Viewers cannot take over tags.');
    }
    const from = await User.findByPk(tag.holderId, { transaction });
    await tag.update({ holderId: actor.id, contactPhone: input.contactPhone || tag.contactPhone, lockNumber: input.lockNumber || tag.lockNumber }, { transaction });
    await appendEvent(tag, 'handed-over', actor, {
      from: { id: from?.id ?? tag.holderId, name: from?.name ?? 'Unknown' },
      to: { id: actor.id, name: actor.name },
      note: input.note,
      lockNumber: tag.lockNumber,
    }, transaction);
    await enqueueTagMail('handed-over', tag, actor, transaction, { previousHolderId: from?.id, note: input.note });
  });
  return getTag(actor, id);
}

/** Anyone who can see the tag except a viewer may add a note while it is live. */
export async function addTagNote(sequelize: Sequelize, actor: AuthUser, id: number, text: string): Promise<TagDto> {
  await sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    if (actor.role === 'viewer') throw forbidden('Viewers cannot add notes.');
    await appendEvent(tag, 'note-added', actor, { text }, transaction);
  });
  return getTag(actor, id);
}
