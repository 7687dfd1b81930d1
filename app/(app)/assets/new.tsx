import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { AssetForm } from '@/components/register/asset-form';
import { emptyAssetValues } from '@/components/register/asset-form-values';
import { AssetSavedPanel } from '@/components/register/asset-saved-panel';
import { useCreateAssetMutation } from '@/hooks/api/use-assets';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { Asset } from '@/shared/types/register';

export default function NewAssetScreen() {
  const params = useLocalSearchParams<{ siteId?: string; plantRoomId?: string }>();
  const router = useRouter();
  const perms = usePermissions();
  const create = useCreateAssetMutation();
  const [place, setPlace] = useState({ siteId: Number(params.siteId) || null, plantRoomId: Number(params.plantRoomId) || null });
  const [saved, setSaved] = useState<Asset | null>(null);
  // A new key gives the next item a fresh form in the same place.
  const [formKey, setFormKey] = useState(0);

  if (!perms.canAdd) {
    return (
      <Screen title="Add plant item">
        <Notice tone="info" word="Read only">Your account can view the register but not add to it.</Notice>
      </Screen>
    );
  }
  return (
    <Screen title="Add plant item" subtitle={saved ? undefined : 'Type, plant ID and name are enough to start; add the rest now or later.'}>
      {saved ? (
        <AssetSavedPanel
          asset={saved}
          onOpen={() => router.replace(`/assets/${saved.id}`)}
          onAnother={() => {
            setPlace({ siteId: saved.siteId, plantRoomId: saved.plantRoomId });
            setSaved(null);
            setFormKey((k) => k + 1);
          }}
        />
      ) : (
        <AssetForm
          key={formKey}
          initialValues={emptyAssetValues(place.siteId, place.plantRoomId)}
          submitLabel="Save item"
          onSubmit={async (input) => setSaved(await create.mutateAsync(input))}
          onCancel={() => router.back()}
        />
      )}
    </Screen>
  );
}
