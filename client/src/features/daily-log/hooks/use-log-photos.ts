import type { PhotoKind } from '@pondwright/shared';
import { useCallback, useState } from 'react';
import { photoFileProblem } from '@/lib/photo-file-check';
import { photoSync } from '../sync/photo-sync';
import { newId } from '../utils/new-id';
import { usePhotoOutbox } from './use-photo-outbox';

export type LogPhotoTarget = {
  jobId: string;
  logId: string;
  userId: string;
  /** Whether the server already has the day's log (the photo may then go at once). */
  logOnServer: () => boolean;
};

/** Older phone browsers (and jsdom) lack `Blob.arrayBuffer`; FileReader reads the same bytes. */
function readBytes(file: Blob): Promise<ArrayBuffer> {
  if (typeof file.arrayBuffer === 'function') return file.arrayBuffer();
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(reader.result as ArrayBuffer);
    reader.onerror = () => reject(reader.error);
    reader.readAsArrayBuffer(file);
  });
}

export type Refusal = { id: string; message: string };

/**
 * The day's photos: each chosen file is checked on the phone (type by its first bytes, size), then
 * kept in the phone's photo queue under an id made now, and only then offered to the sender.
 */
export function useLogPhotos({ jobId, logId, userId, logOnServer }: LogPhotoTarget) {
  const { photos, sending } = usePhotoOutbox();
  const [refusals, setRefusals] = useState<Refusal[]>([]);
  const refuse = (id: string, message: string) =>
    setRefusals((current) => [...current, { id, message }]);

  const add = useCallback(
    async (files: readonly File[], kind: PhotoKind, caption: string) => {
      for (const file of files) {
        const id = newId();
        const problem = await photoFileProblem(file);
        if (problem) {
          refuse(id, problem);
          continue;
        }
        try {
          await photoSync.add({
            id,
            jobId,
            logId,
            userId,
            kind,
            caption,
            fileName: file.name || `${id}.jpg`,
            type: file.type || 'image/jpeg',
            bytes: await readBytes(file),
            status: 'waiting',
            message: null,
            queuedAt: new Date().toISOString(),
            logOnServer: logOnServer(),
          });
        } catch {
          refuse(
            id,
            `“${file.name}” could not be kept on this phone: its storage is full or switched off.`,
          );
        }
      }
      void photoSync.syncNow(userId);
    },
    [jobId, logId, userId, logOnServer],
  );

  const dismissRefusal = (id: string) =>
    setRefusals((current) => current.filter((refusal) => refusal.id !== id));

  return {
    photos: photos.filter((photo) => photo.logId === logId),
    sending,
    refusals,
    add,
    dismissRefusal,
    remove: (id: string) => void photoSync.remove(id),
  };
}
