import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createQuoteQueryClient } from '../api/quote-queries';
import { QuotePage } from '../quote-page';
import { QuoteProviders } from '../quote-providers';
import { QUOTE_PATH } from './quote-view';

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
    <QuoteProviders queryClient={queryClient} env="test">
      <QuotePage pathname={pathname} search={search} pollMs={pollMs} pollForMs={pollForMs} />
    </QuoteProviders>,
  );
  return { ...result, user, queryClient };
}
