import type { CurrentUser } from '@pondwright/shared';
import { useRef } from 'react';
import { useCurrentUser } from '../api/get-current-user';

/**
 * The current user inside `RequireAuth`, where a session is guaranteed. In the moment
 * between signing out and the guard leaving the page, a component may render once more;
 * it then keeps the user it last saw rather than failing.
 */
export function useSignedInUser(): CurrentUser {
  const { data } = useCurrentUser();
  const lastSeen = useRef(data);
  if (data) lastSeen.current = data;
  if (!lastSeen.current) throw new Error('useSignedInUser is only available inside RequireAuth');
  return lastSeen.current;
}
