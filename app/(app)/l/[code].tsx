import { useLocalSearchParams } from 'expo-router';
import { LabelLanding } from '@/components/labels/label-landing';

/** What a printed QR label opens: PUBLIC_URL/l/CODE. Signed out, the app group's guard sends it to sign in and back here. */
export default function LabelRoute() {
  const { code } = useLocalSearchParams<{ code: string }>();
  return <LabelLanding code={String(code ?? '')} />;
}
