import type { LogValues } from '../utils/log-values';
import { entriesUnder, readJson, removeKey, storageKey, writeJson } from './device-storage';

/**
 * The form as it is on screen, kept on every change so a reload, a dead battery or a closed tab loses
 * no typing. `baseRevision` is the server revision the values were edited from; it lives here, not in
 * the component, so the outbox can move it on when one of this phone's own saves reaches the server.
 */
export type LogDraft = {
  logId: string;
  jobId: string;
  logDate: string;
  baseRevision: number;
  values: LogValues;
  /** Changed since the last save. */
  dirty: boolean;
  updatedAt: string;
};

const DRAFTS = storageKey('draft', '');

export const draftKey = (userId: string, jobId: string, logDate: string) =>
  `${DRAFTS}${userId}.${jobId}.${logDate}`;

export function readDraft(key: string): LogDraft | null {
  return readJson<LogDraft>(key);
}

/** False when the phone's storage refused the write (full, or private browsing). */
export function writeDraft(key: string, draft: LogDraft): boolean {
  try {
    writeJson(key, draft);
    return true;
  } catch {
    return false;
  }
}

export function removeDraft(key: string): void {
  removeKey(key);
}

/**
 * A save of this log reached the server as `to`: a draft edited from the revision that save was based
 * on (`from`; null for any) was edited on top of what is now stored, so it is based on `to`.
 */
export function rebaseDrafts(logId: string, from: number | null, to: number): void {
  for (const [key] of entriesUnder(DRAFTS)) {
    const draft = readDraft(key);
    if (draft?.logId !== logId) continue;
    if (from !== null && draft.baseRevision !== from) continue;
    writeDraft(key, { ...draft, baseRevision: to });
  }
}

/**
 * The server has stored this log at least once: a draft edited from a server revision (revision 0
 * is "never stored"), moved on by this phone's own successful sends.
 */
export function isLogOnServer(logId: string): boolean {
  return entriesUnder(DRAFTS).some(([key]) => {
    const draft = readDraft(key);
    return draft?.logId === logId && draft.baseRevision > 0;
  });
}
