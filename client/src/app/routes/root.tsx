import { Center, Container } from '@mantine/core';
import { Outlet } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { useCurrentUser } from '@/features/auth/api/get-current-user';
import { useForgetDataWhenSignedOut } from '@/features/auth/hooks/use-forget-data-when-signed-out';
import { useReconnectSession } from '@/features/auth/hooks/use-reconnect-session';
import { useSessionExpiryRedirect } from '@/features/auth/hooks/use-session-expiry-redirect';
import { useOpenedOffline } from '@/features/auth/session/offline-session';

/**
 * Every page waits here for the first answer to "who is signed in?", which restores a
 * session from the refresh cookie after a reload, before anything else renders. With no
 * connection the answer is the person last signed in on this device (the app's shell says so).
 */
export function Root() {
  const user = useCurrentUser();
  const openedOffline = useOpenedOffline();
  useSessionExpiryRedirect();
  useForgetDataWhenSignedOut();
  useReconnectSession(openedOffline);

  if (user.isPending) return <PageLoader fullScreen label="Opening Pondwright…" />;
  // A failed retry while opened offline keeps the person already shown; only a first failure stops here.
  if (user.isError && user.data === undefined) {
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
