import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Part } from './get-parts';
import { partsKeys } from './parts-keys';

export type StockInput = RequestBodyOf<'/api/parts/{id}/stock', 'put'>;

export async function setPartStock({ id, stock }: { id: string; stock: StockInput }): Promise<Part> {
  const { data } = await apiClient.put<Part>(`/parts/${encodeURIComponent(id)}/stock`, stock, { skipErrorNotification: true });
  return data;
}

/** Sets the units on hand (and the bin) of a part at one location. */
export function useSetPartStock({ onSuccess }: { onSuccess?: (part: Part) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: setPartStock,
    onSuccess: (part) => {
      void queryClient.invalidateQueries({ queryKey: partsKeys.all });
      onSuccess?.(part);
    },
  });
}
