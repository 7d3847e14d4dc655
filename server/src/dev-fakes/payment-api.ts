// The payment API's conventions the fake follows: secret-key auth, `{error: {type, message}}` bodies
// with a Request-Id header, and `<prefix>_test_<random>` object ids.
import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { IncomingMessage, ServerResponse } from 'node:http';
import { sendJson } from './loopback-http';

/** The SDK sends `Authorization: Bearer <key>`; curl users tend to send the key as the Basic user. */
export function isAuthorized(request: IncomingMessage, secretKey: string): boolean {
  const header = request.headers.authorization ?? '';
  const [scheme = '', credentials = ''] = header.split(' ', 2);
  let presented = '';
  if (scheme.toLowerCase() === 'bearer') presented = credentials;
  else if (scheme.toLowerCase() === 'basic') {
    presented = Buffer.from(credentials, 'base64').toString('utf8').split(':')[0] ?? '';
  }
  const expected = Buffer.from(secretKey);
  const given = Buffer.from(presented);
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export function sendApiError(
  response: ServerResponse,
  status: number,
  type: 'invalid_request_error' | 'idempotency_error',
  details: { message: string; code?: string; param?: string },
): void {
  sendJson(response, status, { error: { type, ...details } }, { 'Request-Id': requestId() });
}

export function sendRawJson(
  response: ServerResponse,
  status: number,
  json: string,
  headers: Record<string, string> = {},
): void {
  response.writeHead(status, {
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(json),
    'Request-Id': requestId(),
    ...headers,
  });
  response.end(json);
}

export function headerValue(request: IncomingMessage, name: string): string | undefined {
  const value = request.headers[name];
  return Array.isArray(value) ? value[0] : value;
}

export function randomToken(): string {
  return randomBytes(12).toString('base64url').replace(/[-_]/g, 'x');
}

function requestId(): string {
  return `req_${randomToken()}`;
}

export function unixNow(): number {
  return Math.floor(Date.now() / 1000);
}
