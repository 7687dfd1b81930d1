/** Actions on one live tag by its holder or a supervisor: prove, clear, clear in absence, extend, notes, photos. Hand-over: tag-handover.service.ts. */
import type { Sequelize, Transaction } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { requireTagRules } from '@/server/lib/tag-rules';
import { HttpError, forbidden, notFound } from '@/server/lib/http-error';
import { ensurePermission, type AuthUser } from '@/server/middleware/auth';
import type { PhotoStorage } from '@/server/lib/photo-storage';
import { Tag } from '@/server/models/tag.model';
import { TagProof } from '@/server/models/tag-proof.model';
import { storePhoto } from '@/server/services/photos.service';
import { appendEvent, once, type Idempotency } from '@/server/services/tag-history.service';
import { createNotice, requireNoPendingNotices } from '@/server/services/tag-notices.service';
import { getTag } from '@/server/services/tags.service';
import { enqueueTagMail } from '@/server/mail/tag-mail';
import { clearancePermission, mayExtend } from '@/shared/rules/permissions';
import { clearInAbsenceSchema, clearTagSchema, extendTagSchema, type ClearInAbsenceInput, type ClearTagInput, type ExtendTagInput, type ProofInput } from '@/shared/schemas/tags';
import type { Tag as TagDto } from '@/shared/types/tags';

/** Locks the tag row for the rest of the transaction; another organisation's tag is a 404. */
async function lockTag(actor: AuthUser, id: number, transaction: Transaction): Promise<Tag> {
  const tag = await Tag.findOne({ where: { id, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!tag) throw notFound('Tag');
  return tag;
}

/** One action on one locked, live tag, once per Idempotency-Key; answers with the tag as it now is. */
export async function actOnTag(sequelize: Sequelize, actor: AuthUser, id: number, idem: Idempotency | null, run: (tag: Tag, transaction: Transaction) => Promise<void>): Promise<TagDto> {
  await once(actor, idem, () => sequelize.transaction(async (transaction) => {
    const tag = await lockTag(actor, id, transaction);
    requireLive(tag);
    await run(tag, transaction);
    return tag.id;
  }));
  return getTag(actor, id);
}

function requireLive(tag: Tag) {
  if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has already been cleared.');
}

/** Records a proof of an isolation (OSHA 29 CFR 1910.147(d)(6)) with its event, inside the caller's transaction. */
export async function recordProof(tag: Tag, actor: AuthUser, proof: ProofInput, transaction: Transaction, idem: Idempotency | null = null) {
  const row = await TagProof.create(
    { tagId: tag.id, organisationId: tag.organisationId, method: proof.method, instrument: proof.instrument, reading: proof.reading, note: proof.note, byId: actor.id, at: clock.now() },
    { transaction },
  );
  await appendEvent(tag, 'proved', actor, { proofId: row.id, method: proof.method, instrument: proof.instrument, reading: proof.reading, note: proof.note }, transaction, idem);
}

// The release checks an isolation needs are the clearance schema's rule for `kind: 'isolation'` (shared/schemas/tags.ts).
const requireReleaseChecks = (schema: typeof clearTagSchema | typeof clearInAbsenceSchema, tag: Tag, input: ClearTagInput) =>
  requireTagRules(schema, input, { kind: tag.kind }, 'Confirm every release check before clearing an isolation.');

/**
 * Clears a tag by its holder. An isolation also needs every release check ticked (OSHA 29 CFR 1910.147(e)(1)–(e)(2)).
 * The row is locked, so of two simultaneous clearances one succeeds and the other finds it cleared (409).
 */
export async function clearTag(sequelize: Sequelize, actor: AuthUser, id: number, input: ClearTagInput, idem: Idempotency | null = null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    const permission = clearancePermission(actor, tag);
    if (permission === 'in-absence') throw forbidden('Only the holder can clear this tag. As a supervisor you can use clearance in absence.');
    if (permission !== 'own') throw forbidden('Only the person who holds this tag can clear it.');
    await requireNoPendingNotices(actor, transaction);
    await requireReleaseChecks(clearTagSchema, tag, input);
    await tag.update({ status: 'cleared', clearedAt: clock.now(), clearedById: actor.id, clearance: 'normal', checks: input.checks, offerToId: null, offerLapsesAt: null }, { transaction });
    await appendEvent(tag, 'cleared', actor, { reason: input.reason, checks: input.checks }, transaction, idem);
    await enqueueTagMail('cleared', tag, actor, transaction, { reason: input.reason });
  });
}

/**
 * Removal in the holder's absence (OSHA 29 CFR 1910.147(e)(3)(i)–(iii)): a supervisor records that the holder is
 * not on site and the attempts made to reach them; the holder is told by e-mail and in the app, and must
 * acknowledge it before they raise, clear, extend or take over any tag.
 */
export async function clearInAbsence(sequelize: Sequelize, actor: AuthUser, id: number, input: ClearInAbsenceInput, idem: Idempotency | null = null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    const permission = clearancePermission(actor, tag);
    if (permission === 'own') throw new HttpError(409, 'own-tag', 'This is your own tag: clear it normally.');
    if (permission !== 'in-absence') throw forbidden('Only a supervisor can clear a tag in the holder’s absence.');
    await requireNoPendingNotices(actor, transaction);
    await requireReleaseChecks(clearInAbsenceSchema, tag, input);
    await tag.update({ status: 'cleared', clearedAt: clock.now(), clearedById: actor.id, clearance: 'in-absence', checks: input.checks, offerToId: null, offerLapsesAt: null }, { transaction });
    await appendEvent(tag, 'cleared-in-absence', actor, {
      reason: input.reason,
      holderNotOnSite: input.holderNotOnSite,
      contactAttempts: input.contactAttempts,
      checks: input.checks,
      holderId: tag.holderId,
      holderToBeInformed: true,
    }, transaction, idem);
    await createNotice(tag, tag.holderId, 'cleared-in-absence', actor, input.reason, transaction);
    await enqueueTagMail('cleared-in-absence', tag, actor, transaction, { reason: input.reason });
  });
}

export async function extendTag(sequelize: Sequelize, actor: AuthUser, id: number, input: ExtendTagInput, idem: Idempotency | null = null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    if (!mayExtend(actor, tag)) throw forbidden('Only the holder or a supervisor can extend this tag.');
    await requireNoPendingNotices(actor, transaction);
    const expiresAt = new Date(input.expiresAt);
    await requireTagRules(extendTagSchema, input, { role: actor.role, now: clock.now() }, 'Check the new expiry.');
    const previous = tag.expiresAt.toISOString();
    await tag.update({ expiresAt }, { transaction });
    await appendEvent(tag, 'extended', actor, { reason: input.reason, from: previous, to: expiresAt.toISOString() }, transaction, idem);
  });
}

/** Anyone who can see the tag except a viewer may add a note while it is live. */
export async function addTagNote(sequelize: Sequelize, actor: AuthUser, id: number, text: string, idem: Idempotency | null = null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    ensurePermission(actor, 'annotateTag', 'Viewers cannot add notes.');
    await appendEvent(tag, 'note-added', actor, { text }, transaction, idem);
  });
}

/**
 * The holder records how they proved the isolation before work (OSHA 29 CFR 1910.147(d)(6); HSE HSG253): the
 * tag, its item and the board show "not proved" until then.
 */
export async function proveTag(sequelize: Sequelize, actor: AuthUser, id: number, input: ProofInput, idem: Idempotency | null = null): Promise<TagDto> {
  return actOnTag(sequelize, actor, id, idem, async (tag, transaction) => {
    if (tag.kind !== 'isolation') throw new HttpError(409, 'not-an-isolation', 'Only an isolation is proved; an override records its normal and left states instead.');
    if (actor.id !== tag.holderId) throw forbidden('Only the person who holds this isolation can record that they proved it.');
    await recordProof(tag, actor, input, transaction, idem);
  });
}

/** Adds a photo of the lock or tag in place to a live tag, and records it in the tag's history. */
export async function addTagPhoto(sequelize: Sequelize, storage: PhotoStorage, actor: AuthUser, id: number, file: Buffer, caption: string | null, idem: Idempotency | null = null): Promise<TagDto> {
  ensurePermission(actor, 'annotateTag', 'Viewers cannot add photos.');
  await once(actor, idem, async () => {
    const tag = await Tag.findOne({ where: { id, organisationId: actor.organisationId } });
    if (!tag) throw notFound('Tag');
    if (tag.status !== 'live') throw new HttpError(409, 'already-cleared', 'This tag has been cleared; it takes no new photos.');
    await sequelize.transaction(async (transaction) => {
      const photo = await storePhoto(storage, { organisationId: actor.organisationId, tagId: tag.id, createdBy: actor.id, caption }, file, transaction);
      await appendEvent(tag, 'photo-added', actor, { photoId: photo.id, caption }, transaction, idem);
    });
    return tag.id;
  });
  return getTag(actor, id);
}
