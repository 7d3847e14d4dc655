import { Button, Center, Container, Stack } from '@mantine/core';
import { useRouteError } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';

/** Last resort for a page that threw while rendering. */
export function RouteError() {
  const error = useRouteError();
  if (import.meta.env.DEV) console.error(error);
  return (
    <Center mih="100dvh">
      <Container size="xs">
        <Stack>
          <ErrorPanel title="This page ran into a problem" error={error} />
          <Button variant="light" onClick={() => window.location.assign('/')}>
            Reload Pondwright
          </Button>
        </Stack>
      </Container>
    </Center>
  );
}
