import { useQuery } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import type { Tag } from '@/shared/types/tags';
import type { RecentPlace, Visit } from '@/shared/types/visits';

export const meKeys = {
  all: ['me-own'] as const,
  tags: () => [...meKeys.all, 'tags'] as const,
  visit: () => [...meKeys.all, 'visit'] as const,
  recent: () => [...meKeys.all, 'recent-places'] as const,
};

/** The live tags the signed-in person holds, most urgent first. */
export function useMyTagsQuery(enabled = true) {
  return useQuery({ queryKey: meKeys.tags(), queryFn: async () => (await request<{ items: Tag[] }>('/me/tags')).items, enabled });
}

/** Their visit in progress, or null. */
export function useMyVisitQuery(enabled = true) {
  return useQuery({ queryKey: meKeys.visit(), queryFn: async () => (await request<{ visit: Visit | null }>('/me/visit')).visit, enabled });
}

export function useRecentPlacesQuery() {
  return useQuery({ queryKey: meKeys.recent(), queryFn: async () => (await request<{ items: RecentPlace[] }>('/me/recent-places')).items });
}
