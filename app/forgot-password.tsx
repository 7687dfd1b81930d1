import { Screen } from '@/components/ui/screen';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';

/** Public: asks for a link to choose a new password. */
export default function ForgotPasswordScreen() {
  return (
    <Screen>
      <ForgotPasswordForm />
    </Screen>
  );
}
