import type { PhotoKind, PhotoView } from '@pondwright/shared';
import { API_BASE_PATH } from '@/config/env';
import { getAccessToken, refreshAccessToken } from '@/lib/api-client';
import { ApiError, NetworkError, toApiError } from '@/lib/api-error';

export type UploadPhotoInput = {
  jobId: string;
  /** Made once per file on this device, so a retry stores the same photo rather than a second one. */
  photoId: string;
  file: File;
  kind: PhotoKind;
  caption: string;
  /** 0 to 1, as the bytes leave the browser. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
};

/** The stored photo, and whether this upload made it (201) or it was already there (200). */
export type UploadedPhoto = { photo: PhotoView; created: boolean };

type XhrAnswer = { status: number; statusText: string; body: string };

/**
 * fetch() cannot report upload progress, so the one multipart PUT goes through XMLHttpRequest, with
 * the bearer token the API client holds in memory.
 */
function put(url: string, body: FormData, input: UploadPhotoInput): Promise<XhrAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('PUT', url);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getAccessToken();
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) input.onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () =>
      resolve({ status: xhr.status, statusText: xhr.statusText, body: xhr.responseText });
    xhr.onerror = () => reject(new NetworkError());
    xhr.onabort = () => reject(new DOMException('The upload was stopped', 'AbortError'));
    input.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

async function failure(answer: XhrAnswer): Promise<ApiError> {
  // A proxy may refuse a large body before the API sees it, without our JSON error shape.
  if (answer.status === 413 && !answer.body.trim().startsWith('{')) {
    return new ApiError({
      statusCode: 413,
      error: 'Payload Too Large',
      message: 'The photo is too large to upload. Photos can be at most 15 MB.',
      code: 'PHOTO_TOO_LARGE',
    });
  }
  return toApiError(
    new Response(answer.body || null, { status: answer.status, statusText: answer.statusText }),
  );
}

/** `PUT /api/jobs/:jobId/photos/:photoId`, multipart: the file as `photo`, then `kind` and `caption`. */
export async function uploadPhoto(input: UploadPhotoInput): Promise<UploadedPhoto> {
  const url = `${API_BASE_PATH}/jobs/${encodeURIComponent(input.jobId)}/photos/${encodeURIComponent(input.photoId)}`;
  const body = new FormData();
  body.append('photo', input.file, input.file.name);
  body.append('kind', input.kind);
  body.append('caption', input.caption);

  let answer = await put(url, body, input);
  // The access token lasts minutes and a phone upload can wait longer: renew it once and go again.
  if (answer.status === 401 && (await refreshAccessToken())) {
    input.onProgress?.(0);
    answer = await put(url, body, input);
  }
  if (answer.status < 200 || answer.status >= 300) throw await failure(answer);
  return { photo: JSON.parse(answer.body) as PhotoView, created: answer.status === 201 };
}
