import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { sendOrQueue } from '@/hooks/offline/send-or-queue';
import type { ReadingCorrectionInput, ReadingSetInput } from '@/shared/schemas/readings';
import type { LatestFlaggedReading, ReadingList, ReadingSet } from '@/shared/types/readings';

// Enough sets for a useful trend on one item; older sets stay on record and are paged by the API.
const TREND_PAGE_SIZE = 200;

export const readingKeys = {
  all: ['readings'] as const,
  asset: (assetId: number) => [...readingKeys.all, 'asset', assetId] as const,
  siteFlags: (siteId: number) => [...readingKeys.all, 'site-flags', siteId] as const,
};

/** Per item on the site, the flags of its latest set: danger first. */
export function useSiteReadingFlagsQuery(siteId: number) {
  return useQuery({
    queryKey: readingKeys.siteFlags(siteId),
    queryFn: () => request<{ items: LatestFlaggedReading[] }>(`/sites/${siteId}/reading-flags`),
    enabled: siteId > 0,
  });
}

/** The item's reading sets, newest first (corrected originals included and marked). */
export function useReadingsQuery(assetId: number) {
  return useQuery({
    queryKey: readingKeys.asset(assetId),
    queryFn: () => request<ReadingList>(`/assets/${assetId}/readings?pageSize=${TREND_PAGE_SIZE}`),
    enabled: assetId > 0,
  });
}

/** Sends a set in SI; the server re-runs the checks and answers with the stored set. */
export function useLogReadingsMutation(assetId: number) {
  const qc = useQueryClient();
  return useMutation({
    // With no signal the set waits in the outbox; its key stops a repeat from logging it twice.
    mutationFn: (input: ReadingSetInput) =>
      sendOrQueue<ReadingSet>(`/assets/${assetId}/readings`, { method: 'POST', body: input }, { kind: 'reading', summary: 'log readings', assetId }),
    // The item's sets and the site's latest flags both change.
    onSuccess: () => qc.invalidateQueries({ queryKey: readingKeys.all }),
  });
}

/** Appends a correction that supersedes `readingId`; the original stays on record. */
export function useCorrectReadingMutation(assetId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ readingId, input }: { readingId: number; input: ReadingCorrectionInput }) =>
      request<ReadingSet>(`/readings/${readingId}/correct`, { method: 'POST', body: input }),
    onSuccess: () => qc.invalidateQueries({ queryKey: readingKeys.all }),
  });
}
