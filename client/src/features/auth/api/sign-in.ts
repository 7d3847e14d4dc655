import type { AuthTokenResponse, LoginInput } from '@pondwright/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useStartSession } from '../hooks/use-start-session';

export function signIn(input: LoginInput): Promise<AuthTokenResponse> {
  return api.post<AuthTokenResponse>('/auth/login', input);
}

export function useSignIn() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: signIn,
    onSuccess: ({ accessToken }) => startSession(accessToken),
  });
}
