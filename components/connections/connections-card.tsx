import { useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { AddConnectionForm } from '@/components/connections/add-connection-form';
import { ClosingAffectsNotice } from '@/components/connections/closing-affects-notice';
import { ConnectionRow } from '@/components/connections/connection-row';
import { errorMessage } from '@/hooks/api/request';
import { useAssetConnectionsQuery, useDeleteConnectionMutation } from '@/hooks/api/use-connections';
import { usePermissions } from '@/hooks/auth/use-permissions';
import type { Connection, ItemRef } from '@/shared/types/connections';
import type { Asset } from '@/shared/types/register';

/** The item's links ("supplied from", "supplies"), editing them, what closing it affects, and the way to its plan. */
export function ConnectionsCard({ asset }: { asset: Asset }) {
  const router = useRouter();
  const perms = usePermissions();
  const links = useAssetConnectionsQuery(asset.id);
  const remove = useDeleteConnectionMutation();
  const [adding, setAdding] = useState(false);
  const list = (title: string, rows: Connection[], other: (c: Connection) => ItemRef, empty: string, testID: string) => (
    <View style={{ gap: space.xs }} testID={testID}>
      <Text variant="label" bold>{title}</Text>
      {rows.length ? rows.map((c) => (
        <ConnectionRow key={c.id} connection={c} other={other(c)} removing={remove.isPending && remove.variables === c.id}
          onRemove={perms.canEditRecord(c.createdBy) && !asset.archived ? () => remove.mutate(c.id) : undefined} />
      )) : <Text variant="small" muted>{empty}</Text>}
    </View>
  );
  return (
    <Card>
      <Text variant="title">Connections</Text>
      <ClosingAffectsNotice assetId={asset.id} />
      {links.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(links.error)}</Notice> : null}
      {links.data ? (
        <>
          {list('Supplied from', links.data.from, (c) => c.from, 'No supply recorded.', 'supplied-from')}
          {list('Supplies', links.data.to, (c) => c.to, 'Supplies nothing recorded.', 'supplies')}
        </>
      ) : <LoadingView />}
      {remove.isError ? <Notice tone="danger" word="Not removed">{errorMessage(remove.error)}</Notice> : null}
      {perms.canAdd && !asset.archived ? (
        adding ? <AddConnectionForm asset={asset} /> : <Button title="Add a connection" variant="secondary" onPress={() => setAdding(true)} testID="connection-open-add" />
      ) : null}
      {asset.plantRoomId && (links.data?.from.length || links.data?.to.length) ? (
        <Button title="Show on the room diagram" variant="secondary" onPress={() => router.push({ pathname: '/plant-rooms/[id]/diagram', params: { id: asset.plantRoomId!, focus: asset.id } })} testID="show-on-diagram" />
      ) : null}
      {!asset.archived ? <Button title="Plan an isolation" onPress={() => router.push(`/assets/${asset.id}/plan`)} testID="open-isolation-plan" /> : null}
    </Card>
  );
}
