import { View } from 'react-native';
import { space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { FormTextField } from '@/components/forms/bound-fields';
import { DetailList } from '@/components/register/detail-list';
import { FormExpiryField } from '@/components/tags/expiry-picker';
import type { RaiseValues } from '@/components/tags/raise-form-values';
import { expiryPhrase, formatInZone } from '@/components/tags/tag-time';
import { KIND_LOOK } from '@/components/tags/tag-vocabulary';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import type { Role } from '@/shared/rules/roles';
import type { Asset } from '@/shared/types/register';

/** Step 3: when the tag expires (at the site) and how to reach the holder. */
export function ExpiryContactStep({ timeZone, role }: { timeZone: string; role: Role }) {
  return (
    <View style={{ gap: space.md }}>
      <View style={{ gap: space.xs }}>
        <Text variant="label" bold>Expiry</Text>
        <FormExpiryField name="expiresAt" timeZone={timeZone} role={role} testID="raise-expiry" />
      </View>
      <FormTextField
        name="contactPhone"
        label="Contact phone"
        hint="Where you can be reached while the tag is on, so nobody has to guess."
        keyboardType="phone-pad"
        autoComplete="tel"
        testID="raise-contact-phone"
      />
    </View>
  );
}

/** Step 4: everything as it will be recorded. */
export function RaiseReview({ values, asset, timeZone, holderName }: { values: RaiseValues; asset: Asset; timeZone: string; holderName: string }) {
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
