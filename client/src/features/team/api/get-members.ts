import type { TeamMember } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export const membersQueryKey = ['team', 'members'] as const;

export function getMembers(): Promise<TeamMember[]> {
  return api.get<TeamMember[]>('/users');
}

export const getMembersQueryOptions = () =>
  queryOptions({ queryKey: membersQueryKey, queryFn: getMembers });

export const useMembers = () => useQuery(getMembersQueryOptions());
