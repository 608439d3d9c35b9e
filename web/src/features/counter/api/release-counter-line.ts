import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

export async function releaseCounterLine(lineId: string): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/release`, {});
  return data;
}

export function useReleaseCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: releaseCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
