import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { tokenStorage } from '@/lib/token-storage';
import type { CurrentUser } from '@/lib/api-types';
import { authKeys } from './auth-keys';

export async function getCurrentUser(): Promise<CurrentUser> {
  const { data } = await apiClient.get<CurrentUser>('/auth/me', { skipErrorNotification: true });
  return data;
}

export const currentUserQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: getCurrentUser,
    staleTime: 5 * 60_000,
    retry: false,
  });

/** The signed-in person, or no data when nobody is signed in. */
export function useCurrentUser() {
  return useQuery({ ...currentUserQueryOptions(), enabled: tokenStorage.hasSession() });
}

/** For components rendered below the auth guard, where a user always exists. */
export function useSignedInUser(): CurrentUser {
  const { data } = useCurrentUser();
  if (!data) throw new Error('useSignedInUser must be used below the auth guard');
  return data;
}
