import { useLocalSearchParams } from 'expo-router';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { PlantDiagram } from '@/components/connections/plant-diagram';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { errorMessage } from '@/hooks/api/request';
import { usePlantRoomDiagramQuery } from '@/hooks/api/use-connections';
import { usePlantRoomQuery } from '@/hooks/api/use-plant-rooms';

export default function PlantRoomDiagramScreen() {
  const params = useLocalSearchParams<{ id: string; focus?: string }>();
  const id = Number(params.id);
  const room = usePlantRoomQuery(id);
  const diagram = usePlantRoomDiagramQuery(id);
  return (
    <QueryScreen query={room} title="Plant room diagram">
      {(r) => (
        <Screen title={`Diagram: ${r.name}`} subtitle={r.siteName}>
          <Breadcrumbs trail={[{ label: r.siteName, href: `/sites/${r.siteId}` }, { label: r.name, href: `/plant-rooms/${id}` }]} />
          <Notice tone="caution" word="Drawn from the register">Pipework and cables on site may differ from what is recorded. Check labels and flow arrows on site before relying on it.</Notice>
          {diagram.data ? <PlantDiagram diagram={diagram.data} focusId={Number(params.focus) || undefined} /> : diagram.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(diagram.error)}</Notice> : <LoadingView />}
        </Screen>
      )}
    </QueryScreen>
  );
}
