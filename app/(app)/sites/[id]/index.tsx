import { useLocalSearchParams, useRouter } from 'expo-router';
import { PrintLabelsButtons } from '@/components/labels/print-labels-buttons';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { SiteReadingFlags } from '@/components/readings/site-reading-flags';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { DetailList } from '@/components/register/detail-list';
import { PlantRoomList } from '@/components/register/plant-room-list';
import { errorMessage } from '@/hooks/api/request';
import { useSitePlantRoomsQuery } from '@/hooks/api/use-plant-rooms';
import { useSiteQuery } from '@/hooks/api/use-sites';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useSinceLastVisitQuery } from '@/hooks/api/use-visits';
import { LiveTagsPanel } from '@/components/places/live-tags-panel';
import { SinceLastVisitCard } from '@/components/places/since-last-visit-card';
import { ProcedureReviewCard } from '@/components/places/procedure-review-card';
import { zoneIfDifferent } from '@/components/places/zone';
import { useNow } from '@/components/tags/use-now';
import { SiteVisitsCard } from '@/components/visits/site-visits-card';
import { VisitBanner } from '@/components/visits/visit-banner';

export default function SiteScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const site = useSiteQuery(id);
  const rooms = useSitePlantRoomsQuery(id);
  const since = useSinceLastVisitQuery('site', id);
  const now = useNow();
  return (
    <QueryScreen query={site} title="Site">
      {(s) => (
        <Screen
          title={s.name}
          subtitle={s.address || undefined}
          actions={
            <>
              {perms.canAdd ? <Button title="Add plant room" onPress={() => router.push({ pathname: '/plant-rooms/new', params: { siteId: id } })} testID="site-add-plant-room" /> : null}
              {perms.canCreateSite ? <Button title="Edit site" variant="secondary" onPress={() => router.push(`/sites/${id}/edit`)} /> : null}
            </>
          }
        >
          <Breadcrumbs trail={[{ label: 'Register', href: '/assets' }]} />
          <VisitBanner siteId={id} siteName={s.name} now={now} />
          <LiveTagsPanel tags={s.liveTags ?? []} now={now} place={s.name} />
          {since.data ? <SinceLastVisitCard data={since.data} now={now} /> : null}
          <View style={{ gap: space.sm }}>
            <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' }}>
              <Text variant="title" style={{ flex: 1 }}>{`Plant rooms (${s.plantRoomCount})`}</Text>
              <Button title={`All ${s.assetCount} items`} variant="secondary" onPress={() => router.push({ pathname: '/assets', params: { siteId: id } })} />
            </View>
            {rooms.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(rooms.error)}</Notice> : null}
            {rooms.data ? <PlantRoomList rooms={rooms.data.items} /> : rooms.isPending ? <LoadingView /> : null}
          </View>
          <SiteReadingFlags siteId={id} />
          <SiteVisitsCard siteId={id} now={now} />
          <ProcedureReviewCard siteId={id} />
          {s.assetCount ? (
            <Card>
              <Text variant="title">QR labels for this site</Text>
              <Text muted variant="small">{`${s.assetCount} labels, ordered by plant room and plant ID.`}</Text>
              <PrintLabelsButtons selection={{ siteId: id }} fileStem={s.name.replace(/\W+/g, '-').toLowerCase()} compact />
            </Card>
          ) : null}
          <Card>
            <Text variant="title">Site details</Text>
            <DetailList
              twoColumns
              rows={[
                ['Address', s.address],
                ...(zoneIfDifferent(s.timeZone) ? [['Time zone', zoneIfDifferent(s.timeZone)] as [string, string]] : []),
                ['Client contact', s.clientContactName],
                ['Contact phone', s.clientContactPhone],
                ['Contact e-mail', s.clientContactEmail],
              ]}
            />
          </Card>
        </Screen>
      )}
    </QueryScreen>
  );
}
