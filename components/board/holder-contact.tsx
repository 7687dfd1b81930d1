import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Linking, Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { telHref } from '@/components/board/board-vocabulary';
import type { BoardRow } from '@/shared/types/board';

/** The holder's name and, when the tag carries one, their phone number as a tap-to-call link. */
export function HolderContact({ row, testID }: { row: Pick<BoardRow, 'id' | 'holder' | 'contactPhone'>; testID?: string }) {
  const phone = row.contactPhone.trim();
  return (
    <View style={{ gap: 2 }}>
      <Text variant="small" bold numberOfLines={2}>{row.holder.name}</Text>
      {phone ? (
        <Pressable
          accessibilityRole="link"
          accessibilityLabel={`Call ${row.holder.name} on ${phone}`}
          // A call must not also open the tag behind it.
          onPress={(e) => { e.stopPropagation?.(); void Linking.openURL(telHref(phone)); }}
          style={styles.call}
          testID={testID ?? `board-call-${row.id}`}
        >
          <MaterialCommunityIcons name="phone" size={16} color={colors.brand} />
          <Text variant="small" style={styles.number}>{phone}</Text>
        </Pressable>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  call: { flexDirection: 'row', alignItems: 'center', gap: space.xs, minHeight: layout.minTouch / 1.5, alignSelf: 'flex-start' },
  number: { color: colors.brand, textDecorationLine: 'underline' },
});
