import { MaterialCommunityIcons } from '@/components/ui/icons';
import { getIn, useFormikContext } from 'formik';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import type { ReadingFormValues } from '@/components/readings/reading-fields';
import { colors, layout, space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { inputStyle } from '@/components/ui/text-field';
import { MAX_SURFACE_TEMPERATURES } from '@/shared/schemas/readings';

/** Spot temperatures taken on surfaces (e.g. with an infrared thermometer): where, and how hot. */
export function SurfaceTemperaturesField({ showErrors }: { showErrors: boolean }) {
  const { values, errors, setFieldValue } = useFormikContext<ReadingFormValues>();
  const rows = values.surfaceTemperatures;
  const update = (i: number, key: 'location' | 'temperatureC', text: string) =>
    setFieldValue('surfaceTemperatures', rows.map((r, j) => (j === i ? { ...r, [key]: text } : r)));
  const remove = (i: number) => setFieldValue('surfaceTemperatures', rows.filter((_, j) => j !== i));
  return (
    <View style={styles.wrap}>
      <Text variant="label" bold>Surface temperatures</Text>
      <Text variant="small" muted>For example from an infrared thermometer: say where each was taken.</Text>
      {rows.map((row, i) => {
        const locationError = showErrors ? (getIn(errors, `surfaceTemperatures.${i}.location`) as string | undefined) : undefined;
        const tempError = showErrors ? (getIn(errors, `surfaceTemperatures.${i}.temperatureC`) as string | undefined) : undefined;
        return (
          <View key={i} style={styles.rowWrap}>
            <View style={styles.row}>
              <TextInput
                value={row.location}
                onChangeText={(t) => update(i, 'location', t)}
                placeholder="Where, e.g. pump casing"
                placeholderTextColor={colors.inkMuted}
                accessibilityLabel={`Surface ${i + 1} location`}
                testID={`surface-${i}-location`}
                style={[...inputStyle(locationError), styles.location]}
              />
              <TextInput
                value={row.temperatureC}
                onChangeText={(t) => update(i, 'temperatureC', t)}
                placeholder="°C"
                placeholderTextColor={colors.inkMuted}
                inputMode="decimal"
                accessibilityLabel={`Surface ${i + 1} temperature in °C`}
                testID={`surface-${i}-temperature`}
                style={[...inputStyle(tempError), styles.temperature]}
              />
              <Text bold>°C</Text>
              <Pressable onPress={() => remove(i)} accessibilityRole="button" accessibilityLabel={`Remove surface ${i + 1}`} style={styles.remove}>
                <MaterialCommunityIcons name="close" size={24} color={colors.ink} />
              </Pressable>
            </View>
            {locationError || tempError ? (
              <Text variant="small" style={{ color: colors.danger }}>⚠ {[locationError, tempError].filter(Boolean).join(' ')}</Text>
            ) : null}
          </View>
        );
      })}
      {rows.length < MAX_SURFACE_TEMPERATURES ? (
        <Button
          title="Add a surface temperature"
          variant="secondary"
          onPress={() => setFieldValue('surfaceTemperatures', [...rows, { location: '', temperatureC: '' }])}
          testID="surface-add"
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm, marginBottom: space.md },
  rowWrap: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  location: { flex: 1, minWidth: 0 },
  temperature: { width: layout.minTouch + 28 },
  remove: { minWidth: layout.minTouch, minHeight: layout.minTouch, alignItems: 'center', justifyContent: 'center' },
});
