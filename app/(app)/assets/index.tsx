import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function RegisterScreen() {
  return (
    <Screen title="Plant register">
      <Notice tone="info" word="Not available yet">The plant register is not part of this version of Isoledger yet.</Notice>
    </Screen>
  );
}
