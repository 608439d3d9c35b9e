import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

export async function reserveCounterLine(lineId: string): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/reserve`, {});
  return data;
}

export function useReserveCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: reserveCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
