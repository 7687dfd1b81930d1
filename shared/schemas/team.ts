import * as yup from 'yup';
import { MAX_PASSWORD_BYTES, MIN_PASSWORD_LENGTH, passwordBytes } from '@/shared/rules/notifications';
import { ROLES } from '@/shared/rules/roles';

const email = yup.string().trim().lowercase().email('Enter a valid e-mail address.').max(254).required('Enter an e-mail address.');
const role = yup.string().oneOf([...ROLES], 'Choose a role.');

/** `POST /api/users/invite` */
export const inviteUserSchema = yup.object({
  name: yup.string().trim().required('Enter their name.').max(120),
  email,
  role: role.required('Choose a role.'),
});
export type InviteUserInput = yup.InferType<typeof inviteUserSchema>;

/** `PATCH /api/users/:id`: a new role, deactivation (`active: false`) or reactivation, or both. */
export const changeUserSchema = yup.object({
  role: role.optional(),
  active: yup.boolean().optional(),
}).test('something', 'Change the role or the active state.', (v) => !!v && (v.role !== undefined || v.active !== undefined));
export type ChangeUserInput = yup.InferType<typeof changeUserSchema>;

/** `PUT /api/users/:id/sites`: the complete list of sites a viewer may see (replaces the previous list). */
export const siteAccessSchema = yup.object({
  siteIds: yup.array(yup.number().integer().positive().required()).max(1000).required('Give the list of sites.'),
});
export type SiteAccessInput = yup.InferType<typeof siteAccessSchema>;

/** `POST /api/auth/password/reset-request` */
export const resetRequestSchema = yup.object({ email });
export type ResetRequestInput = yup.InferType<typeof resetRequestSchema>;

/** `POST /api/auth/password/set`: the token from an invitation or reset link, and the new password. */
export const setPasswordSchema = yup.object({
  token: yup.string().trim().required('The link is incomplete.').max(200),
  password: yup.string()
    .required('Choose a password.')
    .min(MIN_PASSWORD_LENGTH, `At least ${MIN_PASSWORD_LENGTH} characters.`)
    .test('not-blank', `At least ${MIN_PASSWORD_LENGTH} characters that are not spaces.`, (p) => !p || p.trim().length >= MIN_PASSWORD_LENGTH)
    // bcrypt reads only the first 72 bytes; a longer password would be cut without a word, so it is refused.
    .test('bytes', `At most ${MAX_PASSWORD_BYTES} bytes (about ${MAX_PASSWORD_BYTES} letters, fewer with accents or symbols).`, (p) => !p || passwordBytes(p) <= MAX_PASSWORD_BYTES),
});
export type SetPasswordInput = yup.InferType<typeof setPasswordSchema>;

/** `PATCH /api/me/settings`: any subset; a notification the role cannot receive is ignored. */
export const mySettingsSchema = yup.object({
  contactPhone: yup.string().trim().max(40, 'At most 40 characters.').nullable()
    .matches(/^[0-9+()\-.\s]*$/, { message: 'Digits, spaces and + ( ) - . only.', excludeEmptyString: true }),
  notifications: yup.object({
    raised: yup.boolean().optional(),
    cleared: yup.boolean().optional(),
    digest: yup.boolean().optional(),
    myTags: yup.boolean().optional(),
  }).optional().default(undefined),
});
export type MySettingsInput = yup.InferType<typeof mySettingsSchema>;
