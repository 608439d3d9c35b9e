import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

export async function reserveCounterLine(lineId: string): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/reserve`, {});
  return data;
}

export function useReserveCounterLine() {
  const client = useQueryClient();
  return useMutation({ mutationFn: reserveCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
