import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { customerKeys } from './customer-keys';

export async function deleteCustomer(id: string): Promise<void> {
  await apiClient.delete(`/customers/${encodeURIComponent(id)}`);
}

export function useDeleteCustomer() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: deleteCustomer,
    onSuccess: (_, id) => {
      queryClient.removeQueries({ queryKey: customerKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
    },
  });
}
