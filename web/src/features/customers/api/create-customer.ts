import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Customer, CustomerInput } from '../types';
import { customerKeys } from './customer-keys';

export async function createCustomer(input: CustomerInput): Promise<Customer> {
  const { data } = await apiClient.post<Customer>('/customers', input, { skipErrorNotification: true });
  return data;
}

export function useCreateCustomer({ onSuccess }: { onSuccess?: (customer: Customer) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: createCustomer,
    onSuccess: (customer) => {
      void queryClient.invalidateQueries({ queryKey: customerKeys.lists() });
      onSuccess?.(customer);
    },
  });
}
