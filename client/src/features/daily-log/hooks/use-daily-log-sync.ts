import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { putLogInCache } from '../api/get-log-job';
import { pruneDeviceStorage } from '../storage/prune';
import { outboxSync } from '../sync/outbox-sync';

/** How often waiting logs are tried while the app is open, besides the `online` event. */
export const SYNC_INTERVAL_MS = 15_000;

/**
 * Sends waiting logs when the app starts, when the connection comes back, when the app returns to the
 * screen, and every 15 seconds; each log the server stores updates the cached job.
 */
export function useDailyLogSync(userId: string): void {
  const queryClient = useQueryClient();

  useEffect(() => outboxSync.onSaved((log) => putLogInCache(queryClient, log)), [queryClient]);

  useEffect(() => {
    const sync = () => void outboxSync.syncNow(userId);
    const onVisible = () => {
      if (document.visibilityState === 'visible') sync();
    };
    pruneDeviceStorage();
    sync();
    window.addEventListener('online', sync);
    document.addEventListener('visibilitychange', onVisible);
    const timer = window.setInterval(sync, SYNC_INTERVAL_MS);
    return () => {
      window.removeEventListener('online', sync);
      document.removeEventListener('visibilitychange', onVisible);
      window.clearInterval(timer);
    };
  }, [userId]);
}
