import { useFormikContext } from 'formik';
import { View } from 'react-native';
import { FormCheckField } from '@/components/forms/check-field';
import { space } from '@/components/theme';
import { Text } from '@/components/ui/text';
import { RELEASE_CHECKS, RELEASE_CHECK_LABELS, type ReleaseCheck } from '@/shared/rules/tags';

export type ChecksValue = Record<ReleaseCheck, boolean>;
export const noChecks = (): ChecksValue => ({ workComplete: false, guardsRefitted: false, personnelClear: false, testedSafe: false });

/** The four release checks before an isolation comes off (OSHA 29 CFR 1910.147(e)(1)–(e)(2)), bound to `checks`. */
export function ReleaseChecks() {
  const { values } = useFormikContext<{ checks: ChecksValue }>();
  const done = RELEASE_CHECKS.filter((k) => values.checks[k]).length;
  return (
    <View style={{ gap: space.sm }} testID="release-checks">
      <Text variant="label" bold>{`Release checks (${done} of ${RELEASE_CHECKS.length} confirmed)`}</Text>
      <Text variant="small" muted>Confirm each one before the isolation comes off. Follow the site’s procedure for restoring energy.</Text>
      {RELEASE_CHECKS.map((k) => <FormCheckField key={k} name={`checks.${k}`} label={RELEASE_CHECK_LABELS[k]} testID={`check-${k}`} />)}
    </View>
  );
}
