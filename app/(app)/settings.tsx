import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { MySettingsForm } from '@/components/account/my-settings-form';
import { SchemeChoiceCard } from '@/components/account/scheme-choice';
import { errorMessage } from '@/hooks/api/request';
import { useMySettingsQuery } from '@/hooks/api/use-account';
import { useMeQuery, useSignOutMutation } from '@/hooks/api/use-auth';
import { ROLE_LABELS } from '@/shared/rules/roles';

// A form reads better at a line length than stretched across a wide screen.
const SETTINGS_WIDTH = 760;

export default function SettingsScreen() {
  const me = useMeQuery();
  const settings = useMySettingsQuery();
  const signOut = useSignOutMutation();
  if (!me.data) return null;
  return (
    <Screen title="Settings">
      <View style={{ gap: space.lg, width: '100%', maxWidth: SETTINGS_WIDTH }}>
        <Card>
          <Text variant="title">{me.data.name}</Text>
          <View style={{ gap: space.xs }}>
            <Text>{me.data.email}</Text>
            <Text muted>{ROLE_LABELS[me.data.role]} · {me.data.organisation.name}</Text>
          </View>
        </Card>
        {settings.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(settings.error)}</Notice> : null}
        {settings.data ? <MySettingsForm settings={settings.data} /> : settings.isPending ? <LoadingView /> : null}
        <SchemeChoiceCard />
        <Button title="Sign out" variant="secondary" busy={signOut.isPending} onPress={() => signOut.mutate()} testID="sign-out" />
      </View>
    </Screen>
  );
}
