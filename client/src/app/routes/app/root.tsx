import { Outlet } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { UserMenu } from '@/features/auth/components/user-menu';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { useMailboxAvailable } from '@/features/dev-mailbox/api/get-mailbox';
import { canAccess } from '@/lib/authorization';
import { navItemsFor } from '../../navigation';

function SignedInShell() {
  const user = useSignedInUser();
  // Owners see the developer mailbox only where the server has one (it answers 404 in production).
  const mailbox = useMailboxAvailable(canAccess(user.role, 'devMailbox'));
  return (
    <AppLayout navItems={navItemsFor(user.role, { mailbox })} userMenu={<UserMenu />}>
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
