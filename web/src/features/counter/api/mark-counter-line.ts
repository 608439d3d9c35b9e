import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { CounterLine } from './get-counter-lines';
import { counterKeys } from './counter-keys';

export type MarkBody = RequestBodyOf<'/api/counter-lines/{id}/mark', 'post'>;

export async function markCounterLine({ lineId, status }: { lineId: string; status: MarkBody['status'] }): Promise<CounterLine> {
  const { data } = await apiClient.post<CounterLine>(`/counter-lines/${encodeURIComponent(lineId)}/mark`, { status });
  return data;
}

export function useMarkCounterLine() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: markCounterLine, onSettled: () => client.invalidateQueries({ queryKey: counterKeys.all }) });
}
