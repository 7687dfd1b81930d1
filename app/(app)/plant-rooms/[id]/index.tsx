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
import { AssetList } from '@/components/register/asset-list';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { PhotoGallery } from '@/components/register/photo-gallery';
import { SafetyLocationsPanel } from '@/components/register/safety-locations';
import { errorMessage } from '@/hooks/api/request';
import { useAssetsQuery } from '@/hooks/api/use-assets';
import { useAddPlantRoomPhotoMutation, usePlantRoomQuery } from '@/hooks/api/use-plant-rooms';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useSinceLastVisitQuery } from '@/hooks/api/use-visits';
import { LiveTagsPanel } from '@/components/places/live-tags-panel';
import { SinceLastVisitCard } from '@/components/places/since-last-visit-card';
import { useNow } from '@/components/tags/use-now';
import { VisitBanner } from '@/components/visits/visit-banner';

export default function PlantRoomScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const room = usePlantRoomQuery(id);
  const items = useAssetsQuery({ plantRoomId: id, sort: 'plantId', pageSize: 200 });
  const addPhoto = useAddPlantRoomPhotoMutation(id);
  const since = useSinceLastVisitQuery('plant-room', id);
  const now = useNow();
  return (
    <QueryScreen query={room} title="Plant room">
      {(r) => (
        <Screen
          title={r.name}
          subtitle={[r.siteName, r.floorArea].filter(Boolean).join(' · ')}
          actions={
            <>
              {perms.canAdd ? <Button title="Add item" onPress={() => router.push({ pathname: '/assets/new', params: { siteId: r.siteId, plantRoomId: id } })} testID="room-add-item" /> : null}
              <Button title="Diagram" variant="secondary" onPress={() => router.push(`/plant-rooms/${id}/diagram`)} testID="room-diagram" />
              {perms.canEditRecord(r.createdBy) ? <Button title="Edit room" variant="secondary" onPress={() => router.push(`/plant-rooms/${id}/edit`)} /> : null}
            </>
          }
        >
          <Breadcrumbs trail={[{ label: 'Register', href: '/assets' }, { label: r.siteName, href: `/sites/${r.siteId}` }]} />
          <LiveTagsPanel tags={r.liveTags ?? []} now={now} place={r.name} />
          <VisitBanner siteId={r.siteId} siteName={r.siteName} next={`/plant-rooms/${id}`} now={now} />
          {since.data ? <SinceLastVisitCard data={since.data} now={now} /> : null}
          <SafetyLocationsPanel safety={r.safety} />
          <Card>
            <Text variant="title">Access</Text>
            <Text>{r.accessNotes?.trim() ? r.accessNotes : 'No access notes recorded.'}</Text>
          </Card>
          <View style={{ gap: space.sm }}>
            <Text variant="title">Plant items</Text>
            {items.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(items.error)}</Notice> : null}
            {items.data ? (
              <AssetList items={items.data.items} total={items.data.total} busy={items.isFetching} showPlace={false} emptyTitle="No items in this room yet" emptyText={perms.canAdd ? 'Use “Add item” to record the plant here.' : 'Nothing has been recorded here.'} />
            ) : <LoadingView />}
          </View>
          {items.data?.total ? (
            <Card>
              <Text variant="title">QR labels for this room</Text>
              <Text muted variant="small">One label for every item in the room, to print and stick on the plant.</Text>
              <PrintLabelsButtons selection={{ plantRoomId: id }} fileStem={r.name.replace(/\W+/g, '-').toLowerCase()} />
            </Card>
          ) : null}
          <Card>
            <Text variant="title">Photos</Text>
            <PhotoGallery photos={r.photos ?? []} subject={r.name} onAdd={perms.canAdd ? (a) => addPhoto.mutateAsync(a) : undefined} adding={addPhoto.isPending} />
          </Card>
        </Screen>
      )}
    </QueryScreen>
  );
}
