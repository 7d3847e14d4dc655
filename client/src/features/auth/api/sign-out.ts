import { useMutation } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { api } from '@/lib/api-client';
import { useEndSession } from '../hooks/use-end-session';

export function signOut(): Promise<void> {
  return api.post<void>('/auth/logout');
}

/** Ends the session locally even if the server cannot be reached, so this device is signed out. */
export function useSignOut() {
  const endSession = useEndSession();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: signOut,
    onSettled: () => {
      endSession();
      // The sign-in page is bundled eagerly, so this navigation lands before the guard
      // reacts to the missing user and would add a `next` back to the page being left.
      return navigate(paths.signIn.getHref(), { replace: true });
    },
  });
}
