import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

export async function startWorkOrder(id: string): Promise<WorkOrder> {
  const { data } = await apiClient.post<WorkOrder>(`/work-orders/${encodeURIComponent(id)}/start`);
  return data;
}

export function useStartWorkOrder() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: startWorkOrder,
    onSuccess: (order) => {
      queryClient.setQueryData(workOrderKeys.detail(order.id), order);
      void queryClient.invalidateQueries({ queryKey: workOrderKeys.all });
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
    },
  });
}
