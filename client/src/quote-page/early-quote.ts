import type { QuoteView } from '@pondwright/shared';
import { quoteRequest } from './api/quote-request';
import { tokenFromPath } from './lib/location';

// main.tsx imports this module before React: the quote is asked for as soon as the page's code has
// arrived, while React DOM's code is still being evaluated (about a third of a second on a slow phone),
// not after. The quote is the page's largest paint, and it waits for this answer.
let pending: Promise<QuoteView> | null = null;
const token = tokenFromPath(window.location.pathname);
if (token) {
  pending = quoteRequest<QuoteView>(token, '');
  // Handled by whoever takes it; until then a failure is not an unhandled rejection.
  pending.catch(() => undefined);
}

/** The first answer for the page's quote, once; retries and later checks ask the server again. */
export function takeEarlyQuote(): Promise<QuoteView> | null {
  const first = pending;
  pending = null;
  return first;
}
