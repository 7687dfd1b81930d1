import { useMemo, useState } from 'react';
import { View } from 'react-native';
import { ReadingSetCard } from '@/components/readings/reading-set-card';
import { ReadingsForm } from '@/components/readings/readings-form';
import { SystemPanel } from '@/components/readings/system-panel';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { lazyPart } from '@/components/ui/lazy-part';
import { errorMessage } from '@/hooks/api/request';
import { useReadingsQuery } from '@/hooks/api/use-readings';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { ReadingSet } from '@/shared/types/readings';
import type { Asset } from '@/shared/types/register';

const TrendChart = lazyPart(() => import('@/components/readings/trend-chart').then((m) => m.TrendChart));

const LATEST_SHOWN = 3;

/** Current sets newest first, each with the sets it superseded (nearest first). */
function withHistory(items: ReadingSet[]): { set: ReadingSet; history: ReadingSet[] }[] {
  const byId = new Map(items.map((r) => [r.id, r]));
  return items
    .filter((r) => !r.supersededBy)
    .map((set) => {
      const history: ReadingSet[] = [];
      for (let prev = set.supersedesId ? byId.get(set.supersedesId) : undefined; prev; prev = prev.supersedesId ? byId.get(prev.supersedesId) : undefined) {
        history.push(prev);
      }
      return { set, history };
    });
}

/** Readings and plant checks on an item's record: log a set, see the latest with their checks, and the trend. */
export function AssetReadingsSection({ asset }: { asset: Asset }) {
  const readings = useReadingsQuery(asset.id);
  const { canAdd, userId } = usePermissions();
  const [mode, setMode] = useState<{ kind: 'closed' } | { kind: 'log' } | { kind: 'correct'; set: ReadingSet }>({ kind: 'closed' });
  const [showAll, setShowAll] = useState(false);
  const [saved, setSaved] = useState<ReadingSet | null>(null);
  const items = readings.data?.items;
  const current = useMemo(() => withHistory(items ?? []), [items]);
  const canLog = canAdd && !asset.archived;

  if (readings.isPending) return <Card><Text muted>Loading readings…</Text></Card>;
  if (readings.isError) return <Notice tone="danger" word="Readings not loaded">{errorMessage(readings.error)}</Notice>;
  const { checkSettings } = readings.data;
  const shown = showAll ? current : current.slice(0, LATEST_SHOWN);

  return (
    <View style={{ gap: space.lg }} testID="asset-readings">
      <Card>
        <Text variant="title">Readings and plant checks</Text>
        <SystemPanel siteId={asset.siteId} checkSettings={checkSettings} canEdit={canAdd} />
        {saved && mode.kind === 'closed' ? (
          <Notice tone={saved.flags.some((f) => f.level === 'danger') ? 'danger' : 'info'} word="Saved">
            {saved.flags.length ? `The set was stored with ${saved.flags.length} ${saved.flags.length === 1 ? 'flag' : 'flags'}: see below.` : 'The set was stored with no flags.'}
          </Notice>
        ) : null}
        {mode.kind === 'closed' && canLog ? (
          <Button title="Log readings" onPress={() => { setSaved(null); setMode({ kind: 'log' }); }} testID="readings-log" />
        ) : null}
        {mode.kind === 'log' ? (
          <ReadingsForm
            asset={asset}
            checkSettings={checkSettings}
            onDone={(set) => { setSaved(set); setMode({ kind: 'closed' }); }}
            onCancel={() => setMode({ kind: 'closed' })}
          />
        ) : null}
      </Card>
      <Card>
        <Text variant="title">Latest sets</Text>
        {current.length === 0 ? <Text muted>No readings logged on this item yet.</Text> : null}
        {shown.map(({ set, history }) =>
          mode.kind === 'correct' && mode.set.id === set.id ? (
            <ReadingsForm
              key={`correct-${set.id}`}
              asset={asset}
              checkSettings={checkSettings}
              correcting={set}
              onDone={(saved) => { setSaved(saved); setMode({ kind: 'closed' }); }}
              onCancel={() => setMode({ kind: 'closed' })}
            />
          ) : (
            <ReadingSetCard
              key={set.id}
              set={set}
              history={history}
              canCorrect={canLog && set.createdBy.id === userId && mode.kind === 'closed'}
              onCorrect={() => { setSaved(null); setMode({ kind: 'correct', set }); }}
            />
          ),
        )}
        {current.length > LATEST_SHOWN ? (
          <Button title={showAll ? 'Show the latest only' : `Show all ${current.length} sets`} variant="quiet" onPress={() => setShowAll((s) => !s)} />
        ) : null}
      </Card>
      <Card>
        <Text variant="title">Trend</Text>
        <TrendChart readings={items ?? []} checkSettings={checkSettings} />
      </Card>
    </View>
  );
}
