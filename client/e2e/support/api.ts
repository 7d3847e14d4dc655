import { expect } from 'vitest';
import { baseUrl } from './browser';

// The seeded demo people (server/src/seed).
export const ESTIMATOR = { email: 'estimator@heronmoss.example', password: 'pond-estimator-2026' };
export const OWNER = { email: 'owner@heronmoss.example', password: 'pond-owner-2026' };
export const CREW_LEAD = { email: 'crew@heronmoss.example', password: 'pond-crew-2026' };

export const mailboxUrl = process.env.MAILBOX_URL ?? 'http://127.0.0.1:2581';

/** A JSON call to the app's API, failing the test with the server's answer when it is not 2xx. */
export async function api<T>(
  path: string,
  token: string | null,
  init: RequestInit = {},
): Promise<T> {
  const response = await fetch(`${baseUrl}${path}`, {
    ...init,
    headers: {
      'Content-Type': 'application/json',
      ...(token ? { Authorization: `Bearer ${token}` } : {}),
      ...init.headers,
    },
  });
  if (!response.ok) throw new Error(`${path}: ${response.status} ${await response.text()}`);
  return (await response.json()) as T;
}

export async function signInApi(person: { email: string; password: string }): Promise<string> {
  const body = await api<{ accessToken: string }>('/api/auth/login', null, {
    method: 'POST',
    body: JSON.stringify(person),
  });
  return body.accessToken;
}

export type ApiEstimate = {
  id: string;
  number: number;
  status: string;
  draft: { revision: number; content: Record<string, unknown> };
};

/**
 * An approved estimate for the demo customer with one add-on the homeowner can choose, made through
 * the API: the journeys that use it are about what comes after; the estimate journey builds one by hand.
 */
export async function approvedEstimateWithAddOn(title: string): Promise<ApiEstimate> {
  const estimator = await signInApi(ESTIMATOR);
  const customers = await api<{ items: Array<{ id: string; name: string }> }>(
    '/api/customers?q=Thistlewood',
    estimator,
  );
  const customer = customers.items.find((c) => c.name === 'Bram Thistlewood')!;
  const created = await api<ApiEstimate>('/api/estimates', estimator, {
    method: 'POST',
    body: JSON.stringify({ title, customerId: customer.id }),
  });
  const saved = await api<ApiEstimate>(`/api/estimates/${created.id}/draft`, estimator, {
    method: 'PUT',
    body: JSON.stringify({
      ...created.draft.content,
      revision: created.draft.revision,
      scope: 'A lined pond with a stream and a waterfall by the terrace.',
      manualLines: [
        {
          id: 'bubbler',
          category: 'materials',
          description: 'Bubbling urn beside the stream',
          quantity: '1',
          unit: 'ea',
          unitCost: '350.00',
          taxable: true,
          kind: 'add-on',
        },
      ],
    }),
  });
  let estimate = await api<ApiEstimate>(`/api/estimates/${created.id}/finalise`, estimator, {
    method: 'POST',
    body: JSON.stringify({ revision: saved.draft.revision }),
  });
  if (estimate.status === 'awaiting_approval') {
    estimate = await api<ApiEstimate>(
      `/api/estimates/${created.id}/approve`,
      await signInApi(OWNER),
      {
        method: 'POST',
      },
    );
  }
  expect(estimate.status).toBe('approved');
  return estimate;
}

type CapturedMail = { subject: string; text: string; to: string[] };

/** Waits for the outbox worker to deliver a matching e-mail to the fake SMTP server; answers its text. */
export async function waitForMail(matches: (mail: CapturedMail) => boolean): Promise<string> {
  let text = '';
  await expect
    .poll(
      async () => {
        const messages = (await (await fetch(`${mailboxUrl}/messages`)).json()) as CapturedMail[];
        text = messages.find(matches)?.text ?? '';
        return text.length > 0;
      },
      { timeout: 20_000, interval: 500 },
    )
    .toBe(true);
  return text;
}

/** The quote link (`…/q/<token>`) in an e-mail's text. */
export function quoteLinkIn(text: string): string {
  return /(https?:\/\/\S+\/q\/[A-Za-z0-9_-]{43})/.exec(text)![1]!;
}
