import { Redirect, useLocalSearchParams } from 'expo-router';
import { LabelLanding } from '@/components/labels/label-landing';
import { LoadingView } from '@/components/ui/loading-view';
import { useAuth } from '@/hooks/auth/auth-provider';

/** What a printed QR label opens: PUBLIC_URL/l/CODE. Signed out → sign in, then back here. */
export default function LabelRoute() {
  const { code } = useLocalSearchParams<{ code: string }>();
  const { ready, token } = useAuth();
  if (!ready) return <LoadingView />;
  if (!token) return <Redirect href={`/sign-in?next=${encodeURIComponent(`/l/${code ?? ''}`)}` as never} />;
  return <LabelLanding code={String(code ?? '')} />;
}
