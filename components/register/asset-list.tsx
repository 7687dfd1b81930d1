import { ActivityIndicator, View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Text } from '@/components/ui/text';
import { AssetCard } from '@/components/register/asset-card';
import type { Asset } from '@/shared/types/register';

interface Props {
  items: Asset[];
  total: number;
  busy: boolean;
  onMore?: () => void;
  showPlace?: boolean;
  emptyTitle?: string;
  emptyText?: string;
}

/** Plant items as cards (phones), with a "show more" instead of page numbers. */
export function AssetList({ items, total, busy, onMore, showPlace, emptyTitle = 'No plant items match', emptyText = 'Try fewer words or clear the filters.' }: Props) {
  if (items.length === 0 && !busy) return <EmptyState icon="magnify" title={emptyTitle}>{emptyText}</EmptyState>;
  return (
    <View style={{ gap: space.sm }} testID="asset-list">
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm }}>
        <Text variant="small" muted style={{ flex: 1 }}>{`${total} ${total === 1 ? 'item' : 'items'}`}</Text>
        {busy ? <ActivityIndicator color={colors.brand} accessibilityLabel="Loading" /> : null}
      </View>
      {items.map((a) => <AssetCard key={a.id} asset={a} showPlace={showPlace} />)}
      {onMore && items.length < total ? <Button title="Show more" variant="secondary" onPress={onMore} busy={busy} testID="show-more" /> : null}
    </View>
  );
}
