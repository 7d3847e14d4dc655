import type { CookieOptions, Request, Response } from 'express';

export const REFRESH_COOKIE = 'pw_refresh';

/** HttpOnly so scripts never see it, SameSite=Strict so other sites never send it, scoped to /api/auth. */
function cookieOptions(secure: boolean): CookieOptions {
  return { httpOnly: true, sameSite: 'strict', secure, path: '/api/auth' };
}

export function setRefreshCookie(
  response: Response,
  token: string,
  expiresAt: Date,
  secure: boolean,
): void {
  response.cookie(REFRESH_COOKIE, token, { ...cookieOptions(secure), expires: expiresAt });
}

export function clearRefreshCookie(response: Response, secure: boolean): void {
  response.clearCookie(REFRESH_COOKIE, cookieOptions(secure));
}

export function readRefreshCookie(request: Request): string | undefined {
  const value = (request.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
  return typeof value === 'string' && value.length > 0 ? value : undefined;
}
