import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function BoardScreen() {
  return (
    <Screen title="Live tags board">
      <Notice tone="info" word="Not available yet">The live tags board is not part of this version of Isoledger yet.</Notice>
    </Screen>
  );
}
