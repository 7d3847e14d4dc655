import type { AuthTokenResponse, SignupInput } from '@pondwright/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { useStartSession } from '../hooks/use-start-session';

export function signUp(input: SignupInput): Promise<AuthTokenResponse> {
  return api.post<AuthTokenResponse>('/auth/signup', input);
}

export function useSignUp() {
  const startSession = useStartSession();
  return useMutation({
    mutationFn: signUp,
    onSuccess: ({ accessToken }) => startSession(accessToken),
  });
}
