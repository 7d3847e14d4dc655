import { entriesUnder, readJson, removeKey, storageKey } from './device-storage';
import type { LogDraft } from './draft-store';
import { readOutboxItem } from './outbox-store';

const DAY_MS = 24 * 60 * 60 * 1000;
/** A saved day's form, once sent, is only a convenience; the server has the log. */
const SAVED_DRAFT_DAYS = 7;
/** Copies of jobs and lists for working without a connection. */
const COPY_DAYS = 30;

/**
 * Clears what the phone no longer needs, so months of daily use never fill the storage the outbox
 * depends on. Unsaved typing and anything still in the outbox are never touched.
 */
export function pruneDeviceStorage(now = new Date()): void {
  const older = (iso: string | null | undefined, days: number) =>
    !iso || now.getTime() - new Date(iso).getTime() > days * DAY_MS;

  for (const [key] of entriesUnder(storageKey('draft', ''))) {
    const draft = readJson<LogDraft>(key);
    if (!draft || draft.dirty || readOutboxItem(draft.logId)) continue;
    if (older(draft.updatedAt, SAVED_DRAFT_DAYS)) removeKey(key);
  }
  for (const [key] of entriesUnder(storageKey('copy', ''))) {
    if (older(readJson<{ copiedAt?: string }>(key)?.copiedAt, COPY_DAYS)) removeKey(key);
  }
}
