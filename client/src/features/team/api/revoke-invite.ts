import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitesQueryKey } from './get-invites';

export function revokeInvite(id: string): Promise<void> {
  return api.delete(`/invites/${encodeURIComponent(id)}`);
}

export function useRevokeInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitesQueryKey }),
  });
}
