import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export async function sendQuote(quoteId: string): Promise<Quote> {
  // Both places that send show a refusal themselves (beside the button), so no second, global notice.
  const { data } = await apiClient.post<Quote>(`/quotes/${encodeURIComponent(quoteId)}/send`, undefined, { skipErrorNotification: true });
  return data;
}

export function useSendQuote(projectId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: sendQuote,
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: quoteKeys.project(projectId) });
      void queryClient.invalidateQueries({ queryKey: quoteKeys.details() });
      // Sending moves the project's stage on.
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
    },
  });
}
