import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RecordCheckBody, WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

export async function recordCheck(id: string, body: RecordCheckBody): Promise<WorkOrder> {
  const { data } = await apiClient.post<WorkOrder>(`/work-orders/${encodeURIComponent(id)}/checks`, body);
  return data;
}

export function useRecordCheck(id: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: RecordCheckBody) => recordCheck(id, body),
    onSuccess: (order) => {
      queryClient.setQueryData(workOrderKeys.detail(order.id), order);
      void queryClient.invalidateQueries({ queryKey: workOrderKeys.lists() });
    },
  });
}
