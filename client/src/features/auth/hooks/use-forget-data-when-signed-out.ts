import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { useCurrentUser } from '../api/get-current-user';

/** Drops every cached answer that belonged to the previous session once nobody is signed in. */
export function useForgetDataWhenSignedOut(): void {
  const queryClient = useQueryClient();
  const { data: user } = useCurrentUser();

  useEffect(() => {
    if (user !== null) return;
    queryClient.removeQueries({
      type: 'inactive',
      predicate: (query) => query.queryKey[0] !== 'auth',
    });
  }, [queryClient, user]);
}
