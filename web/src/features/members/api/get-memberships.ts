import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Membership } from '../types';
import { memberKeys } from './member-keys';

export async function getMemberships(signal?: AbortSignal): Promise<Membership[]> {
  const { data } = await apiClient.get<Membership[]>('/memberships', { signal });
  return data;
}

export const membershipsQueryOptions = () =>
  queryOptions({ queryKey: memberKeys.memberships(), queryFn: ({ signal }) => getMemberships(signal) });

export function useMemberships() {
  return useQuery(membershipsQueryOptions());
}
