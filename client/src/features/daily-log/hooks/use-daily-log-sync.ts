import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { putLogInCache } from '../api/get-log-job';
import { pruneDeviceStorage } from '../storage/prune';
import { outboxSync } from '../sync/outbox-sync';
import { photoSync } from '../sync/photo-sync';

/** How often waiting logs and photos are tried while the app is open, besides the `online` event. */
export const SYNC_INTERVAL_MS = 15_000;

/** Logs first: a photo names its day's log, which the server must have before it takes the photo. */
export async function syncLogsThenPhotos(userId: string): Promise<void> {
  await outboxSync.syncNow(userId);
  await photoSync.syncNow(userId);
}

/**
 * Sends waiting logs, then waiting photos, when the app starts, when the connection comes back, when
 * the app returns to the screen, and every 15 seconds; each log the server stores updates the cached
 * job, and each photo it stores reloads the office's photo list of that job.
 */
export function useDailyLogSync(userId: string): void {
  const queryClient = useQueryClient();

  useEffect(
    () =>
      outboxSync.onSaved((log) => {
        putLogInCache(queryClient, log);
        void photoSync.markLogOnServer(log.id);
      }),
    [queryClient],
  );

  useEffect(
    () =>
      photoSync.onUploaded((photo) => {
        // The office's photo list (features/jobs, key `['jobs', 'photos', jobId]`); only the key is shared.
        void queryClient.invalidateQueries({ queryKey: ['jobs', 'photos', photo.jobId] });
      }),
    [queryClient],
  );

  useEffect(() => {
    const sync = () => void syncLogsThenPhotos(userId);
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
