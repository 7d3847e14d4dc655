import { Center, Container, Paper, Stack, Text, Title } from '@mantine/core';
import type { ReactNode } from 'react';
import { Brand } from '../brand';

type AuthLayoutProps = {
  title: string;
  description?: ReactNode;
  children: ReactNode;
};

export function AuthLayout({ title, description, children }: AuthLayoutProps) {
  return (
    <Center mih="100dvh" py="xl">
      <Container size="xs" w="100%">
        <Stack gap="lg">
          <Center>
            <Brand size="lg" />
          </Center>
          <Paper p="xl" shadow="xs" component="main">
            <Stack gap="xs" mb="lg">
              <Title order={1} fz="h3">
                {title}
              </Title>
              {description && (
                <Text c="dimmed" size="sm">
                  {description}
                </Text>
              )}
            </Stack>
            {children}
          </Paper>
          <Text c="dimmed" size="xs" ta="center">
            Estimating and job records for pond and water-feature builders.
          </Text>
        </Stack>
      </Container>
    </Center>
  );
}
