import { useLocalSearchParams, useRouter } from 'expo-router';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { PlantRoomForm } from '@/components/register/plant-room-form';
import { useCreatePlantRoomMutation } from '@/hooks/api/use-plant-rooms';
import { usePermissions } from '@/hooks/auth/use-permissions';

export default function NewPlantRoomScreen() {
  const { siteId } = useLocalSearchParams<{ siteId?: string }>();
  const router = useRouter();
  const perms = usePermissions();
  const create = useCreatePlantRoomMutation();
  return (
    <Screen title="New plant room">
      {perms.canAdd ? (
        <PlantRoomForm
          siteId={Number(siteId) || null}
          submitLabel="Add plant room"
          onSubmit={async (input) => {
            const room = await create.mutateAsync(input);
            router.replace(`/plant-rooms/${room.id}`);
          }}
          onCancel={() => router.back()}
        />
      ) : (
        <Notice tone="info" word="Read only">Your account can view the register but not add to it.</Notice>
      )}
    </Screen>
  );
}
