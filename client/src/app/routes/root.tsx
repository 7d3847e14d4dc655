import { Center, Container } from '@mantine/core';
import { Outlet } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { useCurrentUser } from '@/features/auth/api/get-current-user';
import { useForgetDataWhenSignedOut } from '@/features/auth/hooks/use-forget-data-when-signed-out';
import { useSessionExpiryRedirect } from '@/features/auth/hooks/use-session-expiry-redirect';

/**
 * Every page waits here for the first answer to "who is signed in?", which restores a
 * session from the refresh cookie after a reload, before anything else renders.
 */
export function Root() {
  const user = useCurrentUser();
  useSessionExpiryRedirect();
  useForgetDataWhenSignedOut();

  if (user.isPending) return <PageLoader fullScreen label="Opening Pondwright…" />;
  if (user.isError) {
    return (
      <Center mih="100dvh">
        <Container size="xs">
          <ErrorPanel
            title="Pondwright could not start"
            error={user.error}
            onRetry={() => user.refetch()}
          />
        </Container>
      </Center>
    );
  }
  return <Outlet />;
}
