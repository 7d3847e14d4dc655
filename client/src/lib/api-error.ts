import type { ApiErrorBody } from '@pondwright/shared';

export type FieldError = { field: string; message: string };

/** An error answer from the API, in the server's one JSON shape. */
export class ApiError extends Error {
  readonly statusCode: number;
  readonly error: string;
  readonly details: FieldError[];
  /** The server's stable code when it gives one, e.g. `ESTIMATE_LOCKED`. */
  readonly code: string | null;

  constructor(body: ApiErrorBody & { code?: unknown }) {
    super(body.message);
    this.name = 'ApiError';
    this.statusCode = body.statusCode;
    this.error = body.error;
    this.details = body.details ?? [];
    this.code = typeof body.code === 'string' ? body.code : null;
  }
}

/** The server could not be reached at all (offline, proxy down, CORS). */
export class NetworkError extends Error {
  constructor(cause?: unknown) {
    super('Pondwright could not reach the server. Check your connection and try again.', { cause });
    this.name = 'NetworkError';
  }
}

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'Some of the details need another look.',
  401: 'Please sign in to continue.',
  403: 'Your role does not allow this.',
  404: 'That could not be found.',
  409: 'That conflicts with the current state. Reload and try again.',
  410: 'That link is no longer valid.',
  429: 'Too many attempts. Wait a moment and try again.',
};

function isErrorBody(value: unknown): value is ApiErrorBody {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as ApiErrorBody).statusCode === 'number' &&
    typeof (value as ApiErrorBody).message === 'string'
  );
}

/** Builds an `ApiError` from any failed response, even one that is not our JSON shape. */
export async function toApiError(response: Response): Promise<ApiError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // A proxy error page or an empty body: fall back to the status text below.
  }
  if (isErrorBody(body)) {
    const details = Array.isArray(body.details)
      ? body.details.filter(
          (detail): detail is FieldError =>
            typeof detail?.field === 'string' && typeof detail?.message === 'string',
        )
      : undefined;
    return new ApiError({ ...body, details });
  }
  return new ApiError({
    statusCode: response.status,
    error: response.statusText || 'Error',
    message:
      FALLBACK_MESSAGES[response.status] ??
      'Something went wrong on our side. Try again in a moment.',
  });
}

/** A short sentence for any thrown value, for notifications and error panels. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError || error instanceof NetworkError) return error.message;
  return 'Something unexpected went wrong. Try again in a moment.';
}

export function isApiError(error: unknown, statusCode?: number): error is ApiError {
  return error instanceof ApiError && (statusCode === undefined || error.statusCode === statusCode);
}
