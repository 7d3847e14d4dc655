import type { ReactNode } from 'react';
import { Navigate, useSearchParams } from 'react-router-dom';
import { safeNextPath } from '@/config/paths';
import { useCurrentUser } from '../api/get-current-user';

/**
 * For the sign-in and sign-up pages: a signed-in user moves on to `next` (or Home). This is
 * also how a successful sign-in leaves the page, once the new user has loaded.
 */
export function GuestOnly({ children }: { children: ReactNode }) {
  const user = useCurrentUser();
  const [searchParams] = useSearchParams();

  if (user.data) return <Navigate to={safeNextPath(searchParams.get('next'))} replace />;
  return children;
}
