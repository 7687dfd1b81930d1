import { MaterialCommunityIcons } from '@/components/ui/icons';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Dialog } from '@/components/ui/dialog';
import { Text } from '@/components/ui/text';

export interface SelectOption<V extends string | number> {
  value: V;
  label: string;
}

interface Props<V extends string | number> {
  label: string;
  value: V | null;
  options: SelectOption<V>[];
  onChange: (value: V | null) => void;
  /** Shown when nothing is chosen; also offered as a choice that clears the value when `clearable`. */
  placeholder?: string;
  clearable?: boolean;
  error?: string | false;
  disabled?: boolean;
  /** Hide the visible label (filters in a toolbar); it stays as the accessible name. */
  hideLabel?: boolean;
  testID?: string;
}

/** A choice from a list, opened as a dialog of large rows: same on phones and the web, thumb-friendly. */
export function SelectField<V extends string | number>({ label, value, options, onChange, placeholder = 'Choose…', clearable, error, disabled, hideLabel, testID }: Props<V>) {
  const [open, setOpen] = useState(false);
  const current = options.find((o) => o.value === value);
  const choose = (v: V | null) => { onChange(v); setOpen(false); };
  return (
    <View style={[styles.wrap, hideLabel && { marginBottom: 0 }]}>
      {hideLabel ? null : <Text variant="label" bold>{label}</Text>}
      <Pressable
        onPress={() => setOpen(true)}
        disabled={disabled}
        accessibilityRole="button"
        accessibilityLabel={`${label}: ${current?.label ?? placeholder}`}
        testID={testID}
        style={StyleSheet.flatten([styles.field, error ? styles.fieldError : null, disabled ? { opacity: 0.55 } : null])}
      >
        <Text style={{ flex: 1, color: current ? colors.ink : colors.inkMuted }} numberOfLines={1}>{current?.label ?? placeholder}</Text>
        <MaterialCommunityIcons name="chevron-down" size={24} color={colors.ink} />
      </Pressable>
      {error ? <Text variant="small" style={{ color: colors.danger }}>⚠ {error}</Text> : null}
      <Dialog visible={open} title={label} onClose={() => setOpen(false)}>
        <View role="radiogroup" aria-label={label}>
          {clearable ? <Option label={placeholder} selected={value === null} onPress={() => choose(null)} /> : null}
          {options.map((o) => <Option key={String(o.value)} label={o.label} selected={o.value === value} onPress={() => choose(o.value)} />)}
        </View>
      </Dialog>
    </View>
  );
}

function Option({ label, selected, onPress }: { label: string; selected: boolean; onPress: () => void }) {
  return (
    <Pressable onPress={onPress} accessibilityRole="radio" accessibilityState={{ checked: selected }} accessibilityLabel={label} style={({ pressed }) => [styles.option, selected && styles.optionSelected, pressed && { opacity: 0.8 }]}>
      <MaterialCommunityIcons name={selected ? 'radiobox-marked' : 'radiobox-blank'} size={22} color={selected ? colors.brand : colors.inkMuted} />
      <Text bold={selected} style={{ flex: 1 }}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, marginBottom: space.md },
  field: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: layout.minTouch + 4, borderWidth: 2, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.surface, paddingHorizontal: space.md },
  fieldError: { borderColor: colors.danger },
  option: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouch + 4, paddingHorizontal: space.sm, borderRadius: radius.md },
  optionSelected: { backgroundColor: colors.surfaceSunk },
});
