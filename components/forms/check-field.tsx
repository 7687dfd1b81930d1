import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { useBoundField } from '@/components/forms/bound-fields';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

/** A tick box bound to a true/false field, with a label long enough to wrap; the tick and the word "Confirmed" carry the state. */
export function FormCheckField({ name, label, testID }: { name: string; label: string; testID?: string }) {
  const field = useBoundField<boolean>(name);
  const checked = !!field.value;
  return (
    <View style={{ gap: 2 }}>
      <Pressable
        onPress={() => field.set(!checked)}
        accessibilityRole="checkbox"
        accessibilityState={{ checked }}
        aria-checked={checked}
        accessibilityLabel={label}
        testID={testID ?? `field-${name}`}
        style={({ pressed }) => [styles.check, checked && styles.checkOn, field.error ? styles.checkError : null, pressed && { opacity: 0.85 }]}
      >
        <MaterialCommunityIcons name={checked ? 'checkbox-marked' : 'checkbox-blank-outline'} size={28} color={checked ? colors.safe : colors.ink} />
        <Text style={{ flex: 1 }}>{label}</Text>
        {checked ? <Text variant="small" bold style={{ color: colors.safe }}>Confirmed</Text> : null}
      </Pressable>
      {field.error ? <Text variant="small" style={{ color: colors.danger }}>{`⚠ ${field.error}`}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  check: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouch + 4, paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  checkOn: { borderColor: colors.safe, backgroundColor: colors.safeSoft },
  checkError: { borderColor: colors.danger },
});
