import type { EstimateContent, EstimateView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export type SaveEstimateDraftInput = {
  id: string;
  content: Omit<EstimateContent, 'input'> & { input: unknown };
  /** The draft revision the content was edited from; a stale one is refused with 409 STALE_DRAFT. */
  revision: number;
};

export function saveEstimateDraft({
  id,
  content,
  revision,
}: SaveEstimateDraftInput): Promise<EstimateView> {
  return api.put<EstimateView>(`/estimates/${encodeURIComponent(id)}/draft`, {
    ...content,
    revision,
  });
}

export function useSaveEstimateDraft() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveEstimateDraft,
    onSuccess: (saved) => {
      queryClient.setQueryData(estimateKeys.detail(saved.id), saved);
      return queryClient.invalidateQueries({ queryKey: [...estimateKeys.all, 'list'] });
    },
  });
}
