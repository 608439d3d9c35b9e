import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export type AnswerQuoteAsMemberBody = RequestBodyOf<'/api/quotes/{id}/answer', 'post'>;

/** The signed-in customer accepts or declines a sent quote of their own project. */
export async function answerQuote(quoteId: string, body: AnswerQuoteAsMemberBody): Promise<Quote> {
  const { data } = await apiClient.post<Quote>(`/quotes/${encodeURIComponent(quoteId)}/answer`, body, { skipErrorNotification: true });
  return data;
}

export function useAnswerQuote(quoteId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: AnswerQuoteAsMemberBody) => answerQuote(quoteId, body),
    onSuccess: (quote) => {
      queryClient.setQueryData(quoteKeys.detail(quoteId), quote);
      void queryClient.invalidateQueries({ queryKey: quoteKeys.projects() });
    },
  });
}
