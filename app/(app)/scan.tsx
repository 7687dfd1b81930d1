import { useRouter } from 'expo-router';
import { useState } from 'react';
import { LabelCodeEntry } from '@/components/labels/label-code-entry';
import { lazyPart } from '@/components/ui/lazy-part';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { parseLabelUrl } from '@/shared/rules/label-code';

// The camera, its QR reader and the reader's wasm load only on this screen.
const LabelScanner = lazyPart(() => import('@/components/labels/label-scanner').then((m) => m.LabelScanner));

export default function ScanScreen() {
  const router = useRouter();
  const [foreign, setForeign] = useState<string | null>(null);

  const open = (code: string) => router.push(`/l/${code}`);
  const scanned = (text: string) => {
    const code = parseLabelUrl(text);
    if (code) {
      setForeign(null);
      open(code);
    } else {
      setForeign(text);
    }
  };

  return (
    <Screen title="Scan a label" subtitle="Point the camera at the QR label on a plant item.">
      <LabelScanner onScanned={scanned} paused={false} />
      {foreign ? (
        <Notice tone="info" word="Not an Isoledger label" title="This QR code belongs to something else">
          {`It reads: ${foreign.length > 120 ? `${foreign.slice(0, 120)}…` : foreign}`}
        </Notice>
      ) : null}
      <Card>
        <Text variant="title">Or type the code</Text>
        <LabelCodeEntry onCode={open} />
      </Card>
    </Screen>
  );
}
