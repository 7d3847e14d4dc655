import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/inter/700.css';
import '@mantine/core/styles.css';
import '@mantine/notifications/styles.css';
import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { createQueryClient } from '@/lib/query-client';
import { cssVariablesResolver, theme } from './theme';

type AppProviderProps = {
  children: ReactNode;
  queryClient?: QueryClient;
  /** Tests pass 'test' to switch off transitions and portals. */
  env?: 'default' | 'test';
};

export function AppProvider({ children, queryClient, env = 'default' }: AppProviderProps) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <MantineProvider
      theme={theme}
      cssVariablesResolver={cssVariablesResolver}
      defaultColorScheme="light"
      env={env}
    >
      <Notifications position="top-right" limit={4} />
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    </MantineProvider>
  );
}
