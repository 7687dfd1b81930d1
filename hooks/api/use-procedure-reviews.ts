import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import { boardKeys } from '@/hooks/api/use-board';
import type { ProcedureReviewInput } from '@/shared/schemas/procedure-reviews';
import type { ProcedureReview, ProcedureReviewList } from '@/shared/types/procedure-reviews';

const procedureReviewKeys = {
  all: ['procedure-reviews'] as const,
  site: (siteId: number) => [...procedureReviewKeys.all, 'site', siteId] as const,
};

/** A site's periodic reviews of its isolation procedure, newest first, with when the next one is due. */
export function useProcedureReviewsQuery(siteId: number) {
  return useQuery({ queryKey: procedureReviewKeys.site(siteId), queryFn: () => request<ProcedureReviewList>(`/sites/${siteId}/procedure-reviews`) });
}

/** Records a review; the board's "review overdue" notice depends on it. */
export function useRecordProcedureReviewMutation(siteId: number) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: ProcedureReviewInput) => request<ProcedureReview>(`/sites/${siteId}/procedure-reviews`, { method: 'POST', body: input }),
    onSuccess: async () => {
      await Promise.all([qc.invalidateQueries({ queryKey: procedureReviewKeys.site(siteId) }), qc.invalidateQueries({ queryKey: boardKeys.all })]);
    },
  });
}
