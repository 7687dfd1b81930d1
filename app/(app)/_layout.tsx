import { Redirect, Slot, usePathname } from 'expo-router';
import { AppShell } from '@/components/nav/app-shell';
import { Button } from '@/components/ui/button';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { errorMessage } from '@/hooks/api/request';
import { useMeQuery } from '@/hooks/api/use-auth';
import { useAuth } from '@/hooks/auth/auth-provider';

export default function AppLayout() {
  const { ready, token } = useAuth();
  const pathname = usePathname();
  const me = useMeQuery();
  if (!ready) return <LoadingView />;
  if (!token) {
    const params = pathname && pathname !== "/" ? { next: pathname } : {};
    return <Redirect href={{ pathname: "/sign-in", params }} />;
  }
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
      <Slot />
    </AppShell>
  );
}
