import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { quoteKeys } from '@/features/quotes/api/quote-keys';
import type { QuoteSettings, UpdateQuoteSettingsInput } from '../types';
import { shopKeys } from './shop-keys';

export async function updateQuoteSettings(changes: UpdateQuoteSettingsInput): Promise<QuoteSettings> {
  const { data } = await apiClient.put<QuoteSettings>('/quote-settings', changes, { skipErrorNotification: true });
  return data;
}

export function useUpdateQuoteSettings({ onSuccess }: { onSuccess?: (settings: QuoteSettings) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateQuoteSettings,
    onSuccess: (settings) => {
      queryClient.setQueryData(shopKeys.quoteSettings(), settings);
      // a new tax on labor or supplies cap reprices the quotes still being written, and the quotes read these terms
      void queryClient.invalidateQueries({ queryKey: quoteKeys.all });
      onSuccess?.(settings);
    },
  });
}
