import type { CurrentUser } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, getAccessToken, refreshAccessToken } from '@/lib/api-client';
import { isApiError } from '@/lib/api-error';

export const currentUserQueryKey = ['auth', 'me'] as const;

/**
 * The signed-in user, or null when there is no session. With no access token in memory
 * (a fresh page load) it first trades the refresh cookie for one, which is how a reload
 * keeps the user signed in.
 */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  if (!getAccessToken()) {
    const token = await refreshAccessToken();
    if (!token) return null;
  }
  try {
    return await api.get<CurrentUser>('/auth/me');
  } catch (error) {
    // The token was refused and could not be renewed: that is "signed out", not a failure.
    if (isApiError(error, 401)) return null;
    throw error;
  }
}

export const getCurrentUserQueryOptions = () =>
  queryOptions({
    queryKey: currentUserQueryKey,
    queryFn: getCurrentUser,
    staleTime: Infinity,
    retry: false,
  });

export const useCurrentUser = () => useQuery(getCurrentUserQueryOptions());
