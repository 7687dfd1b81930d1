import { MaterialCommunityIcons } from '@/components/ui/icons';
import { Link } from 'expo-router';
import { View } from 'react-native';
import { colors, space } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Card } from '@/components/ui/card';
import { Notice } from '@/components/ui/notice';
import { Text } from '@/components/ui/text';
import { ItemLinks } from '@/components/connections/closing-affects-notice';
import { ENERGY_SOURCE_ICONS } from '@/components/register/register-vocabulary';
import { KIND_LABELS } from '@/shared/rules/connections';
import { ENERGY_SOURCE_LABELS } from '@/shared/rules/register';
import { ISOLATION_METHOD_LABELS } from '@/shared/rules/tags';
import type { PlanPoint, SourcePlan } from '@/shared/types/connections';

const away = (d: number) => (d <= 1 ? 'next to the item' : `${d} links away`);

function PointRow({ point, n }: { point: PlanPoint; n: number }) {
  return (
    <View style={{ gap: space.xs, paddingVertical: space.xs }} testID={`plan-point-${point.item.plantId}`}>
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm }}>
        <Text bold>{`${n}.`}</Text>
        <Link href={`/assets/${point.item.id}`} style={{ flex: 1, minHeight: 48, paddingVertical: space.sm }}>
          <Text bold style={{ color: colors.brand, textDecorationLine: 'underline' }}>{`${point.item.plantId} · ${point.item.name}`}</Text>
        </Link>
      </View>
      <Text variant="small">{`${KIND_LABELS[point.kind]}: ${ISOLATION_METHOD_LABELS[point.method].toLowerCase()}, ${away(point.distance)}.`}</Text>
      {point.affects.length ? (
        <Text variant="small"><Text variant="small" bold>Closing this also takes off: </Text><ItemLinks items={point.affects} /></Text>
      ) : <Text variant="small" muted>Closing this takes nothing else off, as far as the register shows.</Text>}
    </View>
  );
}

/** One energy source of a plan: its points in order from the item out, its gaps and the stored energy inside. */
export function SourcePlanCard({ plan }: { plan: SourcePlan }) {
  const label = ENERGY_SOURCE_LABELS[plan.source];
  const complete = !plan.unrecorded && !plan.gaps.length && plan.points.length > 0;
  return (
    <Card>
      <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' }} testID={`plan-source-${plan.source}`}>
        <MaterialCommunityIcons name={ENERGY_SOURCE_ICONS[plan.source]} size={26} color={colors.ink} />
        <Text variant="title" style={{ flex: 1 }}>{label}</Text>
        {complete ? <Badge tone="safe" icon="check-circle-outline" label="Every path cut" /> : <Badge tone="caution" icon="alert" label="Incomplete" />}
      </View>
      {plan.unrecorded ? <Notice tone="info" word="Not recorded">{plan.unrecorded}</Notice> : null}
      {plan.points.map((p, i) => <PointRow key={p.item.id} point={p} n={i + 1} />)}
      {plan.gaps.map((g) => (
        <Notice key={g.supply.id} tone="danger" word="Gap">
          <Text>{g.message}</Text>
          <Text variant="small">{`Path: ${g.path.map((i) => i.plantId).join(' → ')}`}</Text>
        </Notice>
      ))}
      {plan.storedEnergy.length ? (
        <Notice tone="caution" word="Stored energy">
          <Text>Inside the isolation: vent, drain or discharge before work, and prove it.</Text>
          <ItemLinks items={plan.storedEnergy} />
        </Notice>
      ) : null}
    </Card>
  );
}
