import { useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';
import { space } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { Chip } from '@/components/ui/chip';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ItemLinks } from '@/components/connections/closing-affects-notice';
import { SourcePlanCard } from '@/components/connections/source-plan-card';
import { ENERGY_SOURCE_ICONS } from '@/components/register/register-vocabulary';
import { errorMessage } from '@/hooks/api/request';
import { useAssetQuery } from '@/hooks/api/use-assets';
import { useIsolationPlanQuery } from '@/hooks/api/use-connections';
import { usePermissions } from '@/hooks/auth/use-permissions';
import { ENERGY_SOURCE_LABELS, type EnergySource } from '@/shared/rules/register';

export default function IsolationPlanScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const router = useRouter();
  const perms = usePermissions();
  const asset = useAssetQuery(id);
  const [chosen, setChosen] = useState<EnergySource[] | null>(null);
  const sources = chosen ?? asset.data?.energySources ?? [];
  const plan = useIsolationPlanQuery(id, sources, !!asset.data && sources.length > 0);
  return (
    <QueryScreen query={asset} title="Isolation plan">
      {(a) => {
        const toggle = (s: EnergySource) => setChosen(sources.includes(s) ? sources.filter((x) => x !== s) : [...sources, s]);
        return (
          <Screen title={`Isolation plan: ${a.plantId}`} subtitle={`${a.name} · ${a.siteName}`}>
            <Notice tone="caution" word="Verify on site">{plan.data?.caution ?? 'This plan is only as good as the register. Labels and flow arrows on site can be wrong: verify every point on site and prove the isolation.'}</Notice>
            <Text variant="label" bold>Energy sources to isolate</Text>
            <View style={{ flexDirection: 'row', flexWrap: 'wrap', gap: space.sm }}>
              {a.energySources.map((s) => (
                <Chip key={s} label={ENERGY_SOURCE_LABELS[s]} icon={ENERGY_SOURCE_ICONS[s]} selected={sources.includes(s)} onPress={() => toggle(s)} testID={`plan-toggle-${s}`} />
              ))}
            </View>
            {!a.energySources.length ? <Notice tone="info" word="No energy sources">Record the item’s energy sources to plan its isolation.</Notice> : null}
            {plan.isError ? <Notice tone="danger" word="Cannot plan">{errorMessage(plan.error)}</Notice> : null}
            {sources.length && !plan.data && !plan.isError ? <LoadingView /> : null}
            {plan.data ? (
              <>
                {plan.data.sources.map((s) => <SourcePlanCard key={s.source} plan={s} />)}
                {plan.data.affects.length ? (
                  <Notice tone="caution" word="Closing these points affects">
                    <ItemLinks items={plan.data.affects} />
                    <Text variant="small">Tell whoever relies on them before you isolate.</Text>
                  </Notice>
                ) : <Notice tone="info" word="Affects">No other recorded item loses its supply when these points are closed.</Notice>}
                {perms.may('raiseTag') && !a.archived ? (
                  <Button title="Raise isolation from this plan" testID="raise-from-plan"
                    onPress={() => router.push({ pathname: '/tags/new', params: { assetId: a.id, kind: 'isolation', planSources: sources.join(',') } })} />
                ) : null}
              </>
            ) : null}
          </Screen>
        );
      }}
    </QueryScreen>
  );
}
