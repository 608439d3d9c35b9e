import { queryOptions, useQuery } from '@tanstack/react-query';
import { isAxiosError } from 'axios';
import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

/** The project's work order, or null while it has none (it opens when the deposit is paid). */
export async function getProjectWorkOrder(projectId: string, signal?: AbortSignal): Promise<WorkOrder | null> {
  try {
    const { data } = await apiClient.get<WorkOrder>(`/projects/${encodeURIComponent(projectId)}/work-order`, { signal, skipErrorNotification: true });
    return data;
  } catch (error) {
    if (isAxiosError(error) && error.response?.status === 404) return null;
    throw error;
  }
}

export const projectWorkOrderQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: workOrderKeys.project(projectId), queryFn: ({ signal }) => getProjectWorkOrder(projectId, signal) });

export function useProjectWorkOrder(projectId: string, enabled = true) {
  return useQuery({ ...projectWorkOrderQueryOptions(projectId), enabled });
}
