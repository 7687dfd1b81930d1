import { Formik } from 'formik';
import { Link } from 'expo-router';
import { useState } from 'react';
import * as yup from 'yup';
import { colors } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { submitForm, type FormStatus } from '@/components/forms/submit';
import { AuthCard } from '@/components/auth/auth-card';
import { useSetPasswordMutation } from '@/hooks/api/use-account';
import { MIN_PASSWORD_LENGTH } from '@/shared/rules/notifications';
import { setPasswordSchema } from '@/shared/schemas/team';

// The server's schema plus a second typing, which only the form needs.
const formSchema = setPasswordSchema.shape({
  confirm: yup.string().required('Type the password again.').oneOf([yup.ref('password')], 'The two passwords are not the same.'),
});
type FormValues = yup.InferType<typeof formSchema>;

const linkStyle = { color: colors.brand, textDecorationLine: 'underline' as const };

/** Chooses a password from the one-time link in an invitation or reset e-mail. */
export function SetPasswordForm({ token }: { token: string }) {
  const setPassword = useSetPasswordMutation();
  const [doneFor, setDoneFor] = useState<string | null>(null);
  if (doneFor) {
    return (
      <AuthCard title="Password saved" testID="set-password-done">
        <Notice tone="safe" word="Done">{`Your password is set. Sign in as ${doneFor}.`}</Notice>
        <Link href="/sign-in"><Text bold style={linkStyle}>Go to sign in</Text></Link>
      </AuthCard>
    );
  }
  return (
    <AuthCard title="Choose your password" testID="set-password">
      {!token ? <Notice tone="danger" word="Link incomplete">This address has no link code. Open the link from the e-mail again, or ask for a new one.</Notice> : null}
      <Formik<FormValues>
        initialValues={{ token, password: '', confirm: '' }}
        validationSchema={formSchema}
        onSubmit={async (values, { setErrors, setStatus }) => {
          const { token: t, password } = setPasswordSchema.cast(values);
          // A refused link is said in the banner, with the way to a new one, rather than beside a field.
          const done = await submitForm<FormValues, { email: string }>({ setErrors: (e) => { if (!e.token) setErrors(e); }, setStatus }, () => setPassword.mutateAsync({ token: t, password }));
          if (done) setDoneFor(done.email);
        }}
      >
        {({ handleSubmit, errors, isSubmitting, status, submitCount }) => {
          const failed = status as FormStatus | undefined;
          const problem = failed && { message: failed.message, badLink: failed.code === 'link-invalid' || !!failed.fields?.token };
          return (
            <>
              <Text>{`At least ${MIN_PASSWORD_LENGTH} characters. A short sentence you will remember is a good choice.`}</Text>
              {problem ? (
                <Notice tone="danger" word={problem.badLink ? 'Link not valid' : 'Not saved'}>
                  <Text testID="set-password-error">{problem.message}</Text>
                  {problem.badLink ? <Link href="/forgot-password"><Text bold style={linkStyle}>Ask for a new link</Text></Link> : null}
                </Notice>
              ) : null}
              {submitCount > 0 && errors.token ? <Notice tone="danger" word="Link incomplete">{errors.token}</Notice> : null}
              <FormTextField name="password" label="New password" secureTextEntry autoComplete="new-password" testID="set-password-password" />
              <FormTextField name="confirm" label="Type it again" secureTextEntry autoComplete="new-password" onSubmitEditing={() => handleSubmit()} testID="set-password-confirm" />
              <Button title="Save password" onPress={() => handleSubmit()} busy={isSubmitting} testID="set-password-submit" />
              <Link href="/sign-in"><Text style={linkStyle}>Back to sign in</Text></Link>
            </>
          );
        }}
      </Formik>
    </AuthCard>
  );
}
