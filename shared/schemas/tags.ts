import * as yup from 'yup';
import { ENERGY_SOURCES } from '@/shared/rules/register';
import { ISOLATION_METHODS, MIN_CLEARANCE_REASON, MIN_RAISE_REASON, RELEASE_CHECKS, TAG_KINDS } from '@/shared/rules/tags';

const reasonText = (min: number, what: string) =>
  yup.string().trim().required(`State the reason for ${what}.`).min(min, `At least ${min} characters: say what and why.`).max(2000);

export const tagPointSchema = yup.object({
  assetId: yup.number().integer().positive().nullable().default(null),
  description: yup.string().trim().max(300).default(''),
  method: yup.string().oneOf([...ISOLATION_METHODS], 'Choose how this point is isolated.').required('Choose how this point is isolated.'),
}).test('point-named', 'Choose a plant item or describe the isolation point.', (p) => !!p && (!!p.assetId || !!p.description));

/** Raising a tag. The author is never part of the input: the server sets it from the session. */
export const raiseTagSchema = yup.object({
  kind: yup.string().oneOf([...TAG_KINDS], 'Choose isolation or override.').required('Choose isolation or override.'),
  reason: reasonText(MIN_RAISE_REASON, 'this tag'),
  expiresAt: yup.date().typeError('Give a valid expiry date and time.').required('Give an expiry.'),
  contactPhone: yup.string().trim().max(40).default(''),
  lockNumber: yup.string().trim().max(60).default(''),
  energySources: yup.array(yup.string().oneOf([...ENERGY_SOURCES]).required()).default([])
    .when('kind', { is: 'isolation', then: (s) => s.min(1, 'Choose at least one energy source that is isolated.') }),
  points: yup.array(tagPointSchema).default([])
    .when('kind', { is: 'isolation', then: (s) => s.min(1, 'Add at least one isolation point and its method.') }),
  normalState: yup.string().trim().max(300).default('')
    .when('kind', { is: 'override', then: (s) => s.required('Say what the normal state is.') }),
  leftState: yup.string().trim().max(300).default('')
    .when('kind', { is: 'override', then: (s) => s.required('Say the state it was left in.') }),
});
export type RaiseTagInput = yup.InferType<typeof raiseTagSchema>;

const releaseChecks = yup.object({
  workComplete: yup.boolean().default(false),
  guardsRefitted: yup.boolean().default(false),
  personnelClear: yup.boolean().default(false),
  testedSafe: yup.boolean().default(false),
});
// Keep the schema's keys and the shared list of release checks in step.
void (RELEASE_CHECKS satisfies readonly (keyof yup.InferType<typeof releaseChecks>)[]);

export const clearTagSchema = yup.object({
  reason: reasonText(MIN_CLEARANCE_REASON, 'clearing this tag'),
  checks: releaseChecks,
});
export type ClearTagInput = yup.InferType<typeof clearTagSchema>;

export const clearInAbsenceSchema = yup.object({
  reason: reasonText(MIN_CLEARANCE_REASON, 'clearing this tag'),
  authorNotOnSite: yup.boolean().oneOf([true], 'Confirm that the holder is not on site.').required('Confirm that the holder is not on site.'),
  contactAttempts: yup.string().trim().required('Record the attempts made to reach the holder.').min(MIN_CLEARANCE_REASON, `At least ${MIN_CLEARANCE_REASON} characters: who tried, how and when.`).max(2000),
  checks: releaseChecks,
});
export type ClearInAbsenceInput = yup.InferType<typeof clearInAbsenceSchema>;

export const extendTagSchema = yup.object({
  expiresAt: yup.date().typeError('Give a valid expiry date and time.').required('Give the new expiry.'),
  reason: reasonText(MIN_RAISE_REASON, 'extending'),
});
export type ExtendTagInput = yup.InferType<typeof extendTagSchema>;

export const handoverSchema = yup.object({
  note: yup.string().trim().max(2000).default(''),
  contactPhone: yup.string().trim().max(40).default(''),
  lockNumber: yup.string().trim().max(60).default(''),
});
export type HandoverInput = yup.InferType<typeof handoverSchema>;

export const tagNoteSchema = yup.object({
  text: yup.string().trim().required('Write the note.').max(2000),
});
