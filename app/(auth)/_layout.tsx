import { Redirect, Slot, useGlobalSearchParams } from 'expo-router';
import { Platform } from 'react-native';
import { useAuth } from '@/hooks/auth/auth-provider';
import { LoadingView } from '@/components/ui/loading-view';
import { safeNext } from '@/components/auth/safe-next';

// On a first load of /sign-in?next=… the router's params in this layout can be empty; the address bar is not.
const nextFromAddress = () => (Platform.OS === 'web' && typeof window !== 'undefined' ? new URLSearchParams(window.location.search).get('next') ?? undefined : undefined);

export default function AuthLayout() {
  const { ready, token } = useAuth();
  const { next } = useGlobalSearchParams<{ next?: string }>();
  if (!ready) return <LoadingView />;
  if (token) return <Redirect href={safeNext(next ?? nextFromAddress())} />;
  return <Slot />;
}
