import type { PendingInvite } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const invitesQueryKey = ['team', 'invites'] as const;

export function getInvites(): Promise<PendingInvite[]> {
  return api.get<PendingInvite[]>('/invites');
}

export const getInvitesQueryOptions = () =>
  queryOptions({ queryKey: invitesQueryKey, queryFn: getInvites });

export const useInvites = () => useQuery(getInvitesQueryOptions());
