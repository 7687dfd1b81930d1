import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { fetchBlob, request } from '@/hooks/api/request';
import { meKeys } from '@/hooks/api/use-me';
import { tagKeys } from '@/hooks/api/use-tags';
import { queryString } from '@/shared/rules/query-string';
import type { EndVisitInput, StartVisitInput } from '@/shared/schemas/visits';
import type { ListResponse } from '@/shared/types/user';
import type { SinceLastVisit, Visit } from '@/shared/types/visits';

export interface VisitFilters {
  userId?: number;
  open?: 'true' | 'false';
  from?: string;
  to?: string;
}

const visitKeys = {
  all: ['visits'] as const,
  forSite: (siteId: number, filters: VisitFilters) => [...visitKeys.all, 'site', siteId, filters] as const,
  detail: (id: number) => [...visitKeys.all, 'detail', id] as const,
  since: (place: 'site' | 'plant-room', id: number) => [...visitKeys.all, 'since', place, id] as const,
};

export function useVisitQuery(id: number) {
  return useQuery({ queryKey: visitKeys.detail(id), queryFn: () => request<Visit>(`/visits/${id}`), enabled: id > 0 });
}

export function useSiteVisitsQuery(siteId: number, filters: VisitFilters, enabled = true) {
  return useQuery({
    queryKey: visitKeys.forSite(siteId, filters),
    queryFn: () => request<ListResponse<Visit>>(`/sites/${siteId}/visits${queryString({ pageSize: 20, ...filters })}`),
    enabled: enabled && siteId > 0,
  });
}

export function useSinceLastVisitQuery(place: 'site' | 'plant-room', id: number) {
  const base = place === 'site' ? 'sites' : 'plant-rooms';
  return useQuery({ queryKey: visitKeys.since(place, id), queryFn: () => request<SinceLastVisit>(`/${base}/${id}/since-my-last-visit`), enabled: id > 0 });
}

export function useStartVisitMutation(siteId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: StartVisitInput) => request<Visit>(`/sites/${siteId}/visits`, { method: 'POST', body: input }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: meKeys.all });
      await qc.invalidateQueries({ queryKey: visitKeys.all });
    },
  });
}

export function useEndVisitMutation(id: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: EndVisitInput) => request<Visit>(`/visits/${id}/end`, { method: 'POST', body: input }),
    onSuccess: async (visit) => {
      qc.setQueryData(visitKeys.detail(id), visit);
      await qc.invalidateQueries({ queryKey: meKeys.all });
      await qc.invalidateQueries({ queryKey: tagKeys.all });
    },
  });
}

/** The visit report as a PDF file. */
export function useVisitReportMutation() {
  return useMutation({ mutationFn: (id: number) => fetchBlob(`/api/visits/${id}/report.pdf`) });
}
