import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Schemas } from '@/lib/api-types';
import { counterKeys } from './counter-keys';

export type CounterLine = Schemas['CounterLineResponseDto'];

export async function getCounterLines(planId: string, signal?: AbortSignal): Promise<CounterLine[]> {
  const { data } = await apiClient.get<CounterLine[]>(`/parts-plans/${encodeURIComponent(planId)}/counter-lines`, { signal });
  return data;
}

export const counterLinesQueryOptions = (planId: string) =>
  queryOptions({ queryKey: counterKeys.lines(planId), queryFn: ({ signal }) => getCounterLines(planId, signal) });

export function useCounterLines(planId: string | undefined) {
  return useQuery({ ...counterLinesQueryOptions(planId ?? ''), enabled: !!planId });
}
