import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Invitation } from '../types';
import { memberKeys } from './member-keys';

export async function getInvitations(signal?: AbortSignal): Promise<Invitation[]> {
  const { data } = await apiClient.get<Invitation[]>('/invitations', { signal });
  return data;
}

export const invitationsQueryOptions = () =>
  queryOptions({ queryKey: memberKeys.invitations(), queryFn: ({ signal }) => getInvitations(signal) });

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}
