import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

/** The line's set-aside units go to the job: off the shelf, no longer releasable. */
export async function issueCounterLine(lineId: string): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/issue`, {});
  return data;
}

export function useIssueCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: issueCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
