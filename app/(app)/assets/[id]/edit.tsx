import { useLocalSearchParams, useRouter } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { AssetForm } from '@/components/register/asset-form';
import { valuesFromAsset } from '@/components/register/asset-form-values';
import { useAssetQuery, useUpdateAssetMutation } from '@/hooks/api/use-assets';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function EditAssetScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const asset = useAssetQuery(id);
  const update = useUpdateAssetMutation();
  return (
    <QueryScreen query={asset} title="Edit plant item">
      {(a) => (
        <Screen title={`Edit ${a.plantId}`} subtitle={a.name}>
          {perms.canEditRecord(a.createdBy) && !a.archived ? (
            <AssetForm
              initialValues={valuesFromAsset(a)}
              submitLabel="Save changes"
              onSubmit={async (input) => {
                await update.mutateAsync({ id, patch: input });
                router.replace(`/assets/${id}`);
              }}
              onCancel={() => router.back()}
            />
          ) : (
            <Notice tone="info" word="Not allowed">
              {a.archived ? 'Archived items cannot be edited.' : 'Engineers edit the items they added; a supervisor can edit any item.'}
            </Notice>
          )}
        </Screen>
      )}
    </QueryScreen>
  );
}
