import { MaterialCommunityIcons } from '@/components/ui/icons';
import type { ComponentProps } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

type IconName = ComponentProps<typeof MaterialCommunityIcons>['name'];

/**
 * A label with an icon. With `onPress` it is a toggle: a selected chip shows a tick and a filled
 * background, so the state does not rest on colour alone.
 */
export function Chip({ label, icon, selected, onPress, testID }: { label: string; icon?: IconName; selected?: boolean; onPress?: () => void; testID?: string }) {
  const content = (
    <>
      {onPress ? <MaterialCommunityIcons name={selected ? 'check-circle' : 'circle-outline'} size={20} color={selected ? colors.brandInk : colors.inkMuted} /> : null}
      {icon ? <MaterialCommunityIcons name={icon} size={20} color={selected ? colors.brandInk : colors.ink} /> : null}
      <Text variant="label" bold={selected} style={{ color: selected ? colors.brandInk : colors.ink }}>{label}</Text>
    </>
  );
  if (!onPress) return <View style={[styles.chip, styles.static]} testID={testID}>{content}</View>;
  return (
    <Pressable
      onPress={onPress}
      accessibilityRole="checkbox"
      accessibilityState={{ checked: !!selected }}
      accessibilityLabel={label}
      testID={testID}
      style={({ pressed }) => [styles.chip, styles.toggle, selected && styles.selected, pressed && { opacity: 0.8 }]}
    >
      {content}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { flexDirection: 'row', alignItems: 'center', gap: space.xs, paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 2 },
  static: { minHeight: 36, borderColor: colors.line, backgroundColor: colors.surface },
  toggle: { minHeight: layout.minTouch, borderColor: colors.ink, backgroundColor: colors.surface },
  selected: { backgroundColor: colors.brand, borderColor: colors.brand },
});
