import type { PhotoKind, PhotoView } from '@pondwright/shared';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import { errorMessage } from '@/lib/api-error';
import { jobKeys } from '../api/get-jobs';
import { uploadPhoto } from '../api/upload-photo';
import { newId } from '../utils/new-id';
import { photoFileProblem } from '@/lib/photo-file-check';

export type UploadStatus = 'checking' | 'refused' | 'waiting' | 'uploading' | 'done' | 'failed';

export type PhotoUpload = {
  /** The photo's id, made once for the file: every try of this file is the same photo. */
  id: string;
  file: File;
  kind: PhotoKind;
  caption: string;
  status: UploadStatus;
  /** 0 to 1. */
  progress: number;
  /** Why it was refused or failed. */
  message: string | null;
  /** The server already had these bytes under this id (an earlier try got through). */
  alreadyStored: boolean;
};

/**
 * Checks each chosen file on the device, then uploads the good ones one at a time (a phone on a
 * site's signal does better with one upload than with several at once), with progress per file.
 */
export function usePhotoUploads(jobId: string) {
  const queryClient = useQueryClient();
  const [uploads, setUploads] = useState<PhotoUpload[]>([]);
  const queue = useRef<Promise<void>>(Promise.resolve());

  const patch = useCallback(
    (id: string, change: Partial<PhotoUpload>) =>
      setUploads((current) => current.map((u) => (u.id === id ? { ...u, ...change } : u))),
    [],
  );

  const run = useCallback(
    async (upload: PhotoUpload) => {
      patch(upload.id, { status: 'uploading', progress: 0, message: null });
      try {
        const { photo, created } = await uploadPhoto({
          jobId,
          photoId: upload.id,
          file: upload.file,
          kind: upload.kind,
          caption: upload.caption,
          onProgress: (progress) => patch(upload.id, { progress }),
        });
        patch(upload.id, { status: 'done', progress: 1, alreadyStored: !created });
        queryClient.setQueryData<PhotoView[]>(jobKeys.photos(jobId), (photos) =>
          photos && !photos.some((p) => p.id === photo.id) ? [...photos, photo] : photos,
        );
      } catch (error) {
        patch(upload.id, { status: 'failed', message: errorMessage(error) });
      }
    },
    [jobId, patch, queryClient],
  );

  const enqueue = useCallback(
    (upload: PhotoUpload) => {
      patch(upload.id, { status: 'waiting', progress: 0, message: null });
      queue.current = queue.current.then(() => run(upload));
    },
    [patch, run],
  );

  const add = useCallback(
    (files: readonly File[], kind: PhotoKind, caption: string) => {
      const added: PhotoUpload[] = files.map((file) => ({
        id: newId(),
        file,
        kind,
        caption,
        status: 'checking',
        progress: 0,
        message: null,
        alreadyStored: false,
      }));
      setUploads((current) => [...current, ...added]);
      for (const upload of added) {
        void photoFileProblem(upload.file).then((problem) =>
          problem ? patch(upload.id, { status: 'refused', message: problem }) : enqueue(upload),
        );
      }
    },
    [enqueue, patch],
  );

  const retry = useCallback(
    (id: string) => {
      const upload = uploads.find((u) => u.id === id);
      if (upload?.status === 'failed') enqueue(upload);
    },
    [enqueue, uploads],
  );

  const dismiss = useCallback(
    (id: string) => setUploads((current) => current.filter((u) => u.id !== id)),
    [],
  );

  /** Clears the uploaded and refused rows; the ones still going or to try again stay. */
  const clearFinished = useCallback(
    () =>
      setUploads((current) => current.filter((u) => u.status !== 'done' && u.status !== 'refused')),
    [],
  );

  return { uploads, add, retry, dismiss, clearFinished };
}
