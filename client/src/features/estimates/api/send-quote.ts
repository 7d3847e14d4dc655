import type { EstimateQuoteStatus, SendQuoteRequest } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export type SendQuoteInput = { id: string; request: SendQuoteRequest };

/**
 * Sends the latest version to the homeowner (a resend is the same call): the server revokes the
 * estimate's other active links, e-mails a new one and sets the status to `sent`.
 */
export function sendQuote({ id, request }: SendQuoteInput): Promise<EstimateQuoteStatus> {
  return api.post<EstimateQuoteStatus>(`/estimates/${encodeURIComponent(id)}/send`, request);
}

export function useSendQuote() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendQuote,
    onSuccess: (status, { id }) => {
      queryClient.setQueryData(estimateKeys.quote(id), status);
      // The estimate's status (and its history) changed too; its key covers the quote's.
      return Promise.all([
        queryClient.invalidateQueries({ queryKey: estimateKeys.detail(id) }),
        queryClient.invalidateQueries({ queryKey: [...estimateKeys.all, 'list'] }),
      ]);
    },
  });
}
