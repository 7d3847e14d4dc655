import type { AuthTokenResponse } from '@pondwright/shared';
import { API_BASE_PATH } from '@/config/env';
import { NetworkError, toApiError } from './api-error';

// The access token lives only in this module's memory. It is never written to
// localStorage or sessionStorage, so a script injected into the page cannot read it
// back after a reload; the HttpOnly refresh cookie restores the session instead.
let accessToken: string | null = null;
let refreshInFlight: Promise<string | null> | null = null;
// Several requests can fail together when a session ends; the user hears about it once.
let expiryReported = false;
const redirectToSignIn = () => {
  const here = `${window.location.pathname}${window.location.search}`;
  window.location.assign(`/sign-in?next=${encodeURIComponent(here)}`);
};
let onSessionExpired: () => void = redirectToSignIn;

export function getAccessToken(): string | null {
  return accessToken;
}

export function setAccessToken(token: string): void {
  accessToken = token;
  expiryReported = false;
}

export function clearAccessToken(): void {
  accessToken = null;
}

/** The app replaces the default full-page redirect with a router navigation. */
export function setSessionExpiredHandler(handler: () => void): () => void {
  onSessionExpired = handler;
  return () => {
    if (onSessionExpired === handler) onSessionExpired = redirectToSignIn;
  };
}

// Calls that establish or end a session answer 401 for wrong credentials or a missing
// cookie; refreshing and retrying them would be pointless, and could loop on refresh.
const SESSION_CALLS = [
  '/auth/login',
  '/auth/signup',
  '/auth/refresh',
  '/auth/logout',
  '/auth/accept-invite',
  '/auth/invites/',
];

function isSessionCall(path: string): boolean {
  return SESSION_CALLS.some((prefix) =>
    prefix.endsWith('/') ? path.startsWith(prefix) : path === prefix,
  );
}

async function send(input: string, init: RequestInit): Promise<Response> {
  try {
    return await fetch(input, init);
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new NetworkError(cause);
  }
}

/**
 * Exchanges the HttpOnly refresh cookie for a new access token. Concurrent callers share
 * one request, because the server rotates the cookie and a second parallel refresh would
 * present a cookie that is already spent. Resolves to null when there is no session;
 * throws when the server cannot be reached or fails (5xx).
 */
export function refreshAccessToken(): Promise<string | null> {
  refreshInFlight ??= (async () => {
    try {
      const response = await send(`${API_BASE_PATH}/auth/refresh`, {
        method: 'POST',
        credentials: 'include',
        headers: { Accept: 'application/json' },
      });
      // A server or proxy failure says nothing about the session, so it is not a sign-out.
      if (response.status >= 500) throw await toApiError(response);
      if (!response.ok) {
        clearAccessToken();
        return null;
      }
      const body = (await response.json()) as AuthTokenResponse;
      setAccessToken(body.accessToken);
      return body.accessToken;
    } finally {
      refreshInFlight = null;
    }
  })();
  return refreshInFlight;
}

export type RequestOptions = {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** Sent as JSON, or as multipart when it is a FormData. */
  body?: unknown;
  signal?: AbortSignal;
  /** What the caller wants back; JSON unless a file is being downloaded. */
  accept?: string;
};

function buildInit({
  method = 'GET',
  body,
  signal,
  accept = 'application/json',
}: RequestOptions): RequestInit {
  const headers: Record<string, string> = { Accept: accept };
  // A file upload goes as multipart: the browser writes that Content-Type, with its boundary.
  const multipart = body instanceof FormData;
  if (body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
  if (accessToken) headers.Authorization = `Bearer ${accessToken}`;
  return {
    method,
    headers,
    credentials: 'include',
    signal,
    body: body === undefined ? undefined : multipart ? body : JSON.stringify(body),
  };
}

async function parseBody<T>(response: Response): Promise<T> {
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/**
 * Sends one request to `/api{path}`. On a 401 from a non-session call it refreshes the
 * access token once and retries; if the session cannot be renewed it clears the token
 * and hands over to the session-expired handler (the sign-in page with `next`).
 */
async function sendWithSession(path: string, options: RequestOptions): Promise<Response> {
  const url = `${API_BASE_PATH}${path}`;
  const tokenSent = accessToken;
  let response = await send(url, buildInit(options));

  if (response.status === 401 && !isSessionCall(path)) {
    // While this request was in flight another one may already have renewed the token,
    // or found the session over (the token was cleared); neither needs a new refresh.
    const sessionEndedMeanwhile = tokenSent !== null && accessToken === null;
    const renewedMeanwhile = accessToken !== null && accessToken !== tokenSent;
    const renewed = sessionEndedMeanwhile
      ? null
      : renewedMeanwhile
        ? accessToken
        : await refreshAccessToken();
    if (renewed) {
      response = await send(url, buildInit(options));
    }
    if (!renewed || response.status === 401) {
      clearAccessToken();
      if (!expiryReported) {
        expiryReported = true;
        onSessionExpired();
      }
    }
  }

  if (!response.ok) throw await toApiError(response);
  return response;
}

export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  return parseBody<T>(await sendWithSession(path, options));
}

export type DownloadedFile = { blob: Blob; fileName: string | null };

/**
 * Fetches a file with the bearer token, which a plain link cannot send; the file name comes
 * from the answer's Content-Disposition when the server gives one.
 */
export async function apiDownload(path: string, accept = '*/*'): Promise<DownloadedFile> {
  const response = await sendWithSession(path, { method: 'GET', accept });
  const disposition = response.headers.get('Content-Disposition') ?? '';
  const fileName = /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(disposition)?.[1] ?? null;
  return { blob: await response.blob(), fileName: fileName && decodeURIComponent(fileName) };
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'GET' }),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  patch: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  put: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  delete: <T = void>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'DELETE' }),
};
