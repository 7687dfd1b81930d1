import { Formik } from 'formik';
import { Link } from 'expo-router';
import { colors } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { AuthCard } from '@/components/auth/auth-card';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useSignInMutation } from '@/hooks/api/use-auth';
import { signInSchema, type SignInInput } from '@/shared/schemas/auth';

const remember = (
  <Notice tone="info" word="Remember">
    Isoledger records isolations and overrides. It does not isolate anything. Always follow your site's safe isolation procedure.
  </Notice>
);

export function SignInForm() {
  const signIn = useSignInMutation();
  return (
    <AuthCard title="Sign in" after={remember}>
      <Formik<SignInInput>
        initialValues={{ email: '', password: '' }}
        validationSchema={signInSchema}
        onSubmit={(values, helpers) => submitForm(helpers, () => signIn.mutateAsync(signInSchema.cast(values)))}
      >
        {({ handleSubmit, isSubmitting }) => (
          <>
            <FormStatusBanner word="Not signed in" />
            <FormTextField name="email" label="E-mail" autoCapitalize="none" autoComplete="email" keyboardType="email-address" inputMode="email" testID="sign-in-email" />
            <FormTextField
              name="password"
              label="Password"
              secureTextEntry
              autoComplete="current-password"
              onSubmitEditing={() => handleSubmit()}
              testID="sign-in-password"
            />
            <Button title="Sign in" onPress={() => handleSubmit()} busy={isSubmitting} testID="sign-in-submit" />
            <Link href="/forgot-password" testID="sign-in-forgot">
              <Text style={{ color: colors.brand, textDecorationLine: 'underline' }}>Forgot password?</Text>
            </Link>
          </>
        )}
      </Formik>
    </AuthCard>
  );
}
