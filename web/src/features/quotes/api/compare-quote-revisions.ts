import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { QuoteRevisionDiff } from '../types';
import { quoteKeys } from './quote-keys';

/** What changed between two revisions, as the API works it out. */
export async function compareQuoteRevisions(quoteId: string, from: number, to: number, signal?: AbortSignal): Promise<QuoteRevisionDiff> {
  const { data } = await apiClient.get<QuoteRevisionDiff>(`/quotes/${encodeURIComponent(quoteId)}/compare`, { params: { from, to }, signal });
  return data;
}

export const quoteRevisionCompareQueryOptions = (quoteId: string, from: number, to: number) =>
  queryOptions({ queryKey: quoteKeys.compare(quoteId, from, to), queryFn: ({ signal }) => compareQuoteRevisions(quoteId, from, to, signal) });

export function useQuoteRevisionCompare(quoteId: string, from: number | undefined, to: number | undefined) {
  return useQuery({
    ...quoteRevisionCompareQueryOptions(quoteId, from ?? 0, to ?? 0),
    enabled: from !== undefined && to !== undefined && from !== to,
  });
}
