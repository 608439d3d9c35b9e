import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { quoteKeys } from '@/features/quotes/api/quote-keys';
import type { Shop, UpdateShopInput } from '../types';
import { shopKeys } from './shop-keys';

export async function updateShop(changes: UpdateShopInput): Promise<Shop> {
  const { data } = await apiClient.patch<Shop>('/shops/current', changes, { skipErrorNotification: true });
  return data;
}

export function useUpdateShop({ onSuccess }: { onSuccess?: (shop: Shop) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateShop,
    onSuccess: (shop) => {
      queryClient.setQueryData(shopKeys.current(), shop);
      // the signed-in user's copy of shop name and units is stale now
      void queryClient.invalidateQueries({ queryKey: ['auth'] });
      // quotes still being written were repriced at the new rates by the same change
      void queryClient.invalidateQueries({ queryKey: quoteKeys.all });
      onSuccess?.(shop);
    },
  });
}
