import type { PhotoKind } from '@pondwright/shared';
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';

/**
 * waiting: to be sent. sending: on its way (a reload mid-send leaves it so, and it is simply sent
 * again: the server answers 200 for the same bytes under the same id). failed: the server refused it
 * (not an image, too large). conflict: the id holds other bytes. Only a send or a person removes one.
 */
export type PhotoStatus = 'waiting' | 'sending' | 'failed' | 'conflict';

export type QueuedPhoto = {
  /** Made on the phone when the photo is chosen; every try is the same photo. */
  id: string;
  jobId: string;
  /** The day's log; the server checks that it exists, so the photo goes only after the log. */
  logId: string;
  /** Only the person who took a photo sends it. */
  userId: string;
  kind: PhotoKind;
  caption: string;
  fileName: string;
  type: string;
  /**
   * The photo's bytes. Kept as an ArrayBuffer rather than the Blob itself: every browser (and the
   * tests' fake IndexedDB) stores an ArrayBuffer, while Blobs in IndexedDB have been unreliable.
   */
  bytes: ArrayBuffer;
  status: PhotoStatus;
  /** The server's message for a refusal or a conflict. */
  message: string | null;
  queuedAt: string;
  /** The log was seen on the server once; a log's draft can be pruned later, so this is kept. */
  logOnServer: boolean;
};

interface PhotoDb extends DBSchema {
  outbox: { key: string; value: QueuedPhoto };
}

const DB_NAME = 'pondwright-photos';
let opening: Promise<IDBPDatabase<PhotoDb>> | null = null;

function db(): Promise<IDBPDatabase<PhotoDb>> {
  opening ??= openDB<PhotoDb>(DB_NAME, 1, {
    upgrade(database) {
      database.createObjectStore('outbox', { keyPath: 'id' });
    },
  });
  return opening;
}

/** Resolves once the photo is on the phone; throws when storage is full or switched off. */
export async function putQueuedPhoto(photo: QueuedPhoto): Promise<void> {
  await (await db()).put('outbox', photo);
}

export async function getQueuedPhoto(id: string): Promise<QueuedPhoto | undefined> {
  return (await db()).get('outbox', id);
}

export async function readQueuedPhotos(): Promise<QueuedPhoto[]> {
  const all = await (await db()).getAll('outbox');
  return all.sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
}

/** Changes a photo still in the queue; one removed meanwhile stays removed. */
export async function updateQueuedPhoto(id: string, change: Partial<QueuedPhoto>): Promise<void> {
  const database = await db();
  const tx = database.transaction('outbox', 'readwrite');
  const stored = await tx.store.get(id);
  if (stored) await tx.store.put({ ...stored, ...change });
  await tx.done;
}

export async function removeQueuedPhoto(id: string): Promise<void> {
  await (await db()).delete('outbox', id);
}

/** Tests start each case with an empty queue. */
export async function clearQueuedPhotos(): Promise<void> {
  await (await db()).clear('outbox');
}

export const photoBlob = (photo: QueuedPhoto) => new Blob([photo.bytes], { type: photo.type });
