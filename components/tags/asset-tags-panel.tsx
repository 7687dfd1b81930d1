import { useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { useBreakpoints } from '@/components/theme/use-breakpoints';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { AssetStateBanner } from '@/components/tags/asset-state-banner';
import { TagCard } from '@/components/tags/tag-card';
import { TagHistoryList } from '@/components/tags/tag-history-list';
import { useNow } from '@/components/tags/use-now';
import { errorMessage } from '@/hooks/api/request';
import { useMeQuery } from '@/hooks/api/use-auth';
import { useTagsQuery } from '@/hooks/api/use-tags';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { Asset } from '@/shared/types/register';

// The newest few tell the recent story; older ones are a tap away.
const HISTORY_SHOWN = 5;

/** The item's tags on its record: state banner, live tags, raise buttons and the item's whole tag history. */
export function AssetTagsPanel({ asset }: { asset: Asset }) {
  const router = useRouter();
  const now = useNow();
  const { isWide } = useBreakpoints();
  const me = useMeQuery().data;
  const tags = useTagsQuery({ assetId: asset.id });
  const [showAll, setShowAll] = useState(false);
  const all = tags.data?.items ?? [];
  const live = all.filter((t) => t.status === 'live');
  const mine = me ? live.some((t) => t.kind === 'isolation' && t.holder.id === me.id) : false;
  const othersIsolating = live.some((t) => t.kind === 'isolation' && t.holder.id !== me?.id);
  const canRaise = usePermissions().may('raiseTag');
  const raise = (kind: 'isolation' | 'override') => router.push({ pathname: '/tags/new', params: { assetId: String(asset.id), kind } });

  return (
    <View style={{ gap: space.md }} testID="asset-tags-panel">
      {tags.isError ? (
        <Notice tone="danger" word="Cannot load tags">{`${errorMessage(tags.error)} The item's state is unknown until the tags load.`}</Notice>
      ) : tags.data ? (
        <AssetStateBanner tags={live} />
      ) : (
        <Text muted>Loading the item’s tags…</Text>
      )}

      {live.length ? (
        <View style={{ gap: space.sm }}>
          <Text variant="title">{`Live tags (${live.length})`}</Text>
          <View style={{ gap: space.sm }} testID="asset-live-tags">
            {live.map((t) => <TagCard key={t.id} tag={t} now={now} />)}
          </View>
        </View>
      ) : null}

      {canRaise ? (
        <View style={{ gap: space.sm }}>
          {asset.archived ? (
            <Notice tone="info" word="Archived">This item is archived, so no tags can be raised on it.</Notice>
          ) : othersIsolating && !mine ? (
            <Text variant="small" muted>Group isolation: if you work on this item too, put on your own isolation tag. It stays isolated until the last tag is cleared.</Text>
          ) : null}
          <View style={{ flexDirection: isWide ? 'row' : 'column', gap: space.sm }}>
            <Button title={othersIsolating && !mine ? 'Add my isolation tag' : 'Raise isolation'} disabled={asset.archived} onPress={() => raise('isolation')} testID="raise-isolation" />
            <Button title="Raise override" variant="secondary" disabled={asset.archived} onPress={() => raise('override')} testID="raise-override" />
          </View>
        </View>
      ) : null}

      {tags.data ? (
        <Card>
          <Text variant="title">Tag history</Text>
          {all.length ? (
            <>
              <Text variant="small" muted>Every tag this item has carried, newest first. Tap one for its full timeline.</Text>
              <TagHistoryList tags={all} now={now} limit={showAll ? undefined : HISTORY_SHOWN} />
              {!showAll && all.length > HISTORY_SHOWN ? <Button title={`Show all ${all.length} tags`} variant="secondary" onPress={() => setShowAll(true)} testID="history-show-all" /> : null}
            </>
          ) : (
            <Text muted>This item has never been tagged.</Text>
          )}
          {tags.data.total > all.length ? <Text variant="small" muted>{`Showing the latest ${all.length} of ${tags.data.total} tags.`}</Text> : null}
        </Card>
      ) : null}
    </View>
  );
}
