import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { assetKeys } from '@/hooks/api/use-assets';
import { cachedAssetByLabel } from '@/hooks/offline/visited-items';
import type { Asset } from '@/shared/types/register';

const labelKeys = {
  all: ['labels'] as const,
  code: (code: string) => [...labelKeys.all, code] as const,
  retired: (assetId: number) => [...labelKeys.all, 'retired', assetId] as const,
};

/**
 * The item a label code opens. The answer is the item's whole record, so it seeds the record's cache:
 * a scan costs one fetch of the record, not a look-up and then the record again.
 */
export function useLabelQuery(code: string) {
  const qc = useQueryClient();
  return useQuery({
    queryKey: labelKeys.code(code),
    queryFn: async () => {
      const asset = await request<Asset>(`/labels/${encodeURIComponent(code)}`);
      qc.setQueryData(assetKeys.detail(asset.id), asset);
      return asset;
    },
    enabled: !!code,
    staleTime: 0,
    // A label never looked up before still opens with no signal when its plant room's items were seen recently.
    initialData: () => cachedAssetByLabel(qc, code),
    initialDataUpdatedAt: 0,
  });
}

export function useRetiredLabelsQuery(assetId: number) {
  return useQuery({
    queryKey: labelKeys.retired(assetId),
    queryFn: () => request<{ code: string; retiredAt: string }[]>(`/assets/${assetId}/label/retired`),
    enabled: assetId > 0,
  });
}

export function useReplaceLabelMutation(assetId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: () => request<{ labelCode: string; retiredCode: string }>(`/assets/${assetId}/label/replace`, { method: 'POST' }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: assetKeys.all });
      await qc.invalidateQueries({ queryKey: labelKeys.all });
    },
  });
}
