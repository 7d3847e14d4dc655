/**
 * The quote page's own tiny fetch helper. The homeowner never signs in, so none of the staff app's
 * session handling (tokens, refresh, sign-in redirects) belongs here.
 */
export type FieldError = { field: string; message: string };

/** A failed call, with the server's friendly message and, for a 400, the message for each field. */
export class QuoteRequestError extends Error {
  /** The HTTP status; 0 when the server could not be reached. */
  readonly status: number;
  /** The server's stable code, e.g. `QUOTE_VERSION_CHANGED`, when it gave one. */
  readonly code: string | null;
  readonly details: FieldError[];

  constructor(
    status: number,
    message: string,
    code: string | null = null,
    details: FieldError[] = [],
  ) {
    super(message);
    this.name = 'QuoteRequestError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

const FALLBACK_MESSAGES: Record<number, string> = {
  400: 'Some of the details need another look.',
  404: 'We couldn’t find this quote.',
  409: 'This quote changed while you had it open. Reload the page and try again.',
  410: 'This link has expired or was withdrawn. Contact the company that sent it for a new one.',
  429: 'Too many tries in a short time. Wait a moment and try again.',
};
const SERVER_TROUBLE = 'Something went wrong. Please try again in a moment.';
const OFFLINE = 'We couldn’t reach the server. Check your connection and try again.';

type ErrorBody = {
  statusCode: number;
  error?: string;
  code?: string;
  message: string;
  details?: unknown;
};

function isErrorBody(value: unknown): value is ErrorBody {
  return (
    typeof value === 'object' &&
    value !== null &&
    typeof (value as ErrorBody).statusCode === 'number' &&
    typeof (value as ErrorBody).message === 'string'
  );
}

function fieldErrors(details: unknown): FieldError[] {
  if (!Array.isArray(details)) return [];
  return details.filter(
    (d): d is FieldError =>
      typeof d === 'object' &&
      d !== null &&
      typeof (d as FieldError).field === 'string' &&
      typeof (d as FieldError).message === 'string',
  );
}

/** Turns any failed answer into a `QuoteRequestError` whose message is safe to show as it is. */
export async function toQuoteRequestError(response: Response): Promise<QuoteRequestError> {
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // A proxy's HTML error page or an empty body: the fallbacks below speak instead.
  }
  const fallback = FALLBACK_MESSAGES[response.status] ?? SERVER_TROUBLE;
  if (!isErrorBody(body)) return new QuoteRequestError(response.status, fallback);
  // The server's 5xx messages are already plain; anything else odd falls back to ours.
  const message = body.message.trim() || fallback;
  const code = typeof body.code === 'string' ? body.code : null;
  return new QuoteRequestError(response.status, message, code, fieldErrors(body.details));
}

type RequestOptions = { method?: 'GET' | 'POST'; body?: unknown; signal?: AbortSignal };

/** `/api/quotes/<token><path>`, answered as JSON; throws `QuoteRequestError` on any failure. */
export async function quoteRequest<T>(
  token: string,
  path = '',
  { method = 'GET', body, signal }: RequestOptions = {},
): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  let response: Response;
  try {
    response = await fetch(quoteUrl(token, path), {
      method,
      headers,
      credentials: 'same-origin',
      signal,
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new QuoteRequestError(0, OFFLINE);
  }
  if (!response.ok) throw await toQuoteRequestError(response);
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/** The address of one of the quote's resources (the PDF and the logo are plain links). */
export function quoteUrl(token: string, path = ''): string {
  return `/api/quotes/${encodeURIComponent(token)}${path}`;
}

export function isQuoteRequestError(error: unknown, status?: number): error is QuoteRequestError {
  return error instanceof QuoteRequestError && (status === undefined || error.status === status);
}

/** A sentence for any thrown value. */
export function quoteErrorMessage(error: unknown): string {
  return error instanceof QuoteRequestError
    ? error.message
    : 'Something unexpected went wrong. Please try again in a moment.';
}
