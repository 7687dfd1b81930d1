import { useRouter } from 'expo-router';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import { agoPhrase } from '@/components/tags/tag-time';
import { useMyVisitQuery } from '@/hooks/api/use-me';
import { usePermissions } from '@/hooks/auth/use-permissions';

/**
 * On a site, or on an item reached from its label: the person's visit here, or a way to start one. `next`
 * brings them back to where they were once the visit has started.
 */
export function VisitBanner({ siteId, siteName, next, now }: { siteId: number; siteName: string; next?: string; now: Date }) {
  const perms = usePermissions();
  const router = useRouter();
  const visit = useMyVisitQuery(perms.may('recordVisits'));
  if (!perms.may('recordVisits') || !visit.isSuccess) return null;
  const v = visit.data;
  if (v && v.site.id === siteId) {
    return (
      <Card>
        <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md }} testID="visit-in-progress">
          <View style={{ flex: 1, minWidth: 200 }}>
            <Text bold>{`Your visit here is in progress (started ${agoPhrase(v.startedAt, now)})`}</Text>
            <Text variant="small" muted numberOfLines={2}>{v.purpose}</Text>
          </View>
          <Button title="Open visit" variant="secondary" onPress={() => router.push(`/visits/${v.id}`)} testID="visit-open" />
        </View>
      </Card>
    );
  }
  if (v) {
    return <Text variant="small" muted testID="visit-elsewhere">{`Your visit at ${v.site.name} is still open. End it before starting one at ${siteName}.`}</Text>;
  }
  return (
    <Card>
      <View style={{ flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md }} testID="visit-none">
        <Text style={{ flex: 1, minWidth: 200 }}>{`No visit open at ${siteName}. Start one so what you do here is recorded and nothing is left unexplained.`}</Text>
        <Button title="Start a visit" onPress={() => router.push({ pathname: '/visits/new', params: { siteId, ...(next ? { next } : {}) } })} testID="visit-start" />
      </View>
    </Card>
  );
}
