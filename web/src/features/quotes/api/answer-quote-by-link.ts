import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export type AnswerQuoteBody = RequestBodyOf<'/api/quote-links/{token}/answer', 'post'>;

export async function answerQuoteByLink(token: string, body: AnswerQuoteBody): Promise<Quote> {
  const { data } = await apiClient.post<Quote>(`/quote-links/${encodeURIComponent(token)}/answer`, body, { skipAuthRefresh: true });
  return data;
}

export function useAnswerQuoteByLink(token: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: AnswerQuoteBody) => answerQuoteByLink(token, body),
    onSuccess: (quote) => queryClient.setQueryData(quoteKeys.link(token), quote),
  });
}
