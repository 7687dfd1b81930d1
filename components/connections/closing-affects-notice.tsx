import { Link } from 'expo-router';
import { Text as RNText } from 'react-native';
import { colors } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { useClosingAffectsQuery } from '@/hooks/api/use-connections';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import type { ItemRef } from '@/shared/types/connections';

export function ItemLinks({ items }: { items: ItemRef[] }) {
  return (
    <Text>
      {items.map((i, n) => (
        <RNText key={i.id}>
          {n ? ', ' : ''}
          <Link href={`/assets/${i.id}`} style={{ color: colors.brand, textDecorationLine: 'underline' }}>{`${i.plantId} ${i.name}`}</Link>
        </RNText>
      ))}
    </Text>
  );
}

/** On a valve's or isolator's record: what else loses its supply when this is closed. */
export function ClosingAffectsNotice({ assetId }: { assetId: number }) {
  const q = useClosingAffectsQuery(assetId);
  const affected = (q.data?.affects ?? []).filter((a) => a.items.length);
  if (!q.data?.isolating || !q.data.affects.length) return null;
  return (
    <Notice tone="caution" word="Closing this affects">
      {affected.length ? (
        affected.map((a) => (
          <Text key={a.source} testID={`closing-affects-${a.source}`}>
            <Text bold>{`${ENERGY_SOURCE_LABELS[a.source]}: `}</Text>
            <ItemLinks items={a.items} />
          </Text>
        ))
      ) : <Text>No other recorded item loses its supply. Check on site: the register may not show everything.</Text>}
    </Notice>
  );
}
