import { Button, Center, EmptyState, Stack } from '@mantine/core';
import { IconMapPinOff } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { Brand } from '@/components/brand';
import { paths } from '@/config/paths';

/** "Page not found", for use inside the signed-in layout as well as on its own page. */
export function NotFoundContent() {
  return (
    <EmptyState
      icon={<IconMapPinOff />}
      variant="light"
      color="clay"
      size="lg"
      title="Page not found"
      description="There is nothing at this address. It may have moved, or the link may be mistyped."
    >
      <EmptyState.Actions>
        <Button component={Link} to={paths.home.getHref()}>
          Go to Home
        </Button>
      </EmptyState.Actions>
    </EmptyState>
  );
}

export function NotFoundRoute() {
  return (
    <Center mih="100dvh" p="md" component="main">
      <Stack align="center" gap="xl">
        <Brand size="lg" />
        <NotFoundContent />
      </Stack>
    </Center>
  );
}
