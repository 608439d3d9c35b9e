import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { QuoteSettings } from '../types';
import { quoteKeys } from './quote-keys';

/** The shop's quote settings (default markup, deposit, validity). */
export async function getQuoteSettings(signal?: AbortSignal): Promise<QuoteSettings> {
  const { data } = await apiClient.get<QuoteSettings>('/quote-settings', { signal });
  return data;
}

export const quoteSettingsQueryOptions = () => queryOptions({ queryKey: quoteKeys.settings(), queryFn: ({ signal }) => getQuoteSettings(signal) });

export function useQuoteSettings(enabled = true) {
  return useQuery({ ...quoteSettingsQueryOptions(), enabled });
}
