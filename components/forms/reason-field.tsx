import { MaterialCommunityIcons } from '@/components/ui/icons';
import { getIn, useFormikContext } from 'formik';
import { StyleSheet, View } from 'react-native';
import { FormTextField } from '@/components/forms/bound-fields';
import { colors, space } from '@/components/theme';
import { Text } from '@/components/ui/text';

/** A reason box bound to a field that explains, while typing, how much more the record needs. */
export function FormReasonField({ name, label, hint, min, testID }: { name: string; label: string; hint?: string; min: number; testID: string }) {
  const { values } = useFormikContext();
  const n = String(getIn(values, name) ?? '').trim().length;
  const enough = n >= min;
  const progress = n === 0 ? `At least ${min} characters.` : enough ? `${n} characters — enough detail.` : `${n} of at least ${min} characters: ${min - n} more.`;
  return (
    <View>
      <FormTextField name={name} label={label} hint={hint} multiline testID={testID} />
      <View style={styles.progress} accessibilityLiveRegion="polite">
        <MaterialCommunityIcons name={enough ? 'check-circle' : 'information-outline'} size={18} color={enough ? colors.safe : colors.inkMuted} />
        <Text variant="small" muted={!enough} style={{ flex: 1 }} testID={`${testID}-progress`}>{progress}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  progress: { flexDirection: 'row', alignItems: 'center', gap: space.xs, marginTop: -space.sm, marginBottom: space.md },
});
