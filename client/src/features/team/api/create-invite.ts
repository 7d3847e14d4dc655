import type { CreatedInvite, InviteInput } from '@pondwright/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { invitesQueryKey } from './get-invites';

export function createInvite(input: InviteInput): Promise<CreatedInvite> {
  return api.post<CreatedInvite>('/invites', input);
}

export function useCreateInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitesQueryKey }),
  });
}
