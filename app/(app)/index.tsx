import { HomeContent } from '@/components/home/home-content';
import { Screen } from '@/components/ui/screen';
import { useMeQuery } from '@/hooks/api/use-auth';

export default function HomeScreen() {
  const me = useMeQuery();
  if (!me.data) return null;
  return (
    <Screen title={`Hello, ${me.data.name.split(' ')[0]}`} subtitle={me.data.organisation.name}>
      <HomeContent user={me.data} />
    </Screen>
  );
}
