import { Group } from '@mantine/core';
import { Outlet } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { OfflineStartBanner } from '@/features/auth/components/offline-start-banner';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { UserMenu } from '@/features/auth/components/user-menu';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { useOpenedOffline } from '@/features/auth/session/offline-session';
import { DailyLogSync } from '@/features/daily-log/components/daily-log-sync';
import { WaitingLogsButton } from '@/features/daily-log/components/waiting-logs-button';
import { useMailboxAvailable } from '@/features/dev-mailbox/api/get-mailbox';
import { canAccess } from '@/lib/authorization';
import { navItemsFor } from '../../navigation';

function SignedInShell() {
  const user = useSignedInUser();
  const openedOffline = useOpenedOffline();
  // Owners see the developer mailbox only where the server has one (it answers 404 in production).
  const mailbox = useMailboxAvailable(canAccess(user.role, 'devMailbox'));
  return (
    <AppLayout
      navItems={navItemsFor(user.role, { mailbox })}
      userMenu={
        // Daily logs saved on this phone and not sent yet, in reach on every page.
        <Group gap="sm" wrap="nowrap">
          <WaitingLogsButton userId={user.id} />
          <UserMenu />
        </Group>
      }
    >
      {openedOffline && <OfflineStartBanner />}
      <DailyLogSync userId={user.id} />
      <Outlet />
    </AppLayout>
  );
}

export function AppRoot() {
  return (
    <RequireAuth>
      <SignedInShell />
    </RequireAuth>
  );
}
