import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export type UpdateQuoteBody = RequestBodyOf<'/api/quotes/{id}', 'patch'>;

/** Changes the working revision; once the newest revision was sent, the API starts the next one. */
export async function updateQuote(quoteId: string, body: UpdateQuoteBody): Promise<Quote> {
  const { data } = await apiClient.patch<Quote>(`/quotes/${encodeURIComponent(quoteId)}`, body, { skipErrorNotification: true });
  return data;
}

export function useUpdateQuote(quoteId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: UpdateQuoteBody) => updateQuote(quoteId, body),
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(quoteId), quote);
      // Revisions, comparisons and the project's list all read the changed figures.
      void queryClient.invalidateQueries({ queryKey: quoteKeys.details() });
      void queryClient.invalidateQueries({ queryKey: quoteKeys.compares() });
      void queryClient.invalidateQueries({ queryKey: quoteKeys.project(quote.projectId) });
    },
  });
}
