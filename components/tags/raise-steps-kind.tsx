import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { useFormikContext } from 'formik';
import { FieldMessage } from '@/components/forms/bound-fields';
import { FormReasonField } from '@/components/forms/reason-field';
import type { RaiseValues } from '@/components/tags/raise-form-values';
import { KIND_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import { MIN_RAISE_REASON, TAG_KINDS, type TagKind } from '@/shared/rules/tags';

/** The raise form's values and a typed setter, for the steps' own widgets (chips, lists). */
export function useRaiseForm() {
  const { values, setFieldValue } = useFormikContext<RaiseValues>();
  const set = <K extends keyof RaiseValues>(key: K, value: RaiseValues[K]) => void setFieldValue(key, value);
  return { values, set };
}

/** Step 1: isolation or override, and why. */
export function KindReasonStep() {
  const { values, set } = useRaiseForm();
  return (
    <View style={{ gap: space.md }}>
      <View style={styles.kinds} role="radiogroup" aria-label="Kind of tag">
        {TAG_KINDS.map((k: TagKind) => {
          const look = KIND_LOOK[k];
          const on = values.kind === k;
          const tone = TONE_COLORS[look.tone];
          return (
            <Pressable
              key={k}
              onPress={() => set('kind', k)}
              accessibilityRole="radio"
              accessibilityState={{ checked: on }}
              aria-checked={on}
              accessibilityLabel={look.word}
              testID={`kind-${k}`}
              style={StyleSheet.flatten([styles.kind, on && { borderColor: tone.solid, backgroundColor: tone.soft }])}
            >
              <View style={styles.kindHead}>
                <MaterialCommunityIcons name={on ? 'radiobox-marked' : 'radiobox-blank'} size={24} color={colors.ink} />
                <MaterialCommunityIcons name={look.icon} size={24} color={colors.ink} />
                <Text variant="title">{look.word}</Text>
              </View>
              <Text variant="small">{look.explain}</Text>
            </Pressable>
          );
        })}
      </View>
      <FieldMessage name="kind" />
      <FormReasonField
        name="reason"
        label="Reason"
        hint={values.kind === 'isolation' ? 'The work being done, e.g. “Replace mechanical seal”.' : 'Why it was left this way, e.g. “Setpoint raised to test the calorifier”.'}
        min={MIN_RAISE_REASON}
        testID="raise-reason"
      />
    </View>
  );
}

const styles = StyleSheet.create({
  kinds: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  kind: { flexGrow: 1, flexBasis: 260, gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 3, borderColor: colors.line, backgroundColor: colors.surface },
  kindHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
