import type {
  AcceptQuoteRequest,
  CheckoutRedirect,
  DeclineQuoteRequest,
  QuoteView,
} from '@pondwright/shared';
import {
  QueryClient,
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type DefaultOptions,
} from '@tanstack/react-query';
import { isQuoteRequestError, quoteRequest } from './quote-request';

export const quoteKey = (token: string) => ['quote', token] as const;

/** A client error (4xx) will not change on a retry; an unreachable or failing server might. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (isQuoteRequestError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

export const quoteQueryDefaults = {
  queries: { retry: shouldRetry, refetchOnWindowFocus: false, staleTime: 30_000 },
  mutations: { retry: false },
} satisfies DefaultOptions;

export function createQuoteQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: quoteQueryDefaults });
}

/** `GET /api/quotes/:token`. */
export const quoteQueryOptions = (token: string) =>
  queryOptions({
    queryKey: quoteKey(token),
    queryFn: ({ signal }) => quoteRequest<QuoteView>(token, '', { signal }),
  });

/** The quote; `pollEvery` says how often to check again (while a payment is confirmed). */
export function useQuote(
  token: string,
  pollEvery: (view: QuoteView | undefined) => number | false = () => false,
) {
  return useQuery({
    ...quoteQueryOptions(token),
    refetchInterval: (query) => pollEvery(query.state.data),
    // The page's first answer (main.tsx) may already be an error when this mounts: a dead link is
    // not asked for twice (each unknown token counts towards the address's limit); "Try again" asks.
    retryOnMount: false,
  });
}

/** Accept and decline answer the new `QuoteView`, which replaces the page's copy. */
export function useAcceptQuote(token: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: AcceptQuoteRequest) =>
      quoteRequest<QuoteView>(token, '/accept', { method: 'POST', body }),
    onSuccess: (view) => client.setQueryData(quoteKey(token), view),
  });
}

export function useDeclineQuote(token: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: DeclineQuoteRequest) =>
      quoteRequest<QuoteView>(token, '/decline', { method: 'POST', body }),
    onSuccess: (view) => client.setQueryData(quoteKey(token), view),
  });
}

/** Starts the deposit's hosted checkout; the caller sends the homeowner to the answer's `url`. */
export function useStartCheckout(token: string) {
  return useMutation({
    mutationFn: () => quoteRequest<CheckoutRedirect>(token, '/checkout', { method: 'POST' }),
  });
}

/** After a conflict (already answered, already paid) the page shows the quote as it now stands. */
export function useRefreshQuote(token: string) {
  const client = useQueryClient();
  return () => client.invalidateQueries({ queryKey: quoteKey(token) });
}
