import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { currentUserQueryKey } from '../api/get-current-user';

/** How often to look for the server while opened offline: the browser's "online" event misses a server that is back. */
const RETRY_MS = 30_000;

/**
 * While the app runs opened offline, asks the server again for the session as soon as the browser
 * says it is online, and every half minute; the refresh cookie then restores a real session (or the
 * sign-in page appears if it has ended), and the waiting logs go out.
 */
export function useReconnectSession(openedOffline: boolean): void {
  const queryClient = useQueryClient();

  useEffect(() => {
    if (!openedOffline) return;
    const retry = () => void queryClient.refetchQueries({ queryKey: currentUserQueryKey });
    window.addEventListener('online', retry);
    const timer = window.setInterval(retry, RETRY_MS);
    return () => {
      window.removeEventListener('online', retry);
      window.clearInterval(timer);
    };
  }, [openedOffline, queryClient]);
}
