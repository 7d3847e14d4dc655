import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { ErrorPanel } from '@/components/error-panel';
import { PageLoader } from '@/components/page-loader';
import { paths } from '@/config/paths';
import { useCurrentUser } from '../api/get-current-user';

/** Shows its children only to a signed-in user; anyone else goes to sign in and comes back. */
export function RequireAuth({ children }: { children: ReactNode }) {
  const user = useCurrentUser();
  const location = useLocation();

  if (user.isPending) return <PageLoader fullScreen label="Opening Pondwright…" />;
  if (user.isError) return <ErrorPanel error={user.error} onRetry={() => user.refetch()} />;
  if (!user.data) {
    return <Navigate to={paths.signIn.getHref(`${location.pathname}${location.search}`)} replace />;
  }
  return children;
}
