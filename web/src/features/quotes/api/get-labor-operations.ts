import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { LaborOperation } from '../types';
import { quoteKeys } from './quote-keys';

/** The shop's labor operations with their book hours (what a labor line is drawn from). */
export async function getLaborOperations(signal?: AbortSignal): Promise<LaborOperation[]> {
  const { data } = await apiClient.get<LaborOperation[]>('/labor-operations', { signal });
  return data;
}

export const laborOperationsQueryOptions = () =>
  queryOptions({ queryKey: quoteKeys.laborOperations(), queryFn: ({ signal }) => getLaborOperations(signal), staleTime: 5 * 60_000 });

export function useLaborOperations(enabled = true) {
  return useQuery({ ...laborOperationsQueryOptions(), enabled });
}
