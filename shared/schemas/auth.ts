import * as yup from 'yup';

export const signInSchema = yup.object({
  email: yup.string().trim().lowercase().email('Enter a valid e-mail address.').max(254).required('Enter your e-mail address.'),
  password: yup.string().max(200).required('Enter your password.'),
});
export type SignInInput = yup.InferType<typeof signInSchema>;
