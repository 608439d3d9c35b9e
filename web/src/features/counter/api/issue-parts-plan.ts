import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

/** Every set-aside line of the plan goes to the job at once (the whole pick list taken to the bay). */
export async function issuePartsPlan(planId: string): Promise<CounterLine[]> {
  const { data } = await apiClient.post<CounterLine[]>(`/parts-plans/${encodeURIComponent(planId)}/issue`, {});
  return data;
}

export function useIssuePartsPlan() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: issuePartsPlan, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
