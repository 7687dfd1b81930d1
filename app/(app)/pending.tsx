import { View } from 'react-native';
import { space } from '@/components/theme';
import { PendingActionsList } from '@/components/offline/pending-actions';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function PendingActionsScreen() {
  return (
    <Screen title="Pending actions" subtitle="Taken on this device with no signal">
      <View style={{ gap: space.lg }}>
        <Notice tone="info" word="How this works">
          Each action is sent in the order you took it when the connection returns. Until the server confirms it, it is not on record: a tag raised or cleared here is not raised or cleared yet. Follow your site&apos;s isolation procedure meanwhile.
        </Notice>
        <PendingActionsList />
      </View>
    </Screen>
  );
}
