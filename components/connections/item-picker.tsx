import { Pressable, View } from 'react-native';
import { useState } from 'react';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { useAssetsQuery } from '@/hooks/api/use-assets';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { ASSET_TYPE_LABELS } from '@/shared/rules/register';
import type { Asset } from '@/shared/types/register';

/** Finds an item of one site by plant ID, name or system; `accept` leaves out items that cannot be chosen. */
export function ItemPicker({ siteId, label, accept, chosen, onChoose }: {
  siteId: number;
  label: string;
  accept: (a: Asset) => boolean;
  chosen: Asset | null;
  onChoose: (a: Asset | null) => void;
}) {
  const [q, setQ] = useState('');
  const search = useDebouncedValue(q.trim(), 250);
  const results = useAssetsQuery({ q: search, siteId, pageSize: 20, sort: 'plantId' }, search.length > 0 && !chosen);
  const items = (results.data?.items ?? []).filter(accept).slice(0, 8);
  if (chosen) {
    return (
      <View style={{ gap: space.xs }}>
        <Text variant="label" bold>{label}</Text>
        <Pressable accessibilityRole="button" accessibilityLabel={`Change ${chosen.plantId}`} onPress={() => onChoose(null)} style={rowStyle(true)} testID="picker-chosen">
          <Text bold>{`${chosen.plantId} · ${chosen.name}`}</Text>
          <Text variant="small" muted>Tap to choose another item</Text>
        </Pressable>
      </View>
    );
  }
  return (
    <View style={{ gap: space.xs }}>
      <TextField label={label} value={q} onChangeText={setQ} placeholder="Plant ID, name or system" autoCapitalize="none" testID="picker-search" />
      {search && results.data && !items.length ? <Text variant="small" muted>No item on this site matches and can take this link.</Text> : null}
      {items.map((a) => (
        <Pressable key={a.id} accessibilityRole="button" onPress={() => onChoose(a)} style={rowStyle(false)} testID={`pick-${a.plantId}`}>
          <Text bold>{`${a.plantId} · ${a.name}`}</Text>
          <Text variant="small" muted>{[ASSET_TYPE_LABELS[a.type], a.plantRoomName].filter(Boolean).join(' · ')}</Text>
        </Pressable>
      ))}
    </View>
  );
}

const rowStyle = (selected: boolean) => ({
  minHeight: layout.minTouch + 4,
  justifyContent: 'center' as const,
  paddingHorizontal: space.md,
  paddingVertical: space.xs,
  borderRadius: radius.md,
  borderWidth: 2,
  borderColor: selected ? colors.brand : colors.line,
  backgroundColor: colors.surface,
});
