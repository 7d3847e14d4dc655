import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { clearAccessToken } from '@/lib/api-client';
import { currentUserQueryKey } from '../api/get-current-user';
import { forgetSignedInUser, setOpenedOffline } from '../session/offline-session';

/**
 * Forgets the token and the user. `RequireAuth` then leaves any signed-in page for the
 * sign-in page; cached data is dropped once those pages have unmounted (see
 * `useForgetDataWhenSignedOut`), because removing queries that are still on screen would
 * fetch them again. The device also forgets who was signed in, so it no longer opens offline as them.
 */
export function useEndSession() {
  const queryClient = useQueryClient();
  return useCallback(() => {
    clearAccessToken();
    forgetSignedInUser();
    setOpenedOffline(false);
    queryClient.setQueryData(currentUserQueryKey, null);
  }, [queryClient]);
}
