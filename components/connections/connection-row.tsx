import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { MEDIUM_ICONS } from '@/components/connections/connection-vocabulary';
import { MEDIUM_LABELS } from '@/shared/rules/connections';
import type { Connection, ItemRef } from '@/shared/types/connections';

/** One link as seen from an item: the medium, the item at the other end (opens it) and, if allowed, Remove. */
export function ConnectionRow({ connection, other, onRemove, removing }: { connection: Connection; other: ItemRef; onRemove?: () => void; removing?: boolean }) {
  return (
    <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' }} testID={`connection-${connection.id}`}>
      <MaterialCommunityIcons name={MEDIUM_ICONS[connection.medium]} size={22} color={colors.ink} />
      <Text variant="small" bold style={{ minWidth: 96 }}>{MEDIUM_LABELS[connection.medium]}</Text>
      <Link href={`/assets/${other.id}`} style={{ flex: 1, minHeight: 48, paddingVertical: space.sm }}>
        <Text style={{ color: colors.brand, textDecorationLine: 'underline' }}>{`${other.plantId} · ${other.name}`}</Text>
      </Link>
      {onRemove ? <Button title="Remove" variant="quiet" onPress={onRemove} busy={removing} accessibilityLabel={`Remove the ${MEDIUM_LABELS[connection.medium].toLowerCase()} link with ${other.plantId}`} /> : null}
    </View>
  );
}
