import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { lazyPart } from '@/components/ui/lazy-part';
import { ItemOffline } from '@/components/offline/pending-actions';
import { AssetDetails } from '@/components/register/asset-details';
import { AssetStateSlot } from '@/components/register/asset-state-slot';
import { Breadcrumbs, type Crumb } from '@/components/register/breadcrumbs';
import { ASSET_TYPE_ICONS } from '@/components/register/register-vocabulary';
import { errorMessage } from '@/hooks/api/request';
import { useAddAssetPhotoMutation, useArchiveAssetMutation, useAssetQuery } from '@/hooks/api/use-assets';
import { useTagsQuery } from '@/hooks/api/use-tags';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { useNow } from '@/components/tags/use-now';
import { VisitBanner } from '@/components/visits/visit-banner';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';

// Below the item's state: fetched once the state has shown, so a scanned label answers "is it isolated?" first.
const AssetLabelCard = lazyPart(() => import('@/components/labels/asset-label-card').then((m) => m.AssetLabelCard), { deferred: true });
const ConnectionsCard = lazyPart(() => import('@/components/connections/connections-card').then((m) => m.ConnectionsCard), { deferred: true });
const AssetReadingsSection = lazyPart(() => import('@/components/readings/asset-readings-section').then((m) => m.AssetReadingsSection), { deferred: true });
const PhotoGallery = lazyPart(() => import('@/components/register/photo-gallery').then((m) => m.PhotoGallery), { deferred: true });

export default function AssetScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const asset = useAssetQuery(id);
  const addPhoto = useAddAssetPhotoMutation(id);
  const archive = useArchiveAssetMutation();
  const [confirming, setConfirming] = useState(false);
  const now = useNow();
  const tags = useTagsQuery({ assetId: id });
  const stateShown = tags.data !== undefined || tags.isError;
  return (
    <QueryScreen query={asset} title="Plant item">
      {(a) => {
        const trail: Crumb[] = [{ label: 'Register', href: '/assets' }, { label: a.siteName, href: `/sites/${a.siteId}` }];
        if (a.plantRoomId) trail.push({ label: a.plantRoomName ?? 'Plant room', href: `/plant-rooms/${a.plantRoomId}` });
        const canEdit = perms.canEditRecord(a.createdBy) && !a.archived;
        return (
          <Screen
            title={`${a.plantId} · ${a.name}`}
            actions={
              <>
                {canEdit ? <Button title="Edit" onPress={() => router.push(`/assets/${id}/edit`)} testID="asset-edit" /> : null}
                {perms.canArchive && !a.archived ? <Button title="Archive" variant="secondary" onPress={() => setConfirming(true)} testID="asset-archive" /> : null}
              </>
            }
          >
            <Breadcrumbs trail={trail} />
            <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap', marginTop: -space.sm }}>
              <MaterialCommunityIcons name={ASSET_TYPE_ICONS[a.type]} size={26} color={colors.ink} />
              <Text bold>{ASSET_TYPE_LABELS[a.type]}</Text>
              {a.system ? <Text muted>{`· ${a.system}`}</Text> : null}
              {a.archived ? <Badge tone="neutral" icon="archive-outline" label="Archived" /> : null}
            </View>
            {a.archived ? <Notice tone="info" word="Archived">This item is no longer in service. Its record is kept for history.</Notice> : null}
            <AssetStateSlot asset={a} />
            <ItemOffline asset={a} />
            {a.archived ? null : <VisitBanner siteId={a.siteId} siteName={a.siteName} next={`/assets/${id}`} now={now} />}
            <AssetDetails asset={a} />
            {stateShown ? (
              <>
                <ConnectionsCard asset={a} />
                <AssetReadingsSection asset={a} />
                <Card>
                  <Text variant="title">Photos</Text>
                  <PhotoGallery photos={a.photos ?? []} subject={a.plantId} onAdd={perms.canAdd && !a.archived ? (p) => addPhoto.mutateAsync(p) : undefined} adding={addPhoto.isPending} />
                </Card>
                <AssetLabelCard asset={a} />
              </>
            ) : null}
            <Text variant="small" muted>{`Added by ${a.createdBy.name}`}</Text>
            <ConfirmDialog
              visible={confirming}
              title={`Archive ${a.plantId}?`}
              message="Archived items leave the register lists and cannot be edited. Their record and photos are kept. Archive only plant that has been removed or replaced."
              confirmLabel="Archive item"
              danger
              busy={archive.isPending}
              error={archive.isError ? errorMessage(archive.error) : null}
              onCancel={() => { setConfirming(false); archive.reset(); }}
              onConfirm={() => archive.mutate(id, { onSuccess: () => setConfirming(false) })}
            />
          </Screen>
        );
      }}
    </QueryScreen>
  );
}
