import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createQuoteQueryClient } from '../api/quote-queries';
import { QuotePage } from '../quote-page';
import { QuoteProviders } from '../quote-providers';
import { preloadDeferredParts } from '../ui/deferred';
import { QUOTE_PATH } from './quote-view';

// The forms, the payment step and the drawings arrive in chunks of their own; loaded before any test
// renders, they show at once, so a test need not wait for them.
await preloadDeferredParts();

type Options = { pollMs?: number; pollForMs?: number };

/** Renders the quote page as the browser would at `url` (path and query), with a fresh client. */
export function renderQuotePage(url = QUOTE_PATH, { pollMs, pollForMs }: Options = {}) {
  const { pathname, search } = new URL(url, 'http://localhost');
  const queryClient = createQuoteQueryClient();
  queryClient.setDefaultOptions({
    queries: { ...queryClient.getDefaultOptions().queries, retry: false },
    mutations: { retry: false },
  });
  const user = userEvent.setup();
  const result = render(
    <QuoteProviders queryClient={queryClient}>
      <QuotePage pathname={pathname} search={search} pollMs={pollMs} pollForMs={pollForMs} />
    </QuoteProviders>,
  );
  return { ...result, user, queryClient };
}
