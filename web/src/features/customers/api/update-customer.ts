import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Customer, CustomerChanges } from '../types';
import { customerKeys } from './customer-keys';

export type UpdateCustomerInput = { id: string; changes: CustomerChanges };

export async function updateCustomer({ id, changes }: UpdateCustomerInput): Promise<Customer> {
  const { data } = await apiClient.patch<Customer>(`/customers/${encodeURIComponent(id)}`, changes, {
    skipErrorNotification: true,
  });
  return data;
}

export function useUpdateCustomer({ onSuccess }: { onSuccess?: (customer: Customer) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateCustomer,
    onSuccess: (customer) => {
      queryClient.setQueryData(customerKeys.detail(customer.id), customer);
      void queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
      onSuccess?.(customer);
    },
  });
}
