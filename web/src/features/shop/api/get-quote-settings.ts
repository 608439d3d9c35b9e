import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { QuoteSettings } from '../types';
import { shopKeys } from './shop-keys';

export async function getQuoteSettings(signal?: AbortSignal): Promise<QuoteSettings> {
  const { data } = await apiClient.get<QuoteSettings>('/quote-settings', { signal });
  return data;
}

export const quoteSettingsQueryOptions = () =>
  queryOptions({ queryKey: shopKeys.quoteSettings(), queryFn: ({ signal }) => getQuoteSettings(signal), staleTime: 5 * 60_000 });

export function useQuoteSettings({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...quoteSettingsQueryOptions(), enabled });
}
