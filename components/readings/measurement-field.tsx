import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { colors, fonts, layout, radius, space, type as typeScale } from '@/components/theme';
import { Text } from '@/components/ui/text';

export interface UnitOption {
  key: string;
  label: string;
}

interface Props {
  label: string;
  value: string;
  onChangeText: (text: string) => void;
  onBlur?: () => void;
  unit: string;
  units: readonly UnitOption[];
  onUnitChange?: (unit: string) => void;
  hint?: string;
  error?: string | false;
  placeholder?: string;
  testID?: string;
}

/** A number with its unit: the unit is a choice beside the box when more than one is offered. */
export function MeasurementField({ label, value, onChangeText, onBlur, unit, units, onUnitChange, hint, error, placeholder, testID }: Props) {
  const single = units.length <= 1;
  return (
    <View style={styles.wrap}>
      <Text variant="label" bold nativeID={testID ? `${testID}-label` : undefined}>{label}</Text>
      {hint ? <Text variant="small" muted>{hint}</Text> : null}
      <View style={styles.row}>
        <TextInput
          value={value}
          onChangeText={onChangeText}
          onBlur={onBlur}
          accessibilityLabel={`${label} in ${units.find((u) => u.key === unit)?.label ?? unit}`}
          inputMode="decimal"
          keyboardType="numbers-and-punctuation"
          placeholder={placeholder}
          placeholderTextColor={colors.inkMuted}
          testID={testID}
          style={[styles.input, error ? styles.inputError : null]}
        />
        {single ? (
          <View style={styles.fixedUnit}><Text bold>{units[0]?.label ?? unit}</Text></View>
        ) : (
          <View style={styles.segments} role="radiogroup" aria-label={`${label} unit`}>
            {units.map((u, i) => {
              const selected = u.key === unit;
              return (
                <Pressable
                  key={u.key}
                  role="radio"
                  aria-checked={selected}
                  accessibilityLabel={`${label} in ${u.label}`}
                  onPress={() => onUnitChange?.(u.key)}
                  testID={testID ? `${testID}-unit-${u.key}` : undefined}
                  style={StyleSheet.flatten([styles.segment, i > 0 && styles.segmentDivider, selected && styles.segmentSelected])}
                >
                  <Text variant="label" bold={selected} style={{ color: selected ? colors.brandInk : colors.ink }}>{u.label}</Text>
                </Pressable>
              );
            })}
          </View>
        )}
      </View>
      {error ? (
        <Text variant="small" style={styles.error} accessibilityLiveRegion="polite">⚠ {error}</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, marginBottom: space.md },
  row: { flexDirection: 'row', alignItems: 'stretch', gap: space.sm },
  input: {
    ...typeScale.body,
    fontFamily: fonts.regular,
    flex: 1,
    minWidth: 0,
    minHeight: layout.minTouch + 4,
    borderWidth: 2,
    borderColor: colors.line,
    borderRadius: radius.md,
    backgroundColor: colors.surface,
    paddingHorizontal: space.md,
    color: colors.ink,
  },
  inputError: { borderColor: colors.danger },
  fixedUnit: { minWidth: layout.minTouch + 8, justifyContent: 'center', alignItems: 'center' },
  segments: { flexDirection: 'row', borderWidth: 2, borderColor: colors.ink, borderRadius: radius.md, overflow: 'hidden' },
  segment: { minWidth: layout.minTouch + 8, minHeight: layout.minTouch, paddingHorizontal: space.sm, justifyContent: 'center', alignItems: 'center', backgroundColor: colors.surface },
  segmentDivider: { borderLeftWidth: 1, borderLeftColor: colors.line },
  segmentSelected: { backgroundColor: colors.brand },
  error: { color: colors.danger },
});
