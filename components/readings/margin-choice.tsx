import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { formatNumber, PRE_CHARGE_MARGIN_CHOICES } from '@/shared/calc';

/** The pre-charge margin, where published practice differs: each choice shows its source; the first is the default. */
export function MarginChoice({ value, onChange }: { value: number | null; onChange: (value: number) => void }) {
  const current = value ?? PRE_CHARGE_MARGIN_CHOICES[0].value;
  return (
    <View style={{ gap: space.sm }} role="radiogroup" aria-label="Pre-charge margin">
      <Text variant="label" bold>Pre-charge margin above the static head</Text>
      {PRE_CHARGE_MARGIN_CHOICES.map((c, i) => {
        const selected = current === c.value;
        return (
          <Pressable key={c.value} role="radio" aria-checked={selected} onPress={() => onChange(c.value)} testID={`margin-${c.value}`} style={StyleSheet.flatten([styles.choice, selected && styles.choiceOn])}>
            <MaterialCommunityIcons name={selected ? 'radiobox-marked' : 'radiobox-blank'} size={24} color={selected ? colors.brand : colors.inkMuted} />
            <View style={{ flex: 1 }}>
              <Text bold>{`${formatNumber(c.value)} bar${i === 0 ? ' (default)' : ''}`}</Text>
              <Text variant="small" muted>{c.source}</Text>
            </View>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  choice: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm, padding: space.md, borderWidth: 2, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface },
  choiceOn: { borderColor: colors.brand },
});
