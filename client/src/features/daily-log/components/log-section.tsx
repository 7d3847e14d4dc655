import { Paper, Stack, Title } from '@mantine/core';
import type { ReactNode } from 'react';

/** One part of the day (hours, materials, …): its rows, then the buttons that add more. */
export function LogSection({
  title,
  children,
  actions,
}: {
  title: string;
  children: ReactNode;
  actions: ReactNode;
}) {
  const id = `log-section-${title.toLowerCase()}`;
  return (
    <Paper p="sm" component="section" aria-labelledby={id}>
      <Stack gap="sm">
        <Title order={2} fz="h4" id={id}>
          {title}
        </Title>
        {children}
        {actions}
      </Stack>
    </Paper>
  );
}
