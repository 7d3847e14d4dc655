// Signed webhook delivery the way the provider documents it: a JSON POST with the header
// `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<body>" keyed with the endpoint secret>`, re-signed on
// every attempt and retried with back-off while the endpoint is down or answers non-2xx.
import { createHmac } from 'node:crypto';

export const SIGNATURE_HEADER = 'Stripe-Signature';

export type DeliveryAttempt = { at: string; status: number | null; error: string | null };

export type DeliveryOptions = {
  url: string;
  payload: string;
  secret: string;
  retries?: number;
  firstBackoffMs?: number;
  timeoutMs?: number;
};

export function signatureHeader(
  payload: string,
  secret: string,
  timestamp = Math.floor(Date.now() / 1000),
): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

/** One first try plus up to `retries` more, doubling the wait each time (100, 200, 400 ms…). */
export async function deliverWebhook({
  url,
  payload,
  secret,
  retries = 5,
  firstBackoffMs = 100,
  timeoutMs = 3000,
}: DeliveryOptions): Promise<{ delivered: boolean; attempts: DeliveryAttempt[] }> {
  const attempts: DeliveryAttempt[] = [];
  for (let attempt = 0; attempt <= retries; attempt++) {
    if (attempt > 0) await sleep(firstBackoffMs * 2 ** (attempt - 1));
    const result = await attemptOnce(url, payload, secret, timeoutMs);
    attempts.push(result);
    if (result.status !== null && result.status >= 200 && result.status < 300) {
      return { delivered: true, attempts };
    }
  }
  return { delivered: false, attempts };
}

async function attemptOnce(
  url: string,
  payload: string,
  secret: string,
  timeoutMs: number,
): Promise<DeliveryAttempt> {
  const at = new Date().toISOString();
  try {
    const response = await fetch(url, {
      method: 'POST',
      headers: {
        'Content-Type': 'application/json; charset=utf-8',
        [SIGNATURE_HEADER]: signatureHeader(payload, secret),
        'User-Agent': 'pondwright-fake-payments',
      },
      body: payload,
      // A redirect is an endpoint misconfiguration, as with the provider: it counts as a failure.
      redirect: 'manual',
      signal: AbortSignal.timeout(timeoutMs),
    });
    await response.body?.cancel();
    return { at, status: response.status, error: null };
  } catch (error) {
    const cause = error instanceof Error ? (error.cause ?? error) : error;
    return { at, status: null, error: cause instanceof Error ? cause.message : String(cause) };
  }
}

function sleep(ms: number): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, ms));
}
