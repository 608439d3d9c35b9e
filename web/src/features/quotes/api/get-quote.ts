import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

/** A quote with its working revision, or with the revision numbered `revision`. */
export async function getQuote(quoteId: string, revision?: number, signal?: AbortSignal): Promise<Quote> {
  // every reader of the current revision shows a failed read in the page (not found, no access), so no second notice pops up
  const { data } = await apiClient.get<Quote>(`/quotes/${encodeURIComponent(quoteId)}`, {
    params: revision === undefined ? undefined : { revision },
    signal,
    skipErrorNotification: revision === undefined,
  });
  return data;
}

export const quoteQueryOptions = (quoteId: string, revision?: number) =>
  queryOptions({ queryKey: quoteKeys.detail(quoteId, revision), queryFn: ({ signal }) => getQuote(quoteId, revision, signal) });

export function useQuote(quoteId: string, revision?: number) {
  return useQuery(quoteQueryOptions(quoteId, revision));
}
