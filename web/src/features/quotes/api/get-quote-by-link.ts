import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export async function getQuoteByLink(token: string, signal?: AbortSignal): Promise<Quote> {
  const { data } = await apiClient.get<Quote>(`/quote-links/${encodeURIComponent(token)}`, { signal, skipErrorNotification: true, skipAuthRefresh: true });
  return data;
}

export const quoteByLinkQueryOptions = (token: string) =>
  queryOptions({ queryKey: quoteKeys.link(token), queryFn: ({ signal }) => getQuoteByLink(token, signal), retry: false });

/** Polls while a paid deposit waits for the provider's confirmation. */
export function useQuoteByLink(token: string, waitingForDeposit = false) {
  return useQuery({ ...quoteByLinkQueryOptions(token), refetchInterval: waitingForDeposit ? 1000 : false });
}
