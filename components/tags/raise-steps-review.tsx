import { View } from 'react-native';
import { space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { DetailList } from '@/components/register/detail-list';
import { ExpiryPicker } from '@/components/tags/expiry-picker';
import type { StepProps } from '@/components/tags/raise-steps-kind';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import type { Role } from '@/shared/rules/roles';
import type { Asset } from '@/shared/types/register';

/** Step 3: when the tag expires (at the site) and how to reach the holder. */
export function ExpiryContactStep({ values, set, errors, timeZone, role }: StepProps & { timeZone: string; role: Role }) {
  return (
    <View style={{ gap: space.md }}>
      <View style={{ gap: space.xs }}>
        <Text variant="label" bold>Expiry</Text>
        <ExpiryPicker value={values.expiresAt} onChange={(iso) => set('expiresAt', iso)} timeZone={timeZone} role={role} error={errors.expiresAt} testID="raise-expiry" />
      </View>
      <TextField
        label="Contact phone"
        hint="Where you can be reached while the tag is on, so nobody has to guess."
        value={values.contactPhone}
        onChangeText={(t) => set('contactPhone', t)}
        keyboardType="phone-pad"
        autoComplete="tel"
        error={errors.contactPhone}
        testID="raise-contact-phone"
      />
    </View>
  );
}

/** Step 4: everything as it will be recorded. */
export function RaiseReview({ values, asset, timeZone, holderName }: { values: StepProps['values']; asset: Asset; timeZone: string; holderName: string }) {
  const now = new Date();
  const valid = !Number.isNaN(Date.parse(values.expiresAt));
  const rows: [string, string][] = [
    ['Kind', KIND_LOOK[values.kind].word],
    ['Item', `${asset.plantId} · ${asset.name}`],
    ['Holder', `${holderName} (you)`],
    ['Reason', values.reason.trim()],
  ];
  if (values.kind === 'isolation') {
    rows.push(['Energy sources isolated', values.energySources.map((s) => ENERGY_SOURCE_LABELS[s]).join(', ')]);
    values.points.forEach((p, i) => {
      const where = p.asset ? `${p.asset.plantId} · ${p.asset.name}` : p.description.trim();
      rows.push([`Point ${i + 1}`, `${where || '—'} — ${p.method ? ISOLATION_METHOD_LABELS[p.method] : 'method not chosen'}`]);
    });
  } else {
    rows.push(['Normal state', values.normalState.trim()], ['Left in', values.leftState.trim()]);
  }
  rows.push(
    ['Lock or tag number', values.lockNumber.trim()],
    ['Expires', valid ? `${formatInZone(values.expiresAt, timeZone, now)} — ${expiryPhrase(values.expiresAt, now)}` : '—'],
    ['Contact phone', values.contactPhone.trim()],
  );
  return (
    <View style={{ gap: space.sm }} testID="raise-review">
      <DetailList rows={rows} />
    </View>
  );
}
