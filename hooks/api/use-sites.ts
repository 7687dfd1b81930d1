import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import type { SiteInput } from '@/shared/schemas/register';
import type { Site } from '@/shared/types/register';
import type { ListResponse } from '@/shared/types/api';

export const siteKeys = {
  all: ['sites'] as const,
  list: () => [...siteKeys.all, 'list'] as const,
  detail: (id: number) => [...siteKeys.all, 'detail', id] as const,
};

// Organisations have tens of sites, not thousands: one page of the largest size lists them all.
const SITE_PAGE = 200;

export function useSitesQuery() {
  return useQuery({
    queryKey: siteKeys.list(),
    queryFn: () => request<ListResponse<Site>>(`/sites?pageSize=${SITE_PAGE}`),
    staleTime: 60_000,
  });
}

export function useSiteQuery(id: number) {
  return useQuery({ queryKey: siteKeys.detail(id), queryFn: () => request<Site>(`/sites/${id}`), enabled: id > 0 });
}

export function useCreateSiteMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: SiteInput) => request<Site>('/sites', { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: siteKeys.all }),
  });
}

export function useUpdateSiteMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<SiteInput>) => request<Site>(`/sites/${id}`, { method: 'PATCH', body: input }),
    onSuccess: (site) => {
      qc.setQueryData(siteKeys.detail(id), site);
      return qc.invalidateQueries({ queryKey: siteKeys.all });
    },
  });
}
