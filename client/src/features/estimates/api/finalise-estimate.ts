import type { EstimateView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

/** Freezes the saved draft at `revision` as the next numbered version. */
export function finaliseEstimate({
  id,
  revision,
}: {
  id: string;
  revision: number;
}): Promise<EstimateView> {
  return api.post<EstimateView>(`/estimates/${encodeURIComponent(id)}/finalise`, { revision });
}

export function useFinaliseEstimate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: finaliseEstimate,
    onSuccess: (finalised) => {
      queryClient.setQueryData(estimateKeys.detail(finalised.id), finalised);
      return queryClient.invalidateQueries({ queryKey: estimateKeys.all });
    },
  });
}
