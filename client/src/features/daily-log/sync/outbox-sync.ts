import type { DailyLogView, SaveDailyLogRequest } from '@pondwright/shared';
import { ApiError, NetworkError } from '@/lib/api-error';
import { getStoredLog, putDailyLog } from '../api/put-daily-log';
import { rebaseDrafts } from '../storage/draft-store';
import {
  isOutboxKey,
  isSignInNeeded,
  outboxSignature,
  readOutbox,
  readOutboxItem,
  removeOutboxItem,
  setSignInNeeded,
  writeOutboxItem,
  type OutboxItem,
} from '../storage/outbox-store';
import { problemFromDetails } from '../utils/log-values';
import { newId } from '../utils/new-id';

export type OutboxSnapshot = {
  items: OutboxItem[];
  /** The log being sent right now, if any. */
  sendingLogId: string | null;
  /** The session ran out with logs waiting: only signing in again lets them go. */
  signInNeeded: boolean;
};

export type SaveInput = Pick<OutboxItem, 'logId' | 'jobId' | 'userId' | 'jobLabel' | 'request'>;

type SyncDeps = {
  send: (jobId: string, logId: string, request: SaveDailyLogRequest) => Promise<DailyLogView>;
  loadStored: (jobId: string, logId: string) => Promise<DailyLogView | null>;
  isOnline: () => boolean;
  now: () => Date;
};

// One sender across the phone's tabs; where the browser has no Web Locks, one per tab.
const LOCK_NAME = 'pondwright-daily-log-outbox';

/** Worth trying again later (no signal, a busy or failing server) rather than a verdict on the log. */
function isPassing(error: unknown): boolean {
  if (error instanceof NetworkError) return true;
  if (!(error instanceof ApiError)) return true;
  return error.statusCode >= 500 || error.statusCode === 408 || error.statusCode === 429;
}

/**
 * The daily-log outbox: every save is written to the phone first, then sent, one log at a time, until
 * the server has it. A conflict or a refusal stays on the phone until a person decides; nothing is
 * dropped by the sync itself.
 */
export class OutboxSync {
  private listeners = new Set<() => void>();
  private savedListeners = new Set<(log: DailyLogView) => void>();
  private snapshot: OutboxSnapshot = { items: [], sendingLogId: null, signInNeeded: false };
  private signature: string | null = null;
  private sendingLogId: string | null = null;
  private running: Promise<void> | null = null;
  private wanted = false;

  constructor(private readonly deps: SyncDeps) {}

  private readonly onStorage = (event: StorageEvent) => {
    // Another tab saved or sent a log: this tab's badge and forms follow.
    if (isOutboxKey(event.key)) this.emit();
  };

  subscribe = (listener: () => void): (() => void) => {
    if (this.listeners.size === 0) window.addEventListener('storage', this.onStorage);
    this.listeners.add(listener);
    return () => {
      this.listeners.delete(listener);
      if (this.listeners.size === 0) window.removeEventListener('storage', this.onStorage);
    };
  };

  /** Read from the phone's storage each time, so it is never stale; the same object while nothing changed. */
  getSnapshot = (): OutboxSnapshot => {
    const signature = `${outboxSignature()}|${this.sendingLogId ?? ''}`;
    if (signature !== this.signature) {
      this.signature = signature;
      this.snapshot = {
        items: readOutbox(),
        sendingLogId: this.sendingLogId,
        signInNeeded: isSignInNeeded(),
      };
    }
    return this.snapshot;
  };

  onSaved(listener: (log: DailyLogView) => void): () => void {
    this.savedListeners.add(listener);
    return () => this.savedListeners.delete(listener);
  }

  private emit(): void {
    for (const listener of this.listeners) listener();
  }

  /** Writes the log to the outbox. Throws when the phone cannot store it, before anything is sent. */
  save(input: SaveInput): OutboxItem {
    const previous = readOutboxItem(input.logId);
    const item: OutboxItem = {
      ...input,
      status: 'waiting',
      saveId: newId(),
      // A log saved again keeps its place in the queue.
      queuedAt: previous?.queuedAt ?? this.deps.now().toISOString(),
      attempts: 0,
      lastTriedAt: null,
      lastTrouble: null,
      current: null,
      problem: null,
    };
    writeOutboxItem(item);
    this.emit();
    return item;
  }

  /** "Keep mine": the phone's copy goes again, as an edit of the log the server now has. */
  keepMine(logId: string, storedRevision: number): void {
    const item = readOutboxItem(logId);
    if (!item) return;
    writeOutboxItem({
      ...item,
      status: 'waiting',
      saveId: newId(),
      request: { ...item.request, baseRevision: storedRevision },
      current: null,
      problem: null,
    });
    rebaseDrafts(logId, null, storedRevision);
    this.emit();
  }

  /** "Use the saved one", or a person discarding a refused log: the only ways out besides a send. */
  drop(logId: string): void {
    removeOutboxItem(logId);
    this.emit();
  }

  /**
   * Sends the person's waiting logs, one at a time. A call while a round runs joins it, and the round
   * goes once more, so a log saved mid-round is not left for the next tick.
   */
  syncNow(userId: string): Promise<void> {
    this.wanted = true;
    this.running ??= this.loop(userId).finally(() => {
      this.running = null;
    });
    return this.running;
  }

  private async loop(userId: string): Promise<void> {
    while (this.wanted) {
      this.wanted = false;
      if (!this.waitingFor(userId).length || !this.deps.isOnline()) return;
      await this.withLock(() => this.drain(userId));
    }
  }

  private waitingFor(userId: string): OutboxItem[] {
    return readOutbox().filter((item) => item.userId === userId && item.status === 'waiting');
  }

  private async withLock(work: () => Promise<void>): Promise<void> {
    const locks = typeof navigator === 'undefined' ? undefined : navigator.locks;
    if (!locks) return work();
    await locks.request(LOCK_NAME, { ifAvailable: true }, async (lock) => {
      // Another tab is sending: its round covers these logs too.
      if (lock) await work();
    });
  }

  private async drain(userId: string): Promise<void> {
    const tried = new Set<string>();
    for (;;) {
      if (!this.deps.isOnline()) return;
      const item = this.waitingFor(userId).find((waiting) => !tried.has(waiting.saveId));
      if (!item) return;
      tried.add(item.saveId);
      if (!(await this.sendOne(item))) return;
    }
  }

  /** Sends one log; false when the rest should wait too (no connection, no session, server trouble). */
  private async sendOne(item: OutboxItem): Promise<boolean> {
    this.sendingLogId = item.logId;
    this.emit();
    try {
      const log = await this.deps.send(item.jobId, item.logId, item.request);
      this.settleSaved(item, log);
      return true;
    } catch (error) {
      return await this.settleFailed(item, error);
    } finally {
      this.sendingLogId = null;
      this.emit();
    }
  }

  private settleSaved(sent: OutboxItem, log: DailyLogView): void {
    const stored = readOutboxItem(sent.logId);
    if (stored && stored.saveId !== sent.saveId) {
      // Saved again while this copy was on its way: that newer copy is an edit of what the server
      // now stores, so it is based on the new revision instead of conflicting with this phone's own save.
      if (stored.request.baseRevision === sent.request.baseRevision) {
        writeOutboxItem({ ...stored, request: { ...stored.request, baseRevision: log.revision } });
      }
    } else {
      removeOutboxItem(sent.logId);
    }
    rebaseDrafts(sent.logId, sent.request.baseRevision, log.revision);
    setSignInNeeded(false);
    for (const listener of this.savedListeners) listener(log);
  }

  private async settleFailed(sent: OutboxItem, error: unknown): Promise<boolean> {
    const update = (change: Partial<OutboxItem>) => {
      const stored = readOutboxItem(sent.logId);
      // A copy saved meanwhile is newer than the verdict on this one; it gets its own try.
      if (stored?.saveId === sent.saveId) writeOutboxItem({ ...stored, ...change });
    };
    const tried = { attempts: sent.attempts + 1, lastTriedAt: this.deps.now().toISOString() };

    if (error instanceof ApiError && error.statusCode === 401) {
      setSignInNeeded(true);
      update(tried);
      return false;
    }
    if (isPassing(error)) {
      update({ ...tried, lastTrouble: error instanceof NetworkError ? 'offline' : 'server' });
      return false;
    }
    const apiError = error as ApiError;
    if (apiError.statusCode === 409 && apiError.code === 'LOG_CONFLICT') {
      const current = await this.deps.loadStored(sent.jobId, sent.logId).catch(() => null);
      update({ ...tried, status: 'conflict', current, lastTrouble: null });
      return true;
    }
    update({
      ...tried,
      status: 'rejected',
      lastTrouble: null,
      problem: problemFromDetails(apiError.message, apiError.details, sent.request),
    });
    return true;
  }

  /** Tests start each case with an idle sender. */
  reset(): void {
    this.running = null;
    this.wanted = false;
    this.sendingLogId = null;
    this.signature = null;
    this.savedListeners.clear();
  }
}

export const outboxSync = new OutboxSync({
  send: putDailyLog,
  loadStored: getStoredLog,
  // Only a definite "offline" skips a try: the flag is often true with no real connection.
  isOnline: () => typeof navigator === 'undefined' || navigator.onLine !== false,
  now: () => new Date(),
});
