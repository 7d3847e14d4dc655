import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { createQuoteQueryClient } from './api/quote-queries';

type QuoteProvidersProps = {
  children: ReactNode;
  queryClient?: QueryClient;
};

/**
 * TanStack Query, the page's only provider: its look is plain CSS (theme.css), so no theme provider
 * has to render before the quote does.
 */
export function QuoteProviders({ children, queryClient }: QuoteProvidersProps) {
  const [client] = useState(() => queryClient ?? createQuoteQueryClient());
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
