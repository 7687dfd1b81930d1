import * as yup from 'yup';

const text = (what: string) => yup.string().trim().required(what).min(4, 'At least 4 characters; write "None found" if there were none.').max(4000);

/**
 * A periodic review of a site's isolation procedure (OSHA 29 CFR 1910.147(c)(6)): the reviewer is the signed-in
 * supervisor or admin; they observe engineers using the procedure, record deviations and corrections, and sign off.
 */
export const procedureReviewSchema = yup.object({
  reviewedOn: yup.string().trim().matches(/^\d{4}-\d{2}-\d{2}$/, 'Give the date as YYYY-MM-DD.').required('Give the date of the review.'),
  observedUserIds: yup.array(yup.number().integer().positive().required()).min(1, 'Name at least one engineer you observed using the procedure.').max(50).required('Name the engineers you observed.'),
  deviations: text('Record the deviations found, or "None found".'),
  corrections: text('Record the corrections made, or "None needed".'),
  signedOff: yup.boolean().oneOf([true], 'Sign off the review.').required('Sign off the review.'),
});
export type ProcedureReviewInput = yup.InferType<typeof procedureReviewSchema>;
