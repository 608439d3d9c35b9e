import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { ResponseOf } from '@/lib/api-types';
import { catalogKeys } from './catalog-keys';

export type SampleCatalogCopy = ResponseOf<'/api/catalog/sample', 'post'>;

/** Copies Swapwright's sample catalog into the shop (owner only); a second call adds nothing. */
export async function copySampleCatalog(): Promise<SampleCatalogCopy> {
  const { data } = await apiClient.post<SampleCatalogCopy>('/catalog/sample');
  return data;
}

export function useCopySampleCatalog({ onSuccess }: { onSuccess?: (copy: SampleCatalogCopy) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: copySampleCatalog,
    onSuccess: (copy) => {
      void queryClient.invalidateQueries({ queryKey: catalogKeys.all });
      onSuccess?.(copy);
    },
  });
}
