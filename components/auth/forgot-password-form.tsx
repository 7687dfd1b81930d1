import { Formik } from 'formik';
import { Link } from 'expo-router';
import { useState } from 'react';
import { colors } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { AuthCard } from '@/components/auth/auth-card';
import { RequestError, errorMessage } from '@/hooks/api/request';
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
          onSubmit={async (values, { setErrors, setStatus }) => {
            setStatus(undefined);
            try {
              setAnswer((await reset.mutateAsync(resetRequestSchema.cast(values))).message);
            } catch (err) {
              if (err instanceof RequestError && err.fields) setErrors(err.fields);
              else setStatus(errorMessage(err));
            }
          }}
        >
          {({ handleChange, handleBlur, handleSubmit, values, errors, touched, isSubmitting, status }) => (
            <>
              <Text>Give the e-mail address you sign in with. If it belongs to an account, we send a link to choose a new password.</Text>
              {status ? <Notice tone="danger" word="Not sent">{status}</Notice> : null}
              <TextField
                label="E-mail"
                value={values.email}
                onChangeText={handleChange('email')}
                onBlur={handleBlur('email')}
                error={touched.email && errors.email}
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
