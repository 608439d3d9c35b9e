import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

export async function receiveCounterLine({ lineId, location }: { lineId: string; location: string }): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/receive`, { location });
  return data;
}

export function useReceiveCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: receiveCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
