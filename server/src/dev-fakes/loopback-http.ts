import type { IncomingMessage, Server, ServerResponse } from 'node:http';
import type { AddressInfo, Server as NetServer } from 'node:net';

/** The fakes accept anything from anyone (no auth, no TLS), so they never listen beyond this machine. */
export function assertLoopback(host: string): void {
  const loopback = host === 'localhost' || host === '::1' || /^127(\.\d{1,3}){3}$/.test(host);
  if (!loopback) throw new Error(`the local fakes listen on loopback only, not on "${host}"`);
}

/** Listens on host:port (0 picks a free port) and resolves the port actually bound. */
export function listenOn(server: NetServer, port: number, host: string): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.once('error', onError);
    server.listen(port, host, () => {
      server.off('error', onError);
      resolve((server.address() as AddressInfo).port);
    });
  });
}

/** Closes an HTTP server, dropping idle keep-alive sockets so the promise does not wait on them. */
export function closeHttpServer(server: Server): Promise<void> {
  return new Promise((resolve) => {
    server.close(() => resolve());
    server.closeIdleConnections();
  });
}

/** Reads a request body; rejects past `limitBytes` so a runaway client cannot exhaust memory. */
export async function readBody(request: IncomingMessage, limitBytes = 1_000_000): Promise<Buffer> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > limitBytes) throw new Error(`request body over ${limitBytes} bytes`);
    chunks.push(chunk);
  }
  return Buffer.concat(chunks);
}

export function sendJson(
  response: ServerResponse,
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): void {
  const payload = JSON.stringify(body);
  response.writeHead(status, {
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(payload),
    'Cache-Control': 'no-store',
    ...headers,
  });
  response.end(payload);
}

export function sendText(
  response: ServerResponse,
  status: number,
  body: string | Buffer,
  contentType = 'text/plain; charset=utf-8',
): void {
  response.writeHead(status, {
    'Content-Type': contentType,
    'Content-Length': Buffer.byteLength(body),
    'Cache-Control': 'no-store',
  });
  response.end(body);
}

/** Runs an async route handler, answering 500 instead of leaving the request hanging on a throw. */
export function handleRequests(
  route: (request: IncomingMessage, response: ServerResponse) => Promise<void>,
): (request: IncomingMessage, response: ServerResponse) => void {
  return (request, response) => {
    route(request, response).catch((error: unknown) => {
      const message = error instanceof Error ? error.message : String(error);
      if (!response.headersSent) sendJson(response, 500, { error: { message } });
      else response.destroy();
    });
  };
}
