import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

/** An issued part came back unused: on hand again, the line open. */
export async function returnCounterLine(lineId: string): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/return`, {});
  return data;
}

export function useReturnCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: returnCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
