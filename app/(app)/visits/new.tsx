import { useLocalSearchParams, useRouter } from 'expo-router';
import { safeNext } from '@/components/auth/safe-next';
import { Card } from '@/components/ui/card';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { StartVisitForm } from '@/components/visits/start-visit-form';
import { useSiteQuery } from '@/hooks/api/use-sites';

export default function NewVisitScreen() {
  const params = useLocalSearchParams<{ siteId: string; next?: string }>();
  const siteId = Number(params.siteId);
  const router = useRouter();
  const site = useSiteQuery(siteId);
  return (
    <QueryScreen query={site} title="Start a visit">
      {(s) => (
        <Screen title="Start a visit" subtitle={s.name}>
          <Card>
            <Text muted>What you do here while the visit is open — readings, tags, notes, photos — is gathered into its record. When you leave, you decide what happens to each live tag you hold on this site.</Text>
            <StartVisitForm
              siteId={siteId}
              onStarted={() => router.replace(params.next ? safeNext(params.next) : `/sites/${siteId}`)}
              onCancel={() => router.back()}
            />
          </Card>
        </Screen>
      )}
    </QueryScreen>
  );
}
