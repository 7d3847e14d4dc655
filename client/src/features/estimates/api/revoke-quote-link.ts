import type { EstimateQuoteStatus } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export type RevokeQuoteLinkInput = { id: string; linkId: string };

/** Stops one link working; the homeowner then sees that it was withdrawn. */
export function revokeQuoteLink({
  id,
  linkId,
}: RevokeQuoteLinkInput): Promise<EstimateQuoteStatus> {
  return api.post<EstimateQuoteStatus>(
    `/estimates/${encodeURIComponent(id)}/quote-links/${encodeURIComponent(linkId)}/revoke`,
  );
}

export function useRevokeQuoteLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeQuoteLink,
    onSuccess: (status, { id }) => {
      queryClient.setQueryData(estimateKeys.quote(id), status);
      return queryClient.invalidateQueries({ queryKey: estimateKeys.detail(id), exact: true });
    },
  });
}
