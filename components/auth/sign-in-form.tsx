import { Formik } from 'formik';
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { BrandMark } from '@/components/nav/brand-mark';
import { FormTextField } from '@/components/forms/bound-fields';
import { FormStatusBanner } from '@/components/forms/status-banner';
import { submitForm } from '@/components/forms/submit';
import { useSignInMutation } from '@/hooks/api/use-auth';
import { signInSchema, type SignInInput } from '@/shared/schemas/auth';

export function SignInForm() {
  const signIn = useSignInMutation();
  return (
    <View style={styles.wrap}>
      <View style={styles.brand}>
        <BrandMark size={48} />
        <View>
          <Text variant="heading">Isoledger</Text>
          <Text muted>Plant register and isolation log</Text>
        </View>
      </View>
      <Formik<SignInInput>
        initialValues={{ email: '', password: '' }}
        validationSchema={signInSchema}
        onSubmit={(values, helpers) => submitForm(helpers, () => signIn.mutateAsync(signInSchema.cast(values)))}
      >
        {({ handleSubmit, isSubmitting }) => (
          <View style={styles.card}>
            <Text variant="title">Sign in</Text>
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
          </View>
        )}
      </Formik>
      <Notice tone="info" word="Remember">
        Isoledger records isolations and overrides. It does not isolate anything. Always follow your site's safe isolation procedure.
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.lg, paddingTop: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.xl, gap: space.sm },
});
