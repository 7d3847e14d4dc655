import { ApiError, NetworkError } from '@/lib/api-error';
import { putLogPhoto, type PutLogPhotoInput } from '../api/put-log-photo';
import { isLogOnServer } from '../storage/draft-store';
import { setSignInNeeded } from '../storage/outbox-store';
import {
  photoBlob,
  putQueuedPhoto,
  readQueuedPhotos,
  removeQueuedPhoto,
  updateQueuedPhoto,
  type QueuedPhoto,
} from '../storage/photo-store';

export type PhotoSnapshot = {
  /** As IndexedDB had them at the last change; a new array whenever the queue changes. */
  photos: QueuedPhoto[];
  /** The photo on its way and how far it got (0 to 1). */
  sending: { id: string; progress: number } | null;
};

type PhotoSyncDeps = {
  send: (input: PutLogPhotoInput) => Promise<void>;
  isOnline: () => boolean;
  logOnServer: (logId: string) => boolean;
};

/** Worth trying again later (no signal, a busy or failing server), not a verdict on the photo. */
function isPassing(error: unknown): boolean {
  if (!(error instanceof ApiError)) return true;
  return error.statusCode >= 500 || error.statusCode === 408 || error.statusCode === 429;
}

/**
 * The daily log's photo queue: each photo is written to the phone's IndexedDB when chosen, then sent
 * one at a time (a site's signal does better with one upload than several) once its day's log is on
 * the server, which checks the photo's `logId`. Nothing is dropped except by a send or a person.
 */
export class PhotoSync {
  private listeners = new Set<() => void>();
  private uploadedListeners = new Set<(photo: QueuedPhoto) => void>();
  private snapshot: PhotoSnapshot = { photos: [], sending: null };
  private loaded = false;
  private running: Promise<void> | null = null;
  private wanted = false;

  constructor(private readonly deps: PhotoSyncDeps) {}

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    // IndexedDB answers asynchronously, so the first reader starts the load and hears when it is in.
    if (!this.loaded) void this.refresh();
    return () => this.listeners.delete(listener);
  };

  getSnapshot = (): PhotoSnapshot => this.snapshot;

  onUploaded(listener: (photo: QueuedPhoto) => void): () => void {
    this.uploadedListeners.add(listener);
    return () => this.uploadedListeners.delete(listener);
  }

  private set(change: Partial<PhotoSnapshot>): void {
    this.snapshot = { ...this.snapshot, ...change };
    for (const listener of this.listeners) listener();
  }

  /** Reads the queue again; another tab may have added or sent photos. */
  async refresh(): Promise<void> {
    try {
      const photos = await readQueuedPhotos();
      this.loaded = true;
      this.set({ photos });
    } catch {
      // No IndexedDB here (switched off, or a very private window): there is no queue to show,
      // and adding a photo says so.
      this.loaded = true;
    }
  }

  /** Stores the photo on the phone; resolves only once it is kept, before anything is sent. */
  async add(photo: QueuedPhoto): Promise<void> {
    await putQueuedPhoto(photo);
    await this.refresh();
  }

  /** A person letting a refused photo go: the only way out besides a send. */
  async remove(id: string): Promise<void> {
    await removeQueuedPhoto(id);
    await this.refresh();
  }

  /** The day's log reached the server: its photos may follow. */
  async markLogOnServer(logId: string): Promise<void> {
    try {
      const photos = (await readQueuedPhotos()).filter((p) => p.logId === logId && !p.logOnServer);
      for (const photo of photos) await updateQueuedPhoto(photo.id, { logOnServer: true });
      if (photos.length > 0) await this.refresh();
    } catch {
      // No photo storage on this phone means no photos waiting for this log.
    }
  }

  /** Sends the person's waiting photos; a call while a round runs makes the round go once more. */
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
      await this.refresh();
      // Storage trouble mid-round leaves every photo where it was; the next round tries again.
      await this.drain(userId).catch(() => undefined);
    }
  }

  private async ready(userId: string, tried: Set<string>): Promise<QueuedPhoto | undefined> {
    for (const photo of await readQueuedPhotos()) {
      if (photo.userId !== userId || tried.has(photo.id)) continue;
      // "sending" left over from a closed tab is sent again: the same bytes answer 200.
      if (photo.status !== 'waiting' && photo.status !== 'sending') continue;
      if (photo.logOnServer) return photo;
      if (this.deps.logOnServer(photo.logId)) {
        await updateQueuedPhoto(photo.id, { logOnServer: true });
        return { ...photo, logOnServer: true };
      }
    }
    return undefined;
  }

  private async drain(userId: string): Promise<void> {
    const tried = new Set<string>();
    for (;;) {
      if (!this.deps.isOnline()) return;
      const photo = await this.ready(userId, tried);
      if (!photo) return;
      tried.add(photo.id);
      if (!(await this.sendOne(photo))) return;
    }
  }

  /** Sends one photo; false when the rest should wait too (no connection, no session, trouble). */
  private async sendOne(photo: QueuedPhoto): Promise<boolean> {
    await updateQueuedPhoto(photo.id, { status: 'sending' });
    this.set({ sending: { id: photo.id, progress: 0 } });
    await this.refresh();
    try {
      await this.deps.send({
        jobId: photo.jobId,
        photoId: photo.id,
        logId: photo.logId,
        file: photoBlob(photo),
        fileName: photo.fileName,
        kind: photo.kind,
        caption: photo.caption,
        onProgress: (progress) => this.set({ sending: { id: photo.id, progress } }),
      });
      await removeQueuedPhoto(photo.id);
      setSignInNeeded(false);
      for (const listener of this.uploadedListeners) listener(photo);
      return true;
    } catch (error) {
      return await this.settleFailed(photo, error);
    } finally {
      this.set({ sending: null });
      await this.refresh();
    }
  }

  private async settleFailed(photo: QueuedPhoto, error: unknown): Promise<boolean> {
    if (error instanceof ApiError && error.statusCode === 401) {
      // The same notice as for logs: kept on the phone until the person signs in again.
      setSignInNeeded(true);
      await updateQueuedPhoto(photo.id, { status: 'waiting' });
      return false;
    }
    if (error instanceof NetworkError || isPassing(error)) {
      await updateQueuedPhoto(photo.id, { status: 'waiting' });
      return false;
    }
    const apiError = error as ApiError;
    const status = apiError.statusCode === 409 ? 'conflict' : 'failed';
    await updateQueuedPhoto(photo.id, { status, message: apiError.message });
    return true;
  }

  /** Tests start each case with an idle sender and nothing loaded. */
  reset(): void {
    this.running = null;
    this.wanted = false;
    this.loaded = false;
    this.snapshot = { photos: [], sending: null };
    this.uploadedListeners.clear();
  }
}

export const photoSync = new PhotoSync({
  send: putLogPhoto,
  // Only a definite "offline" skips a try: the flag is often true with no real connection.
  isOnline: () => typeof navigator === 'undefined' || navigator.onLine !== false,
  logOnServer: isLogOnServer,
});
