import type { InvitePreview } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export function getInvitePreview(token: string): Promise<InvitePreview> {
  return api.get<InvitePreview>(`/auth/invites/${encodeURIComponent(token)}`);
}

export const getInvitePreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['auth', 'invites', token],
    queryFn: () => getInvitePreview(token),
    staleTime: Infinity,
  });

export const useInvitePreview = (token: string) => useQuery(getInvitePreviewQueryOptions(token));
