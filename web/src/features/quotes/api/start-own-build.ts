import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { OwnBuild } from '../types';
import { quoteKeys } from './quote-keys';

/** The budget of the member's own truck becomes the approved quote and opens the build sheet (work order). */
export async function startOwnBuild(quoteId: string): Promise<OwnBuild> {
  // The button shows a refusal itself, so no second, global notice.
  const { data } = await apiClient.post<OwnBuild>(`/quotes/${encodeURIComponent(quoteId)}/start-own-build`, undefined, { skipErrorNotification: true });
  return data;
}

export function useStartOwnBuild(projectId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: startOwnBuild,
    onSuccess: (started) => {
      queryClient.setQueryData(quoteKeys.detail(started.quote.id), started.quote);
      void queryClient.invalidateQueries({ queryKey: quoteKeys.project(projectId) });
      void queryClient.invalidateQueries({ queryKey: quoteKeys.details() });
      // Starting the build moves the project's stage on and opens its work order.
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      void queryClient.invalidateQueries({ queryKey: ['work-orders'] });
    },
  });
}
