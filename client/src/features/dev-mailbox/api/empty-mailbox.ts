import type { MailboxMessage } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { mailboxQueryKey } from './get-mailbox';

export function emptyMailbox(): Promise<void> {
  return api.delete('/dev/mailbox');
}

export function useEmptyMailbox() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: emptyMailbox,
    onSuccess: () => {
      queryClient.setQueryData<MailboxMessage[]>(mailboxQueryKey, []);
      return queryClient.invalidateQueries({ queryKey: mailboxQueryKey });
    },
  });
}
