import { MantineProvider } from '@mantine/core';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { cssVariablesResolver, theme } from '@/app/theme';
import { createQuoteQueryClient } from './api/quote-queries';

type QuoteProvidersProps = {
  children: ReactNode;
  queryClient?: QueryClient;
  /** Tests pass 'test' to switch off transitions and portals. */
  env?: 'default' | 'test';
};

/** Mantine with Pondwright's theme (always light: the drawings are coloured for it) and TanStack Query. */
export function QuoteProviders({ children, queryClient, env = 'default' }: QuoteProvidersProps) {
  const [client] = useState(() => queryClient ?? createQuoteQueryClient());
  return (
    <MantineProvider
      theme={theme}
      cssVariablesResolver={cssVariablesResolver}
      forceColorScheme="light"
      env={env}
    >
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    </MantineProvider>
  );
}
