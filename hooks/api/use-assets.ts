import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { ImagePickerAsset } from 'expo-image-picker';
import { fetchBlob, postCsvImport, request } from '@/hooks/api/request';
import { sendOrQueue } from '@/hooks/offline/send-or-queue';
import { assetCopyOr, offlineAssetCopy } from '@/hooks/offline/visited-items';
import { plantRoomKeys } from '@/hooks/api/use-plant-rooms';
import { photoFormData } from '@/hooks/api/use-photos';
import { siteKeys } from '@/hooks/api/use-sites';
import type { AssetType } from '@/shared/rules/register';
import type { AssetInput } from '@/shared/schemas/register';
import type { Asset, ImportResult, Photo } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/api';

interface AssetFilters {
  q?: string;
  siteId?: number | null;
  plantRoomId?: number | null;
  type?: AssetType | null;
  /** A column name, prefixed with `-` for descending order. */
  sort?: string;
  page?: number;
  pageSize?: number;
  includeArchived?: boolean;
}

const ASSET_FRESH_MS = 5_000;

export const assetKeys = {
  all: ['assets'] as const,
  lists: () => [...assetKeys.all, 'list'] as const,
  list: (filters: AssetFilters) => [...assetKeys.lists(), filters] as const,
  detail: (id: number) => [...assetKeys.all, 'detail', id] as const,
};

function queryString(filters: AssetFilters) {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(filters)) {
    if (v === undefined || v === null || v === '' || v === false) continue;
    params.set(k, String(v));
  }
  const s = params.toString();
  return s ? `?${s}` : '';
}

export function useAssetsQuery(filters: AssetFilters, enabled = true) {
  return useQuery({
    queryKey: assetKeys.list(filters),
    queryFn: () => request<ListResponse<Asset>>(`/assets${queryString(filters)}`),
    // Keep showing the last results while the next search or page loads, so the list does not flash empty.
    placeholderData: keepPreviousData,
    enabled,
  });
}

export function useAssetQuery(id: number) {
  const qc = useQueryClient();
  // Fresh for a few seconds, so a record just answered by a label scan is shown from the cache, not fetched again.
  return useQuery({
    queryKey: assetKeys.detail(id), queryFn: () => request<Asset>(`/assets/${id}`).catch((err) => assetCopyOr(qc, id, err)), enabled: id > 0, staleTime: ASSET_FRESH_MS,
    // With no signal, an item seen in its plant room's list opens from that row.
    initialData: () => offlineAssetCopy(qc, id)?.data,
    initialDataUpdatedAt: () => offlineAssetCopy(qc, id)?.updatedAt,
  });
}

function useInvalidateRegister() {
  const qc = useQueryClient();
  return async () => {
    await qc.invalidateQueries({ queryKey: assetKeys.all });
    // Sites and plant rooms carry item counts.
    await qc.invalidateQueries({ queryKey: siteKeys.all });
    await qc.invalidateQueries({ queryKey: plantRoomKeys.all });
  };
}

export function useCreateAssetMutation() {
  const invalidate = useInvalidateRegister();
  return useMutation({
    mutationFn: (input: AssetInput) => request<Asset>('/assets', { method: 'POST', body: input }),
    onSuccess: invalidate,
  });
}

export function useUpdateAssetMutation() {
  const qc = useQueryClient();
  const invalidate = useInvalidateRegister();
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: Partial<AssetInput> }) => request<Asset>(`/assets/${id}`, { method: 'PATCH', body: patch }),
    onSuccess: async (asset) => {
      qc.setQueryData(assetKeys.detail(asset.id), (old: Asset | undefined) => ({ ...old, ...asset }));
      await invalidate();
    },
  });
}

export function useArchiveAssetMutation() {
  const invalidate = useInvalidateRegister();
  return useMutation({
    mutationFn: (id: number) => request<Asset>(`/assets/${id}/archive`, { method: 'POST' }),
    onSuccess: invalidate,
  });
}

export function useAddAssetPhotoMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (asset: ImagePickerAsset) =>
      sendOrQueue<Photo>(`/assets/${id}/photos`, { method: 'POST', body: photoFormData(asset) }, { kind: 'photo', summary: 'add a photo', assetId: id }),
    onSuccess: () => qc.invalidateQueries({ queryKey: assetKeys.all }),
  });
}

/** The whole register as CSV, fetched with the token. */
export function useExportAssetsMutation() {
  return useMutation({ mutationFn: () => fetchBlob('/api/assets/export.csv') });
}

export function useImportAssetsMutation() {
  const invalidate = useInvalidateRegister();
  return useMutation({
    mutationFn: (input: { file: Blob; dryRun: boolean }) => postCsvImport<ImportResult>('/assets/import', input, 'register.csv'),
    onSuccess: async (result) => { if (!result.dryRun) await invalidate(); },
  });
}
