import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

export async function finishWorkOrder(id: string): Promise<WorkOrder> {
  const { data } = await apiClient.post<WorkOrder>(`/work-orders/${encodeURIComponent(id)}/finish`);
  return data;
}

export function useFinishWorkOrder() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: finishWorkOrder,
    onSuccess: (order) => {
      queryClient.setQueryData(workOrderKeys.detail(order.id), order);
      void queryClient.invalidateQueries({ queryKey: workOrderKeys.all });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
    },
  });
}
