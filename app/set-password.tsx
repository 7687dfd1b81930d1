import { useLocalSearchParams } from 'expo-router';
import { Platform } from 'react-native';
import { Screen } from '@/components/ui/screen';
import { SetPasswordForm } from '@/components/auth/set-password-form';

// On a first load the router's params can be empty; the address bar is not.
const tokenFromAddress = () => (Platform.OS === 'web' && typeof window !== 'undefined' ? new URLSearchParams(window.location.search).get('token') ?? '' : '');

/** Public: reached from the link in an invitation or password-reset e-mail, signed in or not. */
export default function SetPasswordScreen() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  return (
    <Screen>
      <SetPasswordForm token={(token ?? tokenFromAddress()).trim()} />
    </Screen>
  );
}
