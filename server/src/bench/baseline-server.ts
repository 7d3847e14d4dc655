import { computeTakeoff, defaultEngineParameters } from '@pondwright/shared/engine';
import { insetPolygon } from '@pondwright/shared/engine/polygon-inset';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { createServer, STATUS_CODES, type IncomingMessage, type ServerResponse } from 'node:http';
import { Pool } from 'pg';
import { JWT_AUDIENCE, JWT_ISSUER } from '../auth/access-tokens';
import { hashToken } from '../auth/secure-token';
import { validateDatabaseEnv } from '../config/env.schema';
import { isUuid } from '../common/tenancy/tenant-repository';
import { saveDraft } from './baseline-save-draft';
import { estimateListPage, estimateView, isStaff, quoteView, type Caller } from './baseline-views';

/**
 * The bench's baseline: `node:http` and `pg` with the real server's pool size, answering the benched
 * routes with the same JSON by plain SQL, without a framework, an ORM, request logging or security
 * headers. Started by `npm run bench` as its own process beside the real server, so neither shares an
 * event loop with the load generator. Settings come from the bench: DB_*, BASELINE_PORT, JWT_SECRET.
 */
const env = validateDatabaseEnv(process.env);
const port = Number(process.env.BASELINE_PORT);
const jwtSecret = Buffer.from(process.env.JWT_SECRET ?? '', 'utf8');
const pool = new Pool({
  host: env.DB_HOST,
  port: env.DB_PORT,
  user: env.DB_USER,
  password: env.DB_PASSWORD,
  database: env.DB_NAME,
  max: env.DB_POOL_SIZE,
});

const ESTIMATE_PATH = /^\/api\/estimates\/([^/]+)$/;
const DRAFT_PATH = /^\/api\/estimates\/([^/]+)\/draft$/;
const QUOTE_PATH = /^\/api\/quotes\/([A-Za-z0-9_-]{43})$/;

createServer((request, response) => {
  route(request, response).catch((error: unknown) => {
    console.error('[baseline]', error);
    if (!response.headersSent) send(response, 500, { message: 'Something went wrong' });
  });
}).listen(port, '127.0.0.1', () => console.log(`[baseline] listening on ${port}`));

async function route(request: IncomingMessage, response: ServerResponse): Promise<void> {
  const url = new URL(request.url ?? '/', 'http://baseline');
  const path = url.pathname;
  const method = request.method ?? 'GET';
  if (path === '/api/health') return send(response, 200, { status: 'ok' });

  const quote = method === 'GET' ? QUOTE_PATH.exec(path) : null;
  if (quote) {
    response.setHeader('Cache-Control', 'no-store');
    const answer = await quoteView(pool, hashToken(quote[1]!), request.socket.remoteAddress ?? '');
    return answer.status === 200
      ? send(response, 200, answer.view)
      : send(response, answer.status, { message: answer.message });
  }

  const caller = authenticate(request);
  if (!caller) return send(response, 401, { message: 'Your session has ended.' });

  if (method === 'POST' && path === '/api/takeoff') {
    const body = await readJson(request);
    if (!(await isStaff(pool, caller))) return send(response, 401, { message: 'Signed out' });
    const result = computeTakeoff(body, defaultEngineParameters, { insetPolygon });
    return result.ok
      ? send(response, 200, result.takeoff)
      : send(response, 400, { message: 'Some fields need attention', details: result.errors });
  }
  if (method === 'GET' && path === '/api/estimates') {
    const page = Number(url.searchParams.get('page') ?? 1);
    const pageSize = Number(url.searchParams.get('pageSize') ?? 25);
    if (!Number.isInteger(page) || page < 1 || !Number.isInteger(pageSize) || pageSize > 100) {
      return send(response, 400, { message: 'Give a whole number' });
    }
    const list = await estimateListPage(pool, caller, page, pageSize);
    return list ? send(response, 200, list) : send(response, 401, { message: 'Signed out' });
  }
  const one = method === 'GET' ? ESTIMATE_PATH.exec(path) : null;
  if (one && isUuid(one[1]!)) {
    const view = await estimateView(pool, caller, one[1]!);
    return view ? send(response, 200, view) : send(response, 404, { message: 'Not found' });
  }
  const draft = method === 'PUT' ? DRAFT_PATH.exec(path) : null;
  if (draft && isUuid(draft[1]!)) {
    const answer = await saveDraft(pool, caller, draft[1]!, await readJson(request));
    return answer.ok
      ? send(response, 200, answer.view)
      : send(response, answer.status, { message: answer.message });
  }
  send(response, 404, { message: 'Not in the baseline' });
}

/**
 * The same checks as the real server's JWT strategy (HS256 signature, issuer, audience, expiry), by
 * hand with node:crypto: the floor, without a JWT library.
 */
function authenticate(request: IncomingMessage): Caller | null {
  const header = request.headers.authorization ?? '';
  const [head, payload, signature] = header.startsWith('Bearer ') ? header.slice(7).split('.') : [];
  if (!head || !payload || !signature) return null;
  const expected = createHmac('sha256', jwtSecret).update(`${head}.${payload}`).digest();
  const given = Buffer.from(signature, 'base64url');
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  try {
    const { alg } = JSON.parse(Buffer.from(head, 'base64url').toString()) as { alg?: string };
    const claims = JSON.parse(Buffer.from(payload, 'base64url').toString()) as {
      sub?: string;
      cid?: string;
      iss?: string;
      aud?: string;
      exp?: number;
    };
    const fresh = typeof claims.exp === 'number' && claims.exp * 1000 > Date.now();
    if (alg !== 'HS256' || claims.iss !== JWT_ISSUER || claims.aud !== JWT_AUDIENCE || !fresh) {
      return null;
    }
    return claims.sub && claims.cid ? { userId: claims.sub, companyId: claims.cid } : null;
  } catch {
    return null;
  }
}

async function readJson(request: IncomingMessage): Promise<unknown> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request) {
    size += (chunk as Buffer).length;
    if (size > 1024 * 1024) throw new Error('Body over 1 MB');
    chunks.push(chunk as Buffer);
  }
  return JSON.parse(Buffer.concat(chunks).toString('utf8'));
}

function send(response: ServerResponse, status: number, body: object): void {
  const payload =
    status < 400
      ? JSON.stringify(body)
      : JSON.stringify({ statusCode: status, error: STATUS_CODES[status], ...body });
  response.writeHead(status, {
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(payload),
  });
  response.end(payload);
}
