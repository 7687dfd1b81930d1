import { useMutation } from '@tanstack/react-query';
import { request } from '@/hooks/api/request';
import type { ExpansionVesselRequest } from '@/shared/schemas/readings';
import type { ExpansionVesselCheckResponse } from '@/shared/types/readings';

/** The expansion vessel calculator on the server (inputs in L, °C, m and bar gauge). */
export function useExpansionVesselCheckMutation() {
  return useMutation({
    mutationFn: (input: ExpansionVesselRequest) =>
      request<ExpansionVesselCheckResponse>('/calc/expansion-vessel', { method: 'POST', body: input }),
  });
}
