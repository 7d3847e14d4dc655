import type { PhotoKind } from '@pondwright/shared';
import { API_BASE_PATH } from '@/config/env';
import { getAccessToken, refreshAccessToken } from '@/lib/api-client';
import { ApiError, NetworkError, toApiError } from '@/lib/api-error';

export type PutLogPhotoInput = {
  jobId: string;
  photoId: string;
  logId: string;
  file: Blob;
  fileName: string;
  kind: PhotoKind;
  caption: string;
  /** 0 to 1, as the bytes leave the phone. */
  onProgress?: (fraction: number) => void;
};

type XhrAnswer = { status: number; statusText: string; body: string };

/**
 * fetch() cannot report upload progress, so the multipart PUT goes through XMLHttpRequest with the
 * bearer token the API client holds (the office uploader in features/jobs does the same).
 */
function put(url: string, body: FormData, onProgress?: (fraction: number) => void) {
  return new Promise<XhrAnswer>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('PUT', url);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getAccessToken();
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress?.(event.loaded / event.total);
    };
    xhr.onload = () =>
      resolve({ status: xhr.status, statusText: xhr.statusText, body: xhr.responseText });
    xhr.onerror = () => reject(new NetworkError());
    xhr.onabort = () => reject(new NetworkError());
    xhr.send(body);
  });
}

function failure(answer: XhrAnswer): Promise<ApiError> | ApiError {
  // A proxy may refuse a large body before the API sees it, without the API's JSON error.
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

/** `PUT /api/jobs/:jobId/photos/:photoId`: 201 new, 200 the same bytes again; throws otherwise. */
export async function putLogPhoto(input: PutLogPhotoInput): Promise<void> {
  const url = `${API_BASE_PATH}/jobs/${encodeURIComponent(input.jobId)}/photos/${encodeURIComponent(input.photoId)}`;
  const body = new FormData();
  body.append('photo', input.file, input.fileName);
  body.append('kind', input.kind);
  body.append('caption', input.caption);
  body.append('logId', input.logId);

  let answer = await put(url, body, input.onProgress);
  // The access token lasts minutes and a queued photo can wait for hours: renew it once.
  if (answer.status === 401 && (await refreshAccessToken())) {
    input.onProgress?.(0);
    answer = await put(url, body, input.onProgress);
  }
  if (answer.status < 200 || answer.status >= 300) throw await failure(answer);
}
