import type { AcceptInviteInput, AuthTokenResponse } from '@pondwright/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useStartSession } from '../hooks/use-start-session';

export function acceptInvite(input: AcceptInviteInput): Promise<AuthTokenResponse> {
  return api.post<AuthTokenResponse>('/auth/accept-invite', input);
}

export function useAcceptInvite() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: acceptInvite,
    onSuccess: ({ accessToken }) => startSession(accessToken),
  });
}
