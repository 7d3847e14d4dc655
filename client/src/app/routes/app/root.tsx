import { Outlet } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { RequireAuth } from '@/features/auth/components/require-auth';
import { UserMenu } from '@/features/auth/components/user-menu';
import { useSignedInUser } from '@/features/auth/hooks/use-signed-in-user';
import { navItemsFor } from '../../navigation';

function SignedInShell() {
  const user = useSignedInUser();
  return (
    <AppLayout navItems={navItemsFor(user.role)} userMenu={<UserMenu />}>
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
