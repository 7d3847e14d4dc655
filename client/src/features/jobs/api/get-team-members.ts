import type { TeamMember } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/**
 * The people who can lead a crew: `GET /api/users`, the team page's list (owners only). Features do
 * not import each other, so this small call is repeated here under the team page's query key.
 */
export const teamMembersQueryKey = ['team', 'members'] as const;

export const getTeamMembersQueryOptions = () =>
  queryOptions({
    queryKey: teamMembersQueryKey,
    queryFn: () => api.get<TeamMember[]>('/users'),
  });

export const useTeamMembers = ({ enabled = true }: { enabled?: boolean } = {}) =>
  useQuery({ ...getTeamMembersQueryOptions(), enabled });
