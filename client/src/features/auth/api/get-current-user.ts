import type { CurrentUser } from '@pondwright/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, getAccessToken, refreshAccessToken } from '@/lib/api-client';
import { isApiError, NetworkError } from '@/lib/api-error';
import {
  forgetSignedInUser,
  rememberedUser,
  rememberSignedInUser,
  setOpenedOffline,
} from '../session/offline-session';

export const currentUserQueryKey = ['auth', 'me'] as const;

/** Asks the server; with no access token in memory (a fresh page load) it first trades the refresh cookie for one. */
async function loadCurrentUser(): Promise<CurrentUser | null> {
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

/**
 * The signed-in user, or null when there is no session; a reload keeps the user signed in through the
 * refresh cookie. With no connection at all it answers with the person last signed in on this device
 * (see session/offline-session), so a crew lead can open the daily log in a backyard with no signal.
 */
export async function getCurrentUser(): Promise<CurrentUser | null> {
  try {
    const user = await loadCurrentUser();
    if (user) rememberSignedInUser(user);
    else forgetSignedInUser();
    setOpenedOffline(false);
    return user;
  } catch (error) {
    const remembered = error instanceof NetworkError ? rememberedUser() : null;
    if (!remembered) throw error;
    setOpenedOffline(true);
    return remembered;
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
