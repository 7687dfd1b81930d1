import { useLocalSearchParams } from 'expo-router';
import { ExpansionVesselForm } from '@/components/readings/expansion-vessel-form';
import { ExpansionVesselResultView } from '@/components/readings/expansion-vessel-result';
import { SystemExpansionPanel } from '@/components/readings/system-expansion-panel';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { errorMessage } from '@/hooks/api/request';
import { useSystemExpansionCheckQuery } from '@/hooks/api/use-heating-systems';

export default function ExpansionVesselScreen() {
  const params = useLocalSearchParams<{ siteId?: string; system?: string }>();
  const siteId = Number(params.siteId) || 0;
  const system = params.system ?? null;
  const fromRegister = useSystemExpansionCheckQuery(siteId, system);
  const prefilled = siteId > 0 && !!system;
  if (prefilled && fromRegister.isPending) return <LoadingView />;
  const data = fromRegister.data;
  return (
    <Screen title="Expansion vessel check" subtitle="Sealed heating systems, by the method of EN 12828 Annex D.">
      {prefilled && fromRegister.isError ? <Notice tone="danger" word="Register not loaded">{errorMessage(fromRegister.error)}</Notice> : null}
      {data ? <SystemExpansionPanel check={data} /> : null}
      {data?.result ? (
        <>
          <Text variant="title">Result with the register’s vessels</Text>
          <ExpansionVesselResultView result={data.result} settings={data.settings} workingOpen={false} />
          <Text variant="title">Try other values</Text>
        </>
      ) : null}
      <ExpansionVesselForm initial={data?.inputs} initialMarginBar={data?.system.preChargeMarginBar} />
    </Screen>
  );
}
