import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { entriesUnder, readJson, removeKey, storageKey, writeJson } from './device-storage';

/**
 * waiting: to be sent. conflict: someone saved the day's log after this copy was started; a person
 * chooses which one stays. rejected: the server refused it (a field, a closed job); it waits for a fix.
 * Nothing leaves the outbox except by a successful send or a person's choice.
 */
export type OutboxStatus = 'waiting' | 'conflict' | 'rejected';

/** A message from the server, tied to the row it is about by the row's id, which survives reordering. */
export type OutboxProblem = {
  message: string;
  fields: Array<{ entryId: string | null; field: string; message: string }>;
};

export type OutboxItem = {
  logId: string;
  jobId: string;
  /** Only the person who saved a log sends it, so it is never filed under someone else's name. */
  userId: string;
  /** "#12 Koi pond", for lists shown before (or without) the job loading. */
  jobLabel: string;
  /** The body of `PUT /api/jobs/:jobId/logs/:logId`, baseRevision included. */
  request: SaveDailyLogRequest;
  status: OutboxStatus;
  /** New on every save, so a send in flight can tell that its copy has been replaced meanwhile. */
  saveId: string;
  queuedAt: string;
  attempts: number;
  lastTriedAt: string | null;
  /** Why the last try did not get through: no connection, or trouble on the server. */
  lastTrouble: 'offline' | 'server' | null;
  /** For a conflict: the log as the server has it, when it could be fetched. */
  current: DailyLogView | null;
  problem: OutboxProblem | null;
};

const OUTBOX = storageKey('outbox', '');
const SIGN_IN_NEEDED = storageKey('sign-in-needed');

const itemKey = (logId: string) => OUTBOX + logId;

export function readOutboxItem(logId: string): OutboxItem | null {
  return readJson<OutboxItem>(itemKey(logId));
}

/** One key per log, so two tabs saving different logs never overwrite each other's outbox. */
export function writeOutboxItem(item: OutboxItem): void {
  writeJson(itemKey(item.logId), item);
}

export function removeOutboxItem(logId: string): void {
  removeKey(itemKey(logId));
}

/** The raw text of the whole outbox: equal text, equal outbox. */
export function outboxSignature(): string {
  return (
    entriesUnder(OUTBOX)
      .map(([, raw]) => raw)
      .join('\n') + (window.localStorage.getItem(SIGN_IN_NEEDED) ?? '')
  );
}

export function readOutbox(): OutboxItem[] {
  return entriesUnder(OUTBOX)
    .map(([key]) => readJson<OutboxItem>(key))
    .filter((item): item is OutboxItem => item !== null && typeof item.logId === 'string')
    .sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
}

/** Kept on the phone: a reload, or the sign-in page, still knows the session ran out with logs waiting. */
export function isSignInNeeded(): boolean {
  return window.localStorage.getItem(SIGN_IN_NEEDED) === '1';
}

export function setSignInNeeded(needed: boolean): void {
  if (needed) window.localStorage.setItem(SIGN_IN_NEEDED, '1');
  else window.localStorage.removeItem(SIGN_IN_NEEDED);
}

export function isOutboxKey(key: string | null): boolean {
  return key === null || key.startsWith(OUTBOX) || key === SIGN_IN_NEEDED;
}
