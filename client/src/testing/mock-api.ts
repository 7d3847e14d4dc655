import { vi } from 'vitest';

export type RecordedRequest = {
  method: string;
  path: string;
  body: unknown;
  headers: Record<string, string>;
  credentials: RequestCredentials | undefined;
};

type Reply = Response | Promise<Response>;
type Handler = (request: RecordedRequest) => Reply;

export function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

export function noContent(): Response {
  return new Response(null, { status: 204 });
}

const STATUS_TEXT: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  410: 'Gone',
  429: 'Too Many Requests',
};

export function apiError(
  statusCode: number,
  message: string,
  details?: Array<{ field: string; message: string }>,
): Response {
  return json(
    { statusCode, error: STATUS_TEXT[statusCode] ?? 'Error', message, details },
    statusCode,
  );
}

/**
 * Replaces `fetch` at the network boundary with a table of routes such as
 * `'POST /api/auth/login'`. Each route answers with a Response, or with a list of
 * Responses used in turn (the last one repeats). Unknown routes fail the test loudly.
 */
export function mockApi(routes: Record<string, Handler | Response | Response[]>) {
  const requests: RecordedRequest[] = [];
  const counters = new Map<string, number>();

  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://localhost');
    const method = (init.method ?? 'GET').toUpperCase();
    const key = `${method} ${url.pathname}`;
    const headers = Object.fromEntries(new Headers(init.headers).entries());
    const request: RecordedRequest = {
      method,
      path: url.pathname,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
      headers,
      credentials: init.credentials,
    };
    requests.push(request);

    const route = routes[key];
    if (route === undefined) throw new Error(`Unexpected request in test: ${key}`);
    if (typeof route === 'function') return (await route(request)).clone();
    if (Array.isArray(route)) {
      const count = counters.get(key) ?? 0;
      counters.set(key, count + 1);
      const reply = route[Math.min(count, route.length - 1)];
      if (!reply) throw new Error(`No reply configured for ${key}`);
      return reply.clone();
    }
    return route.clone();
  });

  vi.stubGlobal('fetch', fetchMock);

  return {
    fetch: fetchMock,
    requests,
    callsTo: (key: string) =>
      requests.filter((request) => `${request.method} ${request.path}` === key),
    set: (key: string, handler: Handler | Response | Response[]) => {
      routes[key] = handler;
      counters.delete(key);
    },
  };
}
