import { useLocalSearchParams } from 'expo-router';
import { LoadingView } from '@/components/ui/loading-view';
import { Notice } from '@/components/ui/notice';
import { QueryScreen } from '@/components/ui/query-screen';
import { Screen } from '@/components/ui/screen';
import { PlantDiagram } from '@/components/connections/plant-diagram';
import { Breadcrumbs } from '@/components/register/breadcrumbs';
import { errorMessage } from '@/hooks/api/request';
import { useExportConnectionsMutation, usePlantRoomDiagramQuery } from '@/hooks/api/use-connections';
import { saveFile } from '@/components/ui/save-file';
import { Button } from '@/components/ui/button';
import { usePlantRoomQuery } from '@/hooks/api/use-plant-rooms';

export default function PlantRoomDiagramScreen() {
  const params = useLocalSearchParams<{ id: string; focus?: string }>();
  const id = Number(params.id);
  const room = usePlantRoomQuery(id);
  const diagram = usePlantRoomDiagramQuery(id);
  const exporter = useExportConnectionsMutation();
  return (
    <QueryScreen query={room} title="Plant room diagram">
      {(r) => (
        <Screen
          title={`Diagram: ${r.name}`}
          subtitle={r.siteName}
          actions={<Button title="Export connections (CSV)" variant="secondary" busy={exporter.isPending} testID="export-connections"
            onPress={() => exporter.mutate(r.siteId, { onSuccess: (blob) => saveFile(blob, `connections-${r.siteName.replace(/\W+/g, '-').toLowerCase()}.csv`) })} />}
        >
          <Breadcrumbs trail={[{ label: r.siteName, href: `/sites/${r.siteId}` }, { label: r.name, href: `/plant-rooms/${id}` }]} />
          <Notice tone="caution" word="Drawn from the register">Pipework and cables on site may differ from what is recorded. Check labels and flow arrows on site before relying on it.</Notice>
          {exporter.isError ? <Notice tone="danger" word="Not exported">{errorMessage(exporter.error)}</Notice> : null}
          {diagram.data ? <PlantDiagram diagram={diagram.data} focusId={Number(params.focus) || undefined} /> : diagram.isError ? <Notice tone="danger" word="Cannot load">{errorMessage(diagram.error)}</Notice> : <LoadingView />}
        </Screen>
      )}
    </QueryScreen>
  );
}
