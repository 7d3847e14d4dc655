import { Center, Loader, Stack, Text } from '@mantine/core';

type PageLoaderProps = { label?: string; fullScreen?: boolean };

export function PageLoader({ label = 'Loading…', fullScreen = false }: PageLoaderProps) {
  return (
    <Center mih={fullScreen ? '100dvh' : '40vh'} role="status" aria-live="polite">
      <Stack align="center" gap="sm">
        <Loader color="reed" type="dots" />
        <Text c="dimmed" size="sm">
          {label}
        </Text>
      </Stack>
    </Center>
  );
}
