// A local stand-in for the payment provider: the two checkout-session API calls the server makes through
// the `stripe` SDK (pointed here with host/port/protocol), a test checkout page, and the signed
// `checkout.session.completed` webhook. Nothing here touches real money or the real provider.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { renderCheckoutPage, renderMissingCheckoutPage, successUrlFor } from './checkout-page';
import {
  type CheckoutLineItem,
  type CheckoutSession,
  CheckoutRequestError,
  createCheckoutSession,
} from './checkout-session';
import { parseBracketForm } from './form-body';
import {
  assertLoopback,
  closeHttpServer,
  handleRequests,
  listenOn,
  readBody,
  sendJson,
  sendText,
} from './loopback-http';
import {
  headerValue,
  isAuthorized,
  randomToken,
  sendApiError,
  sendRawJson,
  unixNow,
} from './payment-api';
import { type DeliveryAttempt, deliverWebhook } from './webhook-delivery';

export type FakePaymentsOptions = {
  port: number;
  secretKey: string;
  webhookSecret: string;
  webhookUrl: string;
  host?: string;
  /** Where delivery problems are reported; silent by default (tests). */
  log?: (line: string) => void;
  /** Webhook retry pacing; tests shorten it. */
  webhookFirstBackoffMs?: number;
};

export type FakePayments = {
  port: number;
  url: string;
  /** Newest first. */
  sessions(): CheckoutSession[];
  stop(): Promise<void>;
};

export type WebhookEvent = {
  id: string;
  object: 'event';
  type: 'checkout.session.completed';
  api_version: string | null;
  created: number;
  data: { object: CheckoutSession };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
};

type SessionRecord = {
  session: CheckoutSession;
  lineItems: CheckoutLineItem[];
  apiVersion: string | null;
};
type EventRecord = { event: WebhookEvent; payload: string; deliveries: DeliveryAttempt[] };
type IdempotentResult = { requestBody: string; responseBody: string };

export async function startFakePayments(options: FakePaymentsOptions): Promise<FakePayments> {
  const host = options.host ?? '127.0.0.1';
  assertLoopback(host);
  const log = options.log ?? (() => undefined);
  const sessions = new Map<string, SessionRecord>();
  const events: EventRecord[] = [];
  const idempotentResults = new Map<string, IdempotentResult>();
  let baseUrl = '';
  // The SDK keys every POST, so the memory of keys is bounded; the oldest are forgotten first.
  const rememberIdempotentResult = (key: string, result: IdempotentResult) => {
    idempotentResults.set(key, result);
    const oldest = idempotentResults.keys().next().value;
    if (idempotentResults.size > MAX_IDEMPOTENCY_KEYS && oldest) idempotentResults.delete(oldest);
  };

  const deliver = async (record: EventRecord) => {
    const result = await deliverWebhook({
      url: options.webhookUrl,
      payload: record.payload,
      secret: options.webhookSecret,
      firstBackoffMs: options.webhookFirstBackoffMs,
    });
    record.deliveries.push(...result.attempts);
    if (!result.delivered) {
      const last = result.attempts.at(-1);
      log(
        `webhook ${record.event.id} not delivered to ${options.webhookUrl} after ${result.attempts.length} attempts (${last?.error ?? `HTTP ${last?.status}`})`,
      );
    }
    return result;
  };

  const createSession = async (request: IncomingMessage, response: ServerResponse) => {
    const requestBody = (await readBody(request)).toString('utf8');
    const idempotencyKey = headerValue(request, 'idempotency-key');
    const earlier = idempotencyKey ? idempotentResults.get(idempotencyKey) : undefined;
    if (earlier) {
      // The provider replays the first answer for a repeated key, and refuses a key reused for
      // different parameters.
      if (earlier.requestBody !== requestBody) {
        return sendApiError(response, 400, 'idempotency_error', {
          message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${idempotencyKey}'.`,
        });
      }
      return sendRawJson(response, 200, earlier.responseBody, { 'Idempotent-Replayed': 'true' });
    }
    const id = `cs_test_${randomToken()}`;
    const { session, lineItems } = createCheckoutSession(parseBracketForm(requestBody), {
      id,
      url: `${baseUrl}/checkout/${id}`,
      now: unixNow(),
    });
    sessions.set(id, {
      session,
      lineItems,
      apiVersion: headerValue(request, 'stripe-version') ?? null,
    });
    const responseBody = JSON.stringify(session);
    if (idempotencyKey) rememberIdempotentResult(idempotencyKey, { requestBody, responseBody });
    sendRawJson(response, 200, responseBody);
  };

  const pay = async (id: string, response: ServerResponse) => {
    const record = sessions.get(id);
    if (!record) return sendText(response, 404, renderMissingCheckoutPage(), HTML);
    // Paying an already paid session only sends the payer back: one payment, one event.
    if (record.session.status === 'open') {
      record.session = {
        ...record.session,
        status: 'complete',
        payment_status: 'paid',
        payment_intent: `pi_test_${randomToken()}`,
      };
      const event = completedEvent(record);
      const eventRecord = { event, payload: JSON.stringify(event, null, 2), deliveries: [] };
      events.unshift(eventRecord);
      // Delivered before the redirect, so the app already knows when the payer lands back on it.
      await deliver(eventRecord);
    }
    response.writeHead(303, { Location: successUrlFor(record.session) }).end();
  };

  const route = async (request: IncomingMessage, response: ServerResponse) => {
    const path = new URL(request.url ?? '/', 'http://fake').pathname;
    const method = request.method ?? 'GET';
    let match: RegExpExecArray | null;

    if (path.startsWith('/v1/')) {
      if (!isAuthorized(request, options.secretKey)) {
        return sendApiError(response, 401, 'invalid_request_error', {
          message: 'Invalid API Key provided. Use the secret key the fake was started with.',
        });
      }
      if (method === 'POST' && path === '/v1/checkout/sessions') {
        return createSession(request, response);
      }
      if (method === 'GET' && (match = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path))) {
        const record = sessions.get(match[1] ?? '');
        if (record) return sendJson(response, 200, record.session);
        return sendApiError(response, 404, 'invalid_request_error', {
          message: `No such checkout.session: '${match[1]}'`,
          code: 'resource_missing',
          param: 'session',
        });
      }
      return sendApiError(response, 404, 'invalid_request_error', {
        message: `Unrecognized request URL (${method}: ${path}). This fake implements POST /v1/checkout/sessions and GET /v1/checkout/sessions/:id only.`,
      });
    }
    if (method === 'GET' && (match = /^\/checkout\/([^/]+)$/.exec(path))) {
      const record = sessions.get(match[1] ?? '');
      if (!record) return sendText(response, 404, renderMissingCheckoutPage(), HTML);
      return sendText(response, 200, renderCheckoutPage(record.session, record.lineItems), HTML);
    }
    if (method === 'POST' && (match = /^\/checkout\/([^/]+)\/pay$/.exec(path))) {
      await readBody(request); // the form carries nothing; drain it
      return pay(match[1] ?? '', response);
    }
    if (method === 'GET' && path === '/_fake/events') {
      return sendJson(
        response,
        200,
        events.map(({ event, deliveries }) => ({ event, deliveries })),
      );
    }
    if (method === 'POST' && (match = /^\/_fake\/events\/([^/]+)\/resend$/.exec(path))) {
      const record = events.find((candidate) => candidate.event.id === match?.[1]);
      if (!record) return sendJson(response, 404, { error: { message: 'No such event' } });
      const result = await deliver(record);
      return sendJson(response, result.delivered ? 200 : 502, result);
    }
    sendJson(response, 404, { error: { message: `Nothing at ${method} ${path}` } });
  };

  const server = createServer(
    handleRequests(async (request, response) => {
      try {
        await route(request, response);
      } catch (error) {
        if (!(error instanceof CheckoutRequestError)) throw error;
        sendApiError(response, 400, 'invalid_request_error', {
          message: error.message,
          code: error.code,
          param: error.param,
        });
      }
    }),
  );
  const port = await listenOn(server, options.port, host);
  baseUrl = `http://${host.includes(':') ? `[${host}]` : host}:${port}`;

  return {
    port,
    url: baseUrl,
    sessions: () => [...sessions.values()].reverse().map((record) => ({ ...record.session })),
    stop: () => closeHttpServer(server),
  };
}

const HTML = 'text/html; charset=utf-8';
const MAX_IDEMPOTENCY_KEYS = 1000;

function completedEvent(record: SessionRecord): WebhookEvent {
  return {
    id: `evt_test_${randomToken()}`,
    object: 'event',
    type: 'checkout.session.completed',
    api_version: record.apiVersion,
    created: unixNow(),
    data: { object: { ...record.session } },
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
  };
}
