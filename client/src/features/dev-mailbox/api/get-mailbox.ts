import type { MailboxMessage } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';

export const mailboxQueryKey = ['dev-mailbox'] as const;

/** The messages the local fake SMTP server caught, newest first. Answers 404 in production. */
export function getMailbox(): Promise<MailboxMessage[]> {
  return api.get<MailboxMessage[]>('/dev/mailbox');
}

export const getMailboxQueryOptions = () =>
  queryOptions({ queryKey: mailboxQueryKey, queryFn: getMailbox });

/** The mailbox page's list, asked for again every 5 s so new e-mails show up on their own. */
export const useMailbox = () => useQuery({ ...getMailboxQueryOptions(), refetchInterval: 5000 });

/**
 * Whether this server has a developer mailbox at all (it answers 404 in production). The answer is
 * the same list the page shows, so opening the page after the check costs no extra request.
 */
export function useMailboxAvailable(enabled: boolean): boolean {
  const mailbox = useQuery({ ...getMailboxQueryOptions(), enabled });
  // Once it has answered, a later failed refresh (the fake SMTP server restarting) keeps the item.
  return enabled && mailbox.data !== undefined;
}

export const isMailboxMissing = (error: unknown) => isApiError(error, 404);
