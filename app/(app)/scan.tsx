import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function ScanScreen() {
  return (
    <Screen title="Scan a label">
      <Notice tone="info" word="Not available yet">Label scanning is not part of this version of Isoledger yet.</Notice>
    </Screen>
  );
}
