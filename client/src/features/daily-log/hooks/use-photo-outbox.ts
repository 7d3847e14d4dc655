import { useSyncExternalStore } from 'react';
import { photoSync, type PhotoSnapshot } from '../sync/photo-sync';

/** The photos kept on this phone and not sent yet, following adds, sends and removals. */
export function usePhotoOutbox(): PhotoSnapshot {
  return useSyncExternalStore(photoSync.subscribe, photoSync.getSnapshot);
}
