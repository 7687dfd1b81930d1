import { Screen } from '@/components/ui/screen';
import { SignInForm } from '@/components/auth/sign-in-form';

export default function SignInScreen() {
  return (
    <Screen>
      <SignInForm />
    </Screen>
  );
}
