import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CurrentShop } from '../types';
import { shopKeys } from './shop-keys';

export async function getShop(signal?: AbortSignal): Promise<CurrentShop> {
  const { data } = await apiClient.get<CurrentShop>('/shops/current', { signal });
  return data;
}

export const shopQueryOptions = () =>
  queryOptions({ queryKey: shopKeys.current(), queryFn: ({ signal }) => getShop(signal), staleTime: 5 * 60_000 });

export function useShop({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...shopQueryOptions(), enabled });
}
