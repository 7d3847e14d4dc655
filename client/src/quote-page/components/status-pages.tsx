import { Button, Container, Loader, Paper, Stack, Text, Title } from '@mantine/core';
import { useEffect, useRef, type ReactNode } from 'react';

/** A whole-page message (not found, expired, failed), its heading focused so it is read first. */
function StatusPage({ title, children }: { title: string; children: ReactNode }) {
  const heading = useRef<HTMLHeadingElement>(null);
  useEffect(() => {
    document.title = title;
    heading.current?.focus();
  }, [title]);
  return (
    <Container size={560} px="md" py={48} component="main">
      <Paper p="xl">
        <Stack gap="sm">
          <Title order={1} fz="h2" ref={heading} tabIndex={-1}>
            {title}
          </Title>
          {children}
        </Stack>
      </Paper>
    </Container>
  );
}

export function QuoteLoading() {
  return (
    <Container size={560} px="md" py={64} component="main" aria-busy="true">
      <Stack align="center" gap="sm">
        <Loader color="reed" aria-hidden="true" />
        <Text c="dimmed" role="status">
          Loading your quote…
        </Text>
      </Stack>
    </Container>
  );
}

export function QuoteNotFound() {
  return (
    <StatusPage title="We couldn’t find this quote">
      <Text>
        The link may be incomplete. Open it again from the e-mail you were sent, or ask the company
        that quoted you to send it again.
      </Text>
    </StatusPage>
  );
}

/** 410: the link expired or was withdrawn; the server's message names the company to contact. */
export function QuoteLinkGone({ message }: { message: string }) {
  return (
    <StatusPage title="This link has expired or was withdrawn">
      <Text>{message}</Text>
    </StatusPage>
  );
}

export function QuoteLoadFailed({ message, onRetry }: { message: string; onRetry: () => void }) {
  return (
    <StatusPage title="We couldn’t load your quote">
      <Text>{message}</Text>
      <div>
        <Button onClick={onRetry}>Try again</Button>
      </div>
    </StatusPage>
  );
}
