import * as yup from 'yup';
import { ENERGY_SOURCES, ENERGY_SOURCE_LABELS, type EnergySource } from '@/shared/rules/register';
import type { Role } from '@/shared/rules/roles';
import { ISOLATION_METHODS, MIN_CLEARANCE_REASON, MIN_RAISE_REASON, RELEASE_CHECKS, TAG_KINDS, expiryProblem, type TagKind } from '@/shared/rules/tags';
import { MIN_OMISSION_REASON, PROOF_METHODS, PROOF_NEEDS_INSTRUMENT, sourcesNotAccounted, type OmittedSource, type ProofMethod } from '@/shared/rules/tag-isolation';

/**
 * What the rules below may depend on besides the body, passed as yup context (`schema.validate(body, { context })`):
 * the kind of the tag acted on, the actor's role and the time now (the server's clock on the server), the tag's
 * current expiry, the energy sources recorded on the item. A rule whose context is not given is not applied.
 */
export interface TagRuleContext {
  kind?: TagKind;
  role?: Role;
  now?: Date;
  currentExpiry?: string;
  itemSources?: readonly EnergySource[];
}
const ruleContext = (ctx: yup.TestContext) => (ctx.options.context ?? {}) as TagRuleContext;

/** An expiry in the future and within what the actor's role may set. */
const expiryField = (required: string) => yup.date().typeError('Give a valid expiry date and time.').required(required)
  .test('expiry-limit', 'Check the expiry.', function (value) {
    const { role, now } = ruleContext(this);
    const problem = role && value ? expiryProblem(value, now ?? new Date(), role) : null;
    return problem ? this.createError({ message: problem }) : true;
  });

/** Only for an isolation: a field that must be given (a lock number) or a check that must be confirmed. */
const forIsolation = <S extends yup.AnySchema>(schema: S, then: (s: S) => S): S => schema.when('$kind', { is: 'isolation', then }) as S;

const reasonText = (min: number, what: string) =>
  yup.string().trim().required(`State the reason for ${what}.`).min(min, `At least ${min} characters: say what and why.`).max(2000);

const tagPointSchema = yup.object({
  assetId: yup.number().integer().positive().nullable().default(null),
  description: yup.string().trim().max(300).default(''),
  method: yup.string().oneOf([...ISOLATION_METHODS], 'Choose how this point is isolated.').required('Choose how this point is isolated.'),
  /** The lock or tag number on this point, when it differs from the tag's own lock (a lock box, a hasp). */
  lockNumber: yup.string().trim().max(60).default(''),
}).test('point-named', 'Choose a plant item or describe the isolation point.', (p) => !!p && (!!p.assetId || !!p.description));

const lockNumberText = () => yup.string().trim().max(60, 'At most 60 characters.');

/** How the isolation was proved; who and when come from the session and the server's clock. */
export const proofSchema = yup.object({
  method: yup.string().oneOf([...PROOF_METHODS], 'Choose how the isolation was proved.').required('Choose how the isolation was proved.'),
  instrument: yup.string().trim().max(120).default('')
    .when('method', { is: (m: ProofMethod) => PROOF_NEEDS_INSTRUMENT.includes(m), then: (s) => s.required('Name the tester or gauge used.') }),
  reading: yup.string().trim().max(60).default(''),
  note: yup.string().trim().max(500).default('')
    .when('method', { is: 'other', then: (s) => s.required('Describe how the isolation was proved.') }),
});
export type ProofInput = yup.InferType<typeof proofSchema>;

const omittedSourceSchema = yup.object({
  source: yup.string().oneOf([...ENERGY_SOURCES], 'Choose the energy source.').required('Choose the energy source.'),
  reason: yup.string().trim().required('Say why this source needs no isolation.')
    .min(MIN_OMISSION_REASON, `At least ${MIN_OMISSION_REASON} characters: say why this source is safe without isolation.`).max(500),
});

/** Raising a tag. The holder is never part of the input: the server sets it from the session. */
export const raiseTagSchema = yup.object({
  kind: yup.string().oneOf([...TAG_KINDS], 'Choose isolation or override.').required('Choose isolation or override.'),
  reason: reasonText(MIN_RAISE_REASON, 'this tag'),
  expiresAt: expiryField('Give an expiry.'),
  contactPhone: yup.string().trim().max(40).default(''),
  lockNumber: lockNumberText().default('')
    .when('kind', { is: 'isolation', then: (s) => s.required('Give the number of your personal lock.') }),
  energySources: yup.array(yup.string().oneOf([...ENERGY_SOURCES]).required()).default([])
    .when('kind', { is: 'isolation', then: (s) => s.min(1, 'Choose at least one energy source that is isolated.') })
    // OSHA 29 CFR 1910.147(d)(3)–(d)(4): every source recorded on the item is isolated or left out with a reason.
    .test('every-source', 'Isolate each energy source, or say why it needs no isolation.', function (isolated) {
      const { itemSources } = ruleContext(this);
      const parent = this.parent as { kind?: string; omittedSources?: OmittedSource[] };
      if (parent.kind !== 'isolation' || !itemSources || !isolated?.length) return true;
      const missing = sourcesNotAccounted(itemSources, isolated as EnergySource[], parent.omittedSources ?? []);
      if (!missing.length) return true;
      return this.createError({ message: `Not accounted for: ${missing.map((m) => ENERGY_SOURCE_LABELS[m]).join(', ')}. Isolate each one, or say why it needs no isolation.` });
    }),
  omittedSources: yup.array(omittedSourceSchema).default([]),
  proof: proofSchema.nullable().default(null),
  points: yup.array(tagPointSchema).default([])
    .when('kind', { is: 'isolation', then: (s) => s.min(1, 'Add at least one isolation point and its method.') }),
  normalState: yup.string().trim().max(300).default('')
    .when('kind', { is: 'override', then: (s) => s.required('Say what the normal state is.') }),
  leftState: yup.string().trim().max(300).default('')
    .when('kind', { is: 'override', then: (s) => s.required('Say the state it was left in.') }),
});
export type RaiseTagInput = yup.InferType<typeof raiseTagSchema>;

// OSHA 29 CFR 1910.147(e)(1)–(e)(2): an isolation comes off only once each release check is confirmed.
const releaseCheck = () => forIsolation(yup.boolean().default(false), (s) => s.oneOf([true], 'Confirm this before clearing.'));
const releaseChecks = yup.object({
  workComplete: releaseCheck(),
  guardsRefitted: releaseCheck(),
  personnelClear: releaseCheck(),
  testedSafe: releaseCheck(),
});
// Keep the schema's keys and the shared list of release checks in step.
void (RELEASE_CHECKS satisfies readonly (keyof yup.InferType<typeof releaseChecks>)[]);

export const clearTagSchema = yup.object({
  reason: reasonText(MIN_CLEARANCE_REASON, 'clearing this tag'),
  checks: releaseChecks,
});
export type ClearTagInput = yup.InferType<typeof clearTagSchema>;

/** OSHA 29 CFR 1910.147(e)(3)(i)–(ii): the holder is verified not on site and reasonable efforts were made to reach them. */
const absenceEvidence = {
  holderNotOnSite: yup.boolean().oneOf([true], 'Confirm that the holder is not on site.').required('Confirm that the holder is not on site.'),
  contactAttempts: yup.string().trim().required('Record the attempts made to reach the holder.').min(MIN_CLEARANCE_REASON, `At least ${MIN_CLEARANCE_REASON} characters: who tried, how and when.`).max(2000),
};

export const clearInAbsenceSchema = yup.object({
  reason: reasonText(MIN_CLEARANCE_REASON, 'clearing this tag'),
  ...absenceEvidence,
  checks: releaseChecks,
});
export type ClearInAbsenceInput = yup.InferType<typeof clearInAbsenceSchema>;

/** A supervisor moves a tag whose holder cannot be reached to a named colleague, with the same evidence. */
export const reassignInAbsenceSchema = yup.object({
  reason: reasonText(MIN_CLEARANCE_REASON, 'reassigning this tag'),
  ...absenceEvidence,
  toUserId: yup.number().typeError('Choose the colleague who takes the tag.').integer().positive().required('Choose the colleague who takes the tag.'),
  lockNumber: forIsolation(lockNumberText().default(''), (s) => s.required('The new holder’s lock number.')),
});
export type ReassignInAbsenceInput = yup.InferType<typeof reassignInAbsenceSchema>;

export const extendTagSchema = yup.object({
  expiresAt: expiryField('Give the new expiry.')
    .test('changed', 'Choose a new expiry.', function (value) {
      const { currentExpiry } = ruleContext(this);
      return !currentExpiry || !value || value.getTime() !== Date.parse(currentExpiry);
    }),
  reason: reasonText(MIN_RAISE_REASON, 'extending'),
});
export type ExtendTagInput = yup.InferType<typeof extendTagSchema>;

/** The holder offers the tag to a named colleague. */
export const handoverOfferSchema = yup.object({
  toUserId: yup.number().typeError('Choose the colleague who takes the tag.').integer().positive().required('Choose the colleague who takes the tag.'),
  note: yup.string().trim().max(2000).default(''),
});
export type HandoverOfferInput = yup.InferType<typeof handoverOfferSchema>;

/** The named colleague accepts with the number of the lock they have just put on (before the old one comes off). */
export const handoverAcceptSchema = yup.object({
  lockNumber: forIsolation(lockNumberText().default(''), (s) => s.required('Put your own lock on first, then give its number.')),
  contactPhone: yup.string().trim().max(40).default(''),
});
export type HandoverAcceptInput = yup.InferType<typeof handoverAcceptSchema>;

export const tagNoteSchema = yup.object({
  text: yup.string().trim().required('Write the note.').max(2000),
});
