import { useLocalSearchParams, useRouter } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { PlantRoomForm } from '@/components/register/plant-room-form';
import { usePlantRoomQuery, useUpdatePlantRoomMutation } from '@/hooks/api/use-plant-rooms';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function EditPlantRoomScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const room = usePlantRoomQuery(id);
  const update = useUpdatePlantRoomMutation(id);
  return (
    <QueryScreen query={room} title="Edit plant room">
      {(r) => (
        <Screen title="Edit plant room" subtitle={`${r.name} · ${r.siteName}`}>
          {perms.canEditRecord(r.createdBy) ? (
            <PlantRoomForm
              room={r}
              siteId={r.siteId}
              submitLabel="Save plant room"
              onSubmit={async ({ siteId: _siteId, ...patch }) => {
                // A plant room stays on its site; the PATCH carries only what can change.
                await update.mutateAsync(patch);
                router.replace(`/plant-rooms/${id}`);
              }}
              onCancel={() => router.back()}
            />
          ) : (
            <Notice tone="info" word="Not allowed">Engineers edit the plant rooms they added; a supervisor can edit any.</Notice>
          )}
        </Screen>
      )}
    </QueryScreen>
  );
}
