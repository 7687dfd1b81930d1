import { View } from 'react-native';
import { space } from '@/components/theme';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { formatNumber } from '@/shared/calc';
import type { SystemExpansionCheck } from '@/shared/types/readings';

/** What the register says about a system's vessels, and what is still needed to run the check. */
export function SystemExpansionPanel({ check }: { check: SystemExpansionCheck }) {
  return (
    <Card>
      <Text variant="title">{`From the register: ${check.systemName}`}</Text>
      {check.vessels.length ? (
        <View style={{ gap: space.xs }} testID="register-vessels">
          {check.vessels.map((v) => (
            <Text key={v.assetId}>
              {`${v.plantId} · ${v.name}: ${v.capacityL === null ? 'capacity not recorded' : `${formatNumber(v.capacityL)} L`}` +
                (v.preChargeBar === null ? '' : `, pre-charge ${formatNumber(v.preChargeBar)} bar`)}
            </Text>
          ))}
        </View>
      ) : (
        <Notice tone="info" word="No vessels">No expansion vessels on this site are recorded with this system name.</Notice>
      )}
      {check.missing.length ? (
        <Notice tone="info" word="Still needed">
          <View style={{ gap: space.xs }}>
            {check.missing.map((m) => <Text key={m}>{`• ${m}`}</Text>)}
            <Text variant="small">Fill these in below to run the check now, or save them in the system settings.</Text>
          </View>
        </Notice>
      ) : null}
    </Card>
  );
}
