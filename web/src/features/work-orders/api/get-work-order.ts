import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

export async function getWorkOrder(id: string, signal?: AbortSignal): Promise<WorkOrder> {
  const { data } = await apiClient.get<WorkOrder>(`/work-orders/${encodeURIComponent(id)}`, { signal });
  return data;
}

export const workOrderQueryOptions = (id: string) =>
  queryOptions({ queryKey: workOrderKeys.detail(id), queryFn: ({ signal }) => getWorkOrder(id, signal) });

export function useWorkOrder(id: string) {
  return useQuery(workOrderQueryOptions(id));
}
