import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { assetKeys } from '@/hooks/api/use-assets';
import type { Asset } from '@/shared/types/register';

export const labelKeys = {
  all: ['labels'] as const,
  code: (code: string) => [...labelKeys.all, code] as const,
  retired: (assetId: number) => [...labelKeys.all, 'retired', assetId] as const,
};

export function useLabelQuery(code: string) {
  return useQuery({ queryKey: labelKeys.code(code), queryFn: () => request<Asset>(`/labels/${encodeURIComponent(code)}`), enabled: !!code, staleTime: 0 });
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
