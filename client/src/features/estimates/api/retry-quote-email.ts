import type { EmailDeliveryView } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { estimateKeys } from './get-estimates';

export type RetryQuoteEmailInput = { estimateId: string; emailId: string };

/**
 * Puts a quote e-mail the outbox gave up on back in the queue (same message, tries counted afresh);
 * 409 `MAIL_NOT_FAILED` when it is queued or delivered already.
 */
export function retryQuoteEmail({ emailId }: RetryQuoteEmailInput): Promise<EmailDeliveryView> {
  return api.post<EmailDeliveryView>(`/outbox/${encodeURIComponent(emailId)}/retry`);
}

export function useRetryQuoteEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryQuoteEmail,
    // Also after a refusal: someone else may have sent it again already, and the table should say so.
    onSettled: (_delivery, _error, { estimateId }) =>
      queryClient.invalidateQueries({ queryKey: estimateKeys.quote(estimateId), exact: true }),
  });
}
