import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Customer } from '../types';
import { customerKeys } from './customer-keys';

export async function getCustomer(id: string, signal?: AbortSignal): Promise<Customer> {
  const { data } = await apiClient.get<Customer>(`/customers/${encodeURIComponent(id)}`, { signal });
  return data;
}

export const customerQueryOptions = (id: string) =>
  queryOptions({ queryKey: customerKeys.detail(id), queryFn: ({ signal }) => getCustomer(id, signal) });

export function useCustomer(id: string | undefined) {
  return useQuery({ ...customerQueryOptions(id ?? ''), enabled: Boolean(id) });
}
