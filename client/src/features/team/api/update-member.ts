import type { Role, TeamMember } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { membersQueryKey } from './get-members';

export type MemberChange = { role?: Role; active?: boolean };

export function updateMember(id: string, change: MemberChange): Promise<TeamMember> {
  return api.patch<TeamMember>(`/users/${encodeURIComponent(id)}`, change);
}

export function useUpdateMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, change }: { id: string; change: MemberChange }) => updateMember(id, change),
    onSuccess: (updated) => {
      queryClient.setQueryData<TeamMember[]>(membersQueryKey, (members) =>
        members?.map((member) => (member.id === updated.id ? updated : member)),
      );
      return queryClient.invalidateQueries({ queryKey: membersQueryKey });
    },
  });
}
