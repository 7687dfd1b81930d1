import * as yup from 'yup';
import { idField, oneOfField, pagingQuery } from '@/shared/schemas/request';
import { RELEASE_CHECKS } from '@/shared/rules/tags';
import { VISIT_DECISION_ACTIONS } from '@/shared/rules/visits';

export const startVisitSchema = yup.object({
  purpose: yup.string().trim().required('Say what you came to do.').min(3, 'At least 3 characters.').max(2000),
  jobReference: yup.string().trim().max(80).default(''),
});
export type StartVisitInput = yup.InferType<typeof startVisitSchema>;

const visitDecisionSchema = yup.object({
  tagId: yup.number().integer().positive().required(),
  action: yup.string().oneOf([...VISIT_DECISION_ACTIONS], 'Choose leave, hand-over or clear.').required('Choose leave, hand-over or clear.'),
  note: yup.string().trim().max(2000).default(''),
  /** Leave only: a new expiry for the tag left in place; omitted keeps the one it has. */
  expiresAt: yup.date().typeError('Give a valid expiry date and time.').nullable().default(null),
  /** Hand-over only: the colleague offered the tag; without one the decision is recorded as a note on the tag. */
  toUserId: yup.number().integer().positive().nullable().default(null),
  /** Clear only, for an isolation: the release checks (OSHA 29 CFR 1910.147(e)(1)–(e)(2)). */
  checks: yup.object(Object.fromEntries(RELEASE_CHECKS.map((k) => [k, yup.boolean().default(false)]))).default({}),
});
export type VisitDecisionInput = yup.InferType<typeof visitDecisionSchema>;

export const endVisitSchema = yup.object({
  decisions: yup.array(visitDecisionSchema).default([]).max(500),
  note: yup.string().trim().max(2000).default(''),
});
export type EndVisitInput = yup.InferType<typeof endVisitSchema>;

/** `?userId=&from=&to=&open=` on a site's visits, with the paging of every list. */
export const visitFiltersQuery = pagingQuery.shape({
  userId: idField('userId'),
  from: yup.date().typeError('from must be a date, e.g. 2026-03-01.'),
  to: yup.date().typeError('to must be a date, e.g. 2026-03-31.'),
  open: oneOfField('open', ['true', 'false'] as const),
});
export type VisitFiltersQuery = yup.InferType<typeof visitFiltersQuery>;
