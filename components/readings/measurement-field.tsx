import { getIn, useFormikContext } from 'formik';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { useFieldError } from '@/components/forms/bound-fields';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { FieldFrame, inputStyle } from '@/components/ui/text-field';

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
function MeasurementField({ label, value, onChangeText, onBlur, unit, units, onUnitChange, hint, error, placeholder, testID }: Props) {
  const single = units.length <= 1;
  return (
    <FieldFrame label={label} hint={hint} error={error} labelID={testID ? `${testID}-label` : undefined}>
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
          style={[...inputStyle(error), styles.input]}
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
    </FieldFrame>
  );
}

type BoundProps = Omit<Props, 'value' | 'onChangeText' | 'onBlur' | 'unit' | 'onUnitChange' | 'error'> & { entry: string; unitField?: string };

/** A measurement bound to a form: the typed text at `entry`, the chosen unit at `unitField` (or the only unit offered). */
export function FormMeasurementField({ entry, unitField, units, ...rest }: BoundProps) {
  const { values, handleChange, setFieldTouched, setFieldValue } = useFormikContext();
  const unit = unitField ? (getIn(values, unitField) as string) : units[0]?.key ?? '';
  return (
    <MeasurementField
      value={(getIn(values, entry) as string | undefined) ?? ''}
      onChangeText={handleChange(entry)}
      onBlur={() => void setFieldTouched(entry, true)}
      unit={unit}
      units={units}
      onUnitChange={unitField ? (u) => void setFieldValue(unitField, u) : undefined}
      error={useFieldError(entry)}
      {...rest}
    />
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'stretch', gap: space.sm },
  input: { flex: 1, minWidth: 0 },
  fixedUnit: { minWidth: layout.minTouch + 8, justifyContent: 'center', alignItems: 'center' },
  segments: { flexDirection: 'row', borderWidth: 2, borderColor: colors.ink, borderRadius: radius.md, overflow: 'hidden' },
  segment: { minWidth: layout.minTouch + 8, minHeight: layout.minTouch, paddingHorizontal: space.sm, justifyContent: 'center', alignItems: 'center', backgroundColor: colors.surface },
  segmentDivider: { borderLeftWidth: 1, borderLeftColor: colors.line },
  segmentSelected: { backgroundColor: colors.brand },
});
