import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { readingKeys } from '@/hooks/api/use-readings';
import type { HeatingSystemInput } from '@/shared/schemas/readings';
import type { HeatingSystem, SystemExpansionCheck } from '@/shared/types/readings';
import type { ListResponse } from '@/shared/types/user';

const heatingSystemKeys = {
  all: ['heating-systems'] as const,
  site: (siteId: number) => [...heatingSystemKeys.all, 'site', siteId] as const,
  expansion: (siteId: number, name: string) => [...heatingSystemKeys.all, 'expansion', siteId, name] as const,
};

const systemPath = (siteId: number, name: string) => `/sites/${siteId}/systems/${encodeURIComponent(name)}`;

/** Every named system on a site (from the register's `system` text), with its design values. */
export function useSiteSystemsQuery(siteId: number) {
  return useQuery({
    queryKey: heatingSystemKeys.site(siteId),
    queryFn: () => request<ListResponse<HeatingSystem>>(`/sites/${siteId}/systems`),
    enabled: siteId > 0,
  });
}

export function useSaveHeatingSystemMutation(siteId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ name, input }: { name: string; input: HeatingSystemInput }) =>
      request<HeatingSystem>(systemPath(siteId, name), { method: 'PUT', body: input }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: heatingSystemKeys.all });
      // New sets are checked against the new values.
      await qc.invalidateQueries({ queryKey: readingKeys.all });
    },
  });
}

/** The expansion vessel check for a site's system against the vessels in the register. */
export function useSystemExpansionCheckQuery(siteId: number, name: string | null | undefined) {
  return useQuery({
    queryKey: heatingSystemKeys.expansion(siteId, name ?? ''),
    queryFn: () => request<SystemExpansionCheck>(`${systemPath(siteId, name!)}/expansion-check`),
    enabled: siteId > 0 && !!name,
  });
}
