import { useQueryClient } from '@tanstack/react-query';
import { setAccessToken } from '@/lib/api-client';
import { getCurrentUserQueryOptions } from '../api/get-current-user';

/** Keeps the new token in memory and loads who signed in; nothing from a previous user stays cached. */
export function useStartSession() {
  const queryClient = useQueryClient();
  return async (accessToken: string) => {
    setAccessToken(accessToken);
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== 'auth' });
    await queryClient.fetchQuery({ ...getCurrentUserQueryOptions(), staleTime: 0 });
  };
}
