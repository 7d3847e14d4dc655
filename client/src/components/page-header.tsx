import { Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';

type PageHeaderProps = { title: string; description?: ReactNode };

export function PageHeader({ title, description }: PageHeaderProps) {
  return (
    <Stack gap={4} mb="lg">
      <Title order={1} fz="h2">
        {title}
      </Title>
      {description && <Text c="dimmed">{description}</Text>}
    </Stack>
  );
}
