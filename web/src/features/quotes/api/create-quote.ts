import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export type CreateQuoteBody = RequestBodyOf<'/api/projects/{projectId}/quotes', 'post'>;

export async function createQuote(projectId: string, body: CreateQuoteBody): Promise<Quote> {
  const { data } = await apiClient.post<Quote>(`/projects/${encodeURIComponent(projectId)}/quotes`, body);
  return data;
}

export function useCreateQuote(projectId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: CreateQuoteBody) => createQuote(projectId, body),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: quoteKeys.project(projectId) }),
  });
}
