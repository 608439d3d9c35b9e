import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CustomerListQuery, CustomerPage } from '../types';
import { customerKeys } from './customer-keys';

export async function getCustomers(query: CustomerListQuery, signal?: AbortSignal): Promise<CustomerPage> {
  const { data } = await apiClient.get<CustomerPage>('/customers', { params: query, signal });
  return data;
}

export const customersQueryOptions = (query: CustomerListQuery) =>
  queryOptions({
    queryKey: customerKeys.list(query),
    queryFn: ({ signal }) => getCustomers(query, signal),
    placeholderData: keepPreviousData,
  });

export function useCustomers(query: CustomerListQuery, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...customersQueryOptions(query), enabled });
}
