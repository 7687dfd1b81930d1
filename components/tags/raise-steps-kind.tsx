import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { ReasonField } from '@/components/tags/form-pieces';
import type { RaiseValues } from '@/components/tags/raise-form-values';
import { KIND_LOOK, TONE_COLORS } from '@/components/tags/tag-vocabulary';
import { MIN_RAISE_REASON, TAG_KINDS, type TagKind } from '@/shared/rules/tags';

export interface StepProps {
  values: RaiseValues;
  set: <K extends keyof RaiseValues>(key: K, value: RaiseValues[K]) => void;
  /** Errors to show now, keyed as the server keys them. */
  errors: Record<string, string | undefined>;
}

/** Step 1: isolation or override, and why. */
export function KindReasonStep({ values, set, errors }: StepProps) {
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
      {errors.kind ? <Text variant="small" style={{ color: colors.danger }}>{`⚠ ${errors.kind}`}</Text> : null}
      <ReasonField
        label="Reason"
        hint={values.kind === 'isolation' ? 'The work being done, e.g. “Replace mechanical seal”.' : 'Why it was left this way, e.g. “Setpoint raised to test the calorifier”.'}
        value={values.reason}
        onChange={(t) => set('reason', t)}
        min={MIN_RAISE_REASON}
        error={errors.reason}
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
