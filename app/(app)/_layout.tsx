import { Slot, usePathname, useRouter } from 'expo-router';
import { useEffect } from 'react';
import { AppShell } from '@/components/nav/app-shell';
import { PendingBanner } from '@/components/offline/pending-actions';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { errorMessage } from '@/hooks/api/request';
import { useMeQuery } from '@/hooks/api/use-auth';
import { useAuth } from '@/hooks/auth/auth-provider';
import { useOutboxSender } from '@/hooks/offline/use-outbox';

export default function AppLayout() {
  const { ready, token } = useAuth();
  const pathname = usePathname();
  const me = useMeQuery();
  const router = useRouter();
  useOutboxSender();
  const signedOut = ready && !token;
  useEffect(() => {
    if (!signedOut) return;
    // Come back here after signing in (a label link opened while signed out, a hard refresh).
    router.replace({ pathname: '/sign-in', params: pathname && pathname !== '/' ? { next: pathname } : {} });
  }, [signedOut, pathname, router]);
  if (!ready || signedOut) return <LoadingView />;
  if (me.isPending) return <LoadingView />;
  if (me.isError) {
    return (
      <Screen title="Cannot load your account">
        <Notice tone="danger">{errorMessage(me.error)}</Notice>
        <Button title="Try again" onPress={() => void me.refetch()} />
      </Screen>
    );
  }
  return (
    <AppShell user={me.data}>
      <PendingBanner />
      <Slot />
    </AppShell>
  );
}
