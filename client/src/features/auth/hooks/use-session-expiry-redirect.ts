import { useEffect } from 'react';
import { setSessionExpiredHandler } from '@/lib/api-client';
import { notifyError } from '@/lib/notify';
import { useEndSession } from './use-end-session';

/**
 * When a request finds the session gone (the refresh was refused), forget the user;
 * `RequireAuth` then sends them to sign in with `next` set to the page they were on.
 */
export function useSessionExpiryRedirect(): void {
  const endSession = useEndSession();

  useEffect(
    () =>
      setSessionExpiredHandler(() => {
        endSession();
        notifyError('Your session has ended. Sign in again to carry on.', 'Signed out');
      }),
    [endSession],
  );
}
