import { useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Card } from '@/components/ui/card';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { PendingForRecord } from '@/components/offline/pending-actions';
import { TagActions } from '@/components/tags/tag-actions';
import { TagFacts } from '@/components/tags/tag-facts';
import { TagHeader } from '@/components/tags/tag-header';
import { TagNoticesBanner } from '@/components/tags/tag-notices-banner';
import { TagTimeline } from '@/components/tags/tag-timeline';
import { useNow } from '@/components/tags/use-now';
import { useMeQuery } from '@/hooks/api/use-auth';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { PhotoGallery } from '@/components/register/photo-gallery';
import { useAddTagPhotoMutation, useTagQuery } from '@/hooks/api/use-tags';

export default function TagScreen() {
  const params = useLocalSearchParams<{ id: string }>();
  const tag = useTagQuery(Number(params.id) || 0);
  const me = useMeQuery().data;
  const { may, mayOn } = usePermissions();
  const now = useNow();
  const { isWide } = useBreakpoints();
  const addPhoto = useAddTagPhotoMutation(Number(params.id) || 0);

  return (
    <QueryScreen query={tag} title="Tag">
      {(t) => {
        const history = (
          <Card>
            <Text variant="title">History</Text>
            <Text variant="small" muted>Oldest first. Entries are only ever added.</Text>
            <TagTimeline events={t.events ?? []} timeZone={t.asset.timeZone} now={now} />
          </Card>
        );
        const actions = me ? <TagActions tag={t} me={me} now={now} /> : null;
        const canAddPhoto = mayOn('addTagPhoto', { status: t.status, holderId: t.holder.id });
        const photos = (
          <Card>
            <Text variant="title">Photos of the lock or tag</Text>
            <PhotoGallery photos={t.photos ?? []} subject={`tag ${t.id}`} onAdd={canAddPhoto ? (p) => addPhoto.mutateAsync(p) : undefined} adding={addPhoto.isPending} />
          </Card>
        );
        // A cleared tag has nothing left to do: its history takes the second column.
        const live = t.status === 'live';
        return (
          <Screen>
            {may('raiseTag') ? <TagNoticesBanner /> : null}
            <TagHeader tag={t} now={now} />
            <PendingForRecord tagId={t.id} />
            {isWide ? (
              <View style={{ flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' }}>
                <View style={{ flex: 3, gap: space.lg }}>
                  <TagFacts tag={t} />
                  {photos}
                  {live ? history : null}
                </View>
                <View style={{ flex: 2, gap: space.lg }}>
                  {actions}
                  {live ? null : history}
                </View>
              </View>
            ) : (
              <>
                {actions}
                <TagFacts tag={t} />
                {photos}
                {history}
              </>
            )}
          </Screen>
        );
      }}
    </QueryScreen>
  );
}
