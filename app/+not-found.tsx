import { Link } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

export default function NotFoundScreen() {
  return (
    <Screen title="Page not found">
      <Notice tone="info" word="Not found">There is no page at this address.</Notice>
      <Link href="/"><Text bold>Go to the home screen</Text></Link>
    </Screen>
  );
}
