import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Supplier } from './get-suppliers';
import { partsKeys } from './parts-keys';

export type NewSupplier = RequestBodyOf<'/api/suppliers', 'post'>;

export async function createSupplier(input: NewSupplier): Promise<Supplier> {
  const { data } = await apiClient.post<Supplier>('/suppliers', input, { skipErrorNotification: true });
  return data;
}

export async function updateSupplier({ id, changes }: { id: string; changes: RequestBodyOf<'/api/suppliers/{id}', 'patch'> }): Promise<Supplier> {
  const { data } = await apiClient.patch<Supplier>(`/suppliers/${encodeURIComponent(id)}`, changes, { skipErrorNotification: true });
  return data;
}

/** Creates the supplier, or saves the changes of the one with `id`. */
export function useSaveSupplier({ onSuccess }: { onSuccess?: (supplier: Supplier) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (input: { id?: string; body: NewSupplier }) => (input.id ? updateSupplier({ id: input.id, changes: input.body }) : createSupplier(input.body)),
    onSuccess: (supplier) => {
      void queryClient.invalidateQueries({ queryKey: partsKeys.suppliers });
      void queryClient.invalidateQueries({ queryKey: partsKeys.all });
      onSuccess?.(supplier);
    },
  });
}
