import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { useMeQuery, useSignOutMutation } from '@/hooks/api/use-auth';
import { ROLE_LABELS } from '@/shared/rules/roles';

export default function SettingsScreen() {
  const me = useMeQuery();
  const signOut = useSignOutMutation();
  if (!me.data) return null;
  return (
    <Screen title="Settings">
      <Card>
        <Text variant="title">{me.data.name}</Text>
        <View style={{ gap: space.xs }}>
          <Text>{me.data.email}</Text>
          <Text muted>{ROLE_LABELS[me.data.role]} · {me.data.organisation.name}</Text>
        </View>
      </Card>
      <Button title="Sign out" variant="secondary" busy={signOut.isPending} onPress={() => signOut.mutate()} testID="sign-out" />
    </Screen>
  );
}
