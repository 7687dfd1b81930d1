import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, layout, radius, space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { RELEASE_CHECKS, RELEASE_CHECK_LABELS, type ReleaseCheck } from '@/shared/rules/tags';

/** A tick box with a label long enough to wrap; the tick and the word "Confirmed" carry the state. */
export function CheckRow({ label, checked, onChange, error, testID }: { label: string; checked: boolean; onChange: (v: boolean) => void; error?: string; testID?: string }) {
  return (
    <View style={{ gap: 2 }}>
      <Pressable
        onPress={() => onChange(!checked)}
        accessibilityRole="checkbox"
        accessibilityState={{ checked }}
        aria-checked={checked}
        accessibilityLabel={label}
        testID={testID}
        style={({ pressed }) => [styles.check, checked && styles.checkOn, error ? styles.checkError : null, pressed && { opacity: 0.85 }]}
      >
        <MaterialCommunityIcons name={checked ? 'checkbox-marked' : 'checkbox-blank-outline'} size={28} color={checked ? colors.safe : colors.ink} />
        <Text style={{ flex: 1 }}>{label}</Text>
        {checked ? <Text variant="small" bold style={{ color: colors.safe }}>Confirmed</Text> : null}
      </Pressable>
      {error ? <Text variant="small" style={{ color: colors.danger }}>{`⚠ ${error}`}</Text> : null}
    </View>
  );
}

export type ChecksValue = Record<ReleaseCheck, boolean>;
export const noChecks = (): ChecksValue => ({ workComplete: false, guardsRefitted: false, personnelClear: false, testedSafe: false });

/** The four release checks before an isolation comes off (OSHA 29 CFR 1910.147(e)(1)–(e)(2)). */
export function ReleaseChecks({ value, onChange, errors, showErrors }: { value: ChecksValue; onChange: (next: ChecksValue) => void; errors?: Partial<Record<string, string>>; showErrors: boolean }) {
  const done = RELEASE_CHECKS.filter((k) => value[k]).length;
  return (
    <View style={{ gap: space.sm }} testID="release-checks">
      <Text variant="label" bold>{`Release checks (${done} of ${RELEASE_CHECKS.length} confirmed)`}</Text>
      <Text variant="small" muted>Confirm each one before the isolation comes off. Follow the site’s procedure for restoring energy.</Text>
      {RELEASE_CHECKS.map((k) => (
        <CheckRow
          key={k}
          label={RELEASE_CHECK_LABELS[k]}
          checked={value[k]}
          onChange={(v) => onChange({ ...value, [k]: v })}
          error={showErrors && !value[k] ? errors?.[`checks.${k}`] ?? 'Confirm this before clearing.' : undefined}
          testID={`check-${k}`}
        />
      ))}
    </View>
  );
}

/** A reason box that explains, while typing, how much more the record needs. */
export function ReasonField({ label, value, onChange, onBlur, min, error, hint, testID }: {
  label: string; value: string; onChange: (t: string) => void; onBlur?: () => void; min: number; error?: string; hint?: string; testID?: string;
}) {
  const n = value.trim().length;
  const enough = n >= min;
  const progress = n === 0 ? `At least ${min} characters.` : enough ? `${n} characters — enough detail.` : `${n} of at least ${min} characters: ${min - n} more.`;
  return (
    <View>
      <TextField
        label={label}
        hint={hint}
        value={value}
        onChangeText={onChange}
        onBlur={onBlur}
        multiline
        numberOfLines={3}
        style={styles.multi}
        error={error}
        testID={testID}
      />
      <View style={styles.progress} accessibilityLiveRegion="polite">
        <MaterialCommunityIcons name={enough ? 'check-circle' : 'information-outline'} size={18} color={enough ? colors.safe : colors.inkMuted} />
        <Text variant="small" muted={!enough} style={{ flex: 1 }} testID={testID ? `${testID}-progress` : undefined}>{progress}</Text>
      </View>
    </View>
  );
}

export const multilineStyle = { minHeight: 88, paddingTop: space.sm, textAlignVertical: 'top' as const };

const styles = StyleSheet.create({
  check: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: layout.minTouch + 4, paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  checkOn: { borderColor: colors.safe, backgroundColor: colors.safeSoft },
  checkError: { borderColor: colors.danger },
  multi: multilineStyle,
  progress: { flexDirection: 'row', alignItems: 'center', gap: space.xs, marginTop: -space.sm, marginBottom: space.md },
});
