import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { fetchBlob, postCsvImport, request } from '@/hooks/api/request';
import type { EnergySource } from '@/shared/rules/register';
import type { ConnectionInput } from '@/shared/schemas/connections';
import type { AssetConnections, ClosingAffects, Connection, ConnectionImportResult, IsolationPlan, PlantRoomDiagram } from '@/shared/types/connections';

const connectionKeys = {
  all: ['connections'] as const,
  forAsset: (id: number) => [...connectionKeys.all, 'asset', id] as const,
  plan: (id: number, sources: EnergySource[]) => [...connectionKeys.all, 'plan', id, sources] as const,
  closing: (id: number) => [...connectionKeys.all, 'closing', id] as const,
  diagram: (roomId: number) => [...connectionKeys.all, 'diagram', roomId] as const,
};

export function useAssetConnectionsQuery(assetId: number) {
  return useQuery({ queryKey: connectionKeys.forAsset(assetId), queryFn: () => request<AssetConnections>(`/assets/${assetId}/connections`), enabled: assetId > 0 });
}

/** No sources = every energy source recorded on the item. */
export function useIsolationPlanQuery(assetId: number, sources: EnergySource[], enabled = true) {
  const query = sources.length ? `?sources=${sources.map(encodeURIComponent).join(',')}` : '';
  return useQuery({ queryKey: connectionKeys.plan(assetId, sources), queryFn: () => request<IsolationPlan>(`/assets/${assetId}/isolation-plan${query}`), enabled: enabled && assetId > 0 });
}

export function useClosingAffectsQuery(assetId: number, enabled = true) {
  return useQuery({ queryKey: connectionKeys.closing(assetId), queryFn: () => request<ClosingAffects>(`/assets/${assetId}/closing-affects`), enabled: enabled && assetId > 0 });
}

export function usePlantRoomDiagramQuery(roomId: number) {
  return useQuery({ queryKey: connectionKeys.diagram(roomId), queryFn: () => request<PlantRoomDiagram>(`/plant-rooms/${roomId}/diagram`), enabled: roomId > 0 });
}

/** Any change of a link changes plans, diagrams and what closing an item affects: all of them are refetched. */
export function useCreateConnectionMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ConnectionInput) => request<Connection>('/connections', { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: connectionKeys.all }),
  });
}

export function useDeleteConnectionMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => request<void>(`/connections/${id}`, { method: 'DELETE' }),
    onSuccess: () => qc.invalidateQueries({ queryKey: connectionKeys.all }),
  });
}

/** One site's connections (or, with null, every site's) as CSV (site, from, to, medium), fetched with the token. */
export function useExportConnectionsMutation() {
  return useMutation({ mutationFn: (siteId: number | null) => fetchBlob(`/api/connections/export.csv${siteId ? `?siteId=${siteId}` : ''}`) });
}

/** Checks a connections CSV (dry run) or adds its links; an import never removes a link. */
export function useImportConnectionsMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { file: Blob; dryRun: boolean }) => postCsvImport<ConnectionImportResult>('/connections/import', input, 'connections.csv'),
    onSuccess: async (result) => { if (!result.dryRun) await qc.invalidateQueries({ queryKey: connectionKeys.all }); },
  });
}
