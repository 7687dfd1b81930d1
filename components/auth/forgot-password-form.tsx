import { Formik } from 'formik';
import { Link } from 'expo-router';
import { useState } from 'react';
import { colors } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { AuthCard } from '@/components/auth/auth-card';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useResetRequestMutation } from '@/hooks/api/use-account';
import { resetRequestSchema, type ResetRequestInput } from '@/shared/schemas/team';

/** Asks for a reset link. The answer never says whether the address has an account. */
export function ForgotPasswordForm() {
  const reset = useResetRequestMutation();
  const [answer, setAnswer] = useState<string | null>(null);
  return (
    <AuthCard title="Forgotten password" testID="forgot-password">
      {answer ? (
        <>
          <Notice tone="safe" word="Request received"><Text testID="forgot-password-answer">{answer}</Text></Notice>
          <Text muted>Nothing arrived? Look in the junk folder, check the address with your administrator, or ask them to send you a new invitation.</Text>
          <Link href="/sign-in"><Text bold style={{ color: colors.brand, textDecorationLine: 'underline' }}>Back to sign in</Text></Link>
        </>
      ) : (
        <Formik<ResetRequestInput>
          initialValues={{ email: '' }}
          validationSchema={resetRequestSchema}
          onSubmit={async (values, helpers) => {
            const answered = await submitForm(helpers, () => reset.mutateAsync(resetRequestSchema.cast(values)));
            if (answered) setAnswer(answered.message);
          }}
        >
          {({ handleSubmit, isSubmitting }) => (
            <>
              <Text>Give the e-mail address you sign in with. If it belongs to an account, we send a link to choose a new password.</Text>
              <FormStatusBanner word="Not sent" />
              <FormTextField
                name="email"
                label="E-mail"
                autoCapitalize="none"
                autoComplete="email"
                keyboardType="email-address"
                inputMode="email"
                onSubmitEditing={() => handleSubmit()}
                testID="forgot-password-email"
              />
              <Button title="Send the link" onPress={() => handleSubmit()} busy={isSubmitting} testID="forgot-password-submit" />
              <Link href="/sign-in"><Text style={{ color: colors.brand, textDecorationLine: 'underline' }}>Back to sign in</Text></Link>
            </>
          )}
        </Formik>
      )}
    </AuthCard>
  );
}
