import { useState } from 'react';
import { useBoundField } from '@/components/forms/bound-fields';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { expiryPhrase, formatInZone, localFields, parseLocal, quickExpiry, zoneName, type QuickExpiry } from '@/components/tags/tag-time';
import { maxExpiryDays } from '@/shared/rules/tags';
import type { Role } from '@/shared/rules/roles';

type ExpiryChoice = QuickExpiry | 'custom';

/** A value the shared schema reads as "not a valid date", so the form says so in its own words. */
const UNREADABLE_EXPIRY = 'unreadable';

const QUICK: { key: QuickExpiry; label: string }[] = [
  { key: 'end-today', label: 'End of today' },
  { key: 'plus-4h', label: '+4 h' },
  { key: 'end-tomorrow', label: 'End of tomorrow' },
];

interface Props {
  value: string;
  onChange: (iso: string) => void;
  timeZone: string;
  role: Role;
  error?: string;
  testID?: string;
}

/** Which quick choice a stored value came from, so a step shown again marks it. */
function choiceOf(value: string, timeZone: string): ExpiryChoice {
  const at = Date.parse(value);
  const now = new Date();
  if (at === quickExpiry('end-today', now, timeZone).getTime()) return 'end-today';
  if (at === quickExpiry('end-tomorrow', now, timeZone).getTime()) return 'end-tomorrow';
  return 'custom';
}

/** Quick choices plus a precise date and time typed in site-local time; the result is shown in words with its zone. */
function ExpiryPicker({ value, onChange, timeZone, role, error, testID = 'expiry' }: Props) {
  const [choice, setChoice] = useState<ExpiryChoice>(() => choiceOf(value, timeZone));
  const valid = value && !Number.isNaN(Date.parse(value)) ? new Date(value) : null;
  const [fields, setFields] = useState(() => (valid ? localFields(valid, timeZone) : { date: '', time: '' }));
  const now = new Date();

  const pick = (key: QuickExpiry) => {
    const at = quickExpiry(key, new Date(), timeZone);
    setChoice(key);
    setFields(localFields(at, timeZone));
    onChange(at.toISOString());
  };
  const type = (next: { date: string; time: string }) => {
    setChoice('custom');
    setFields(next);
    const at = parseLocal(next.date, next.time, timeZone);
    onChange(at ? at.toISOString() : UNREADABLE_EXPIRY);
  };

  return (
    <View style={{ gap: space.sm }} testID={testID}>
      <View style={styles.chips}>
        {QUICK.map((q) => <Chip key={q.key} label={q.label} selected={choice === q.key} onPress={() => pick(q.key)} testID={`${testID}-${q.key}`} />)}
      </View>
      <View style={styles.fields}>
        <View style={{ flex: 3, minWidth: 150 }}>
          <TextField label="Date at the site" hint="YYYY-MM-DD" value={fields.date} onChangeText={(date) => type({ ...fields, date })} autoCapitalize="none" inputMode="numeric" testID={`${testID}-date`} />
        </View>
        <View style={{ flex: 2, minWidth: 110 }}>
          <TextField label="Time at the site" hint="24-hour HH:MM" value={fields.time} onChangeText={(time) => type({ ...fields, time })} autoCapitalize="none" inputMode="numeric" testID={`${testID}-time`} />
        </View>
      </View>
      <View style={[styles.result, error ? styles.resultError : null]} testID={`${testID}-summary`}>
        {valid ? (
          <>
            <Text bold>{`Expires ${formatInZone(valid, timeZone, now)}`}</Text>
            <Text variant="small">{valid > now ? expiryPhrase(valid.toISOString(), now) : 'This time has already passed.'}</Text>
          </>
        ) : (
          <Text bold>{value ? 'That date and time cannot be read.' : 'No expiry chosen yet.'}</Text>
        )}
        <Text variant="small" muted>{`Times are at the site (${zoneName(timeZone)}). Your role may set up to ${maxExpiryDays(role)} days ahead. A tag never clears itself: past its expiry it stays in force, marked “past expiry”, until a person clears it.`}</Text>
      </View>
      {error ? <Text variant="small" style={{ color: colors.danger }} accessibilityLiveRegion="polite">{`⚠ ${error}`}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  fields: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  result: { gap: 2, padding: space.md, borderRadius: radius.md, borderWidth: 2, borderColor: colors.line, backgroundColor: colors.surface },
  resultError: { borderColor: colors.danger },
});

/** The expiry picker bound to a form's field (an ISO time, or UNREADABLE_EXPIRY while the typed one cannot be read). */
export function FormExpiryField({ name, ...rest }: Omit<Props, 'value' | 'onChange' | 'error'> & { name: string }) {
  const field = useBoundField<string>(name);
  return <ExpiryPicker value={field.value} onChange={field.set} error={field.error} {...rest} />;
}
