import { useSyncExternalStore } from 'react';
import { outboxSync, type OutboxSnapshot } from '../sync/outbox-sync';

/** The outbox as the phone has it right now, following saves, sends and other tabs. */
export function useOutbox(): OutboxSnapshot {
  return useSyncExternalStore(outboxSync.subscribe, outboxSync.getSnapshot);
}
