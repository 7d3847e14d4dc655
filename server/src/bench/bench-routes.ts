import { examplePondInput } from '@pondwright/shared/engine';
import type { AutocannonRequest } from 'autocannon';
import { draftBodyFor } from './bench-estimate';
import type { BenchEstimateRef, BenchFixture } from './bench-seed';

/** The signed-in estimator's access token; replaced when a run outlives it (15 minutes at most). */
export type Session = { token: string };

/**
 * One simulated person: the shared session and an address of their own, sent as X-Forwarded-For to a
 * real server that trusts one proxy (as deployed behind one). From a single address, the rate limiter's
 * in-memory store (@nestjs/throttler 6.7) keeps every hit of the last minute and filters them all on
 * each request: at bench rates that scan alone took a fifth of the server's CPU, a cost no real
 * address at the default 600 a minute comes near. The baseline ignores the header.
 */
export type BenchUser = { session: Session; address: string };

export function benchUser(session: Session, index: number): BenchUser {
  return { session, address: `10.77.${Math.floor(index / 250)}.${(index % 250) + 1}` };
}

/** Pages of the list a person browses: the newest 500 estimates, 25 to a page as the screen asks. */
const LIST_PAGES = 20;
const TAKEOFF_BODY = JSON.stringify(examplePondInput());

/**
 * The benched requests. Each builds its path and headers per request (`setupRequest`), so reads spread
 * over the seeded estimates instead of one cached row, and the token can change mid-run.
 */
export function estimateRequest(fixture: BenchFixture, user: BenchUser): AutocannonRequest {
  return {
    method: 'GET',
    setupRequest: (request) => ({
      ...request,
      path: `/api/estimates/${pick(fixture.readEstimateIds)}`,
      headers: headersOf(user),
    }),
  };
}

export function listRequest(user: BenchUser): AutocannonRequest {
  return {
    method: 'GET',
    setupRequest: (request) => ({
      ...request,
      path: `/api/estimates?page=${1 + Math.floor(Math.random() * LIST_PAGES)}&pageSize=25`,
      headers: headersOf(user),
    }),
  };
}

export function takeoffRequest(user: BenchUser): AutocannonRequest {
  return {
    method: 'POST',
    path: '/api/takeoff',
    body: TAKEOFF_BODY,
    setupRequest: (request) => ({
      ...request,
      headers: { ...headersOf(user), 'content-type': 'application/json' },
    }),
  };
}

export function quoteRequest(fixture: BenchFixture, user: BenchUser): AutocannonRequest {
  return {
    method: 'GET',
    path: `/api/quotes/${fixture.quoteToken}`,
    headers: { 'x-forwarded-for': user.address },
  };
}

/**
 * Saving one estimate's 30-line draft again and again from the revision it last saw: a 200 moves it on,
 * a 409 (someone else saved) hands over the current one, as the client does. `saved` counts the 200s.
 */
export function saveRequest(
  fixture: BenchFixture,
  estimate: BenchEstimateRef,
  user: BenchUser,
  revisions: Map<string, number>,
): AutocannonRequest {
  const body = draftBodyFor(fixture.content, estimate);
  return {
    method: 'PUT',
    path: `/api/estimates/${estimate.id}/draft`,
    setupRequest: (request) => ({
      ...request,
      headers: { ...headersOf(user), 'content-type': 'application/json' },
      body: body(revisions.get(estimate.id)!),
    }),
    onResponse: (status, responseBody) => {
      if (status === 200) revisions.set(estimate.id, revisions.get(estimate.id)! + 1);
      if (status === 409) {
        const current = (JSON.parse(responseBody) as { current?: { revision: number } }).current;
        if (current) revisions.set(estimate.id, current.revision);
      }
    },
  };
}

/** Counts answers by status per kind of request, to say which requests failed in a mixed load. */
export function counted(
  kind: string,
  request: AutocannonRequest,
  tally: Map<string, number>,
): AutocannonRequest {
  return {
    ...request,
    onResponse: (status, body, context) => {
      request.onResponse?.(status, body, context);
      const key = `${kind} ${status}`;
      tally.set(key, (tally.get(key) ?? 0) + 1);
    },
  };
}

export function headersOf(user: BenchUser): Record<string, string> {
  return { authorization: `Bearer ${user.session.token}`, 'x-forwarded-for': user.address };
}

function pick<T>(values: T[]): T {
  return values[Math.floor(Math.random() * values.length)]!;
}
