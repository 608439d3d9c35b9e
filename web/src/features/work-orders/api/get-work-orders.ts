import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { WorkOrderListQuery, WorkOrderSummary } from '../types';
import { workOrderKeys } from './work-order-keys';

export async function getWorkOrders(query: WorkOrderListQuery, signal?: AbortSignal): Promise<WorkOrderSummary[]> {
  const { data } = await apiClient.get<WorkOrderSummary[]>('/work-orders', { params: query, signal });
  return data;
}

export const workOrdersQueryOptions = (query: WorkOrderListQuery) =>
  queryOptions({ queryKey: workOrderKeys.list(query), queryFn: ({ signal }) => getWorkOrders(query, signal) });

export function useWorkOrders(query: WorkOrderListQuery) {
  return useQuery(workOrdersQueryOptions(query));
}
