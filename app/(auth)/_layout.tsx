import { Redirect, Slot, useLocalSearchParams } from 'expo-router';
import { useAuth } from '@/hooks/auth/auth-provider';
import { LoadingView } from '@/components/ui/loading-view';
import { safeNext } from '@/components/auth/safe-next';

export default function AuthLayout() {
  const { ready, token } = useAuth();
  const { next } = useLocalSearchParams<{ next?: string }>();
  if (!ready) return <LoadingView />;
  if (token) return <Redirect href={safeNext(next)} />;
  return <Slot />;
}
